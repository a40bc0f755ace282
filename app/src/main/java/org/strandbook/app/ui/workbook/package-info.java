/**
 * The workbook window: site tree, the point's sheets, the loss plot and the status bar, with the
 * {@link org.strandbook.app.ui.workbook.WorkbookService} boundary behind which the workbook file
 * lives (the FX thread never reaches past it).
 */
package org.strandbook.app.ui.workbook;
