/**
 * The predicted loss budget of each point as the window shows it: computed from the records in
 * memory with core's optics engine, per band centre, with margin and status.
 */
package org.strandbook.app.ui.budget;
