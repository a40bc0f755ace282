/**
 * What Strandbook's XLSX writers share, whichever file they write: text that must stay text
 * ({@link org.strandbook.spreadsheet.FormulaText}). No spreadsheet library here.
 */
package org.strandbook.spreadsheet;
