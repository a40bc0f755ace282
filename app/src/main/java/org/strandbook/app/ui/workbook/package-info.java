/**
 * The workbook window: site tree, the sheets, the selected point's plots and the status bar, over
 * the {@link org.strandbook.app.ui.workbook.WorkbookService} boundary behind which the SQLite
 * workbook lives. The service is called only from background jobs; the FX thread works on the
 * records in memory ({@code OpenSite}) and never reaches the file.
 */
package org.strandbook.app.ui.workbook;
