/**
 * A point's light path as two sheets, cable segments and joints, and the legs they join back into.
 */
package org.strandbook.app.ui.path;
