/**
 * The commissioning dossier: the XLSX file a plant receives at handover and opens years later in
 * whatever spreadsheet program it has.
 *
 * <p>{@link org.strandbook.dossier.WorkbookDossier} gathers a {@link org.strandbook.dossier.DossierContent}
 * from a workbook (records, evaluations on the scans of a date range, the audit trail's check);
 * anything else may build one too (the export benchmark does). {@link org.strandbook.dossier.DossierWriter}
 * fills the dossier template with it: a cover with the document status, the result and the sign-off
 * block; cautions and method; acceptance; findings and actions; point register; cable schedule; loss
 * budget; measured-against-predicted charts; trends; and the appendices Spectra, Trend history and
 * Audit log, which continue on further sheets past the format's row limit.
 *
 * <p>The template ({@link org.strandbook.dossier.DossierTemplateBuilder}, shipped in the templates
 * module) holds the layout, so a plant restyles the dossier without code: a hidden key row names the
 * field of each table column, {@link org.strandbook.dossier.Placeholder} tokens mark the values of the
 * cover, page headers and footers. What the writer promises: long tables stream (bounded memory),
 * chart caches are filled as the file is written, every text is a string cell and formula-like text
 * is quote-prefixed ({@link org.strandbook.spreadsheet.FormulaText}), times are UTC and numbers carry a
 * decimal point whatever the machine, and a file appears complete or not at all.
 */
package org.strandbook.dossier;
