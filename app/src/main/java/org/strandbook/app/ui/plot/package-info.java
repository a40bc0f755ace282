/**
 * The point's plots (predicted loss with each element's contribution, measured against predicted,
 * loss over time) and the axis choices they share, remembered per user.
 */
package org.strandbook.app.ui.plot;
