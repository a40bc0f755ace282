/**
 * The selected point's prediction with its uncertainty: the coverage band the plots shade, the
 * uncertainty budget per band, and the design question "will the loop stay within its allowed
 * loss?". Everything here is computed from the prediction in memory, in background jobs; nothing
 * reads the workbook.
 */
package org.strandbook.app.ui.uncertainty;
