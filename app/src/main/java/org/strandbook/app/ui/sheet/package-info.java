/**
 * The spreadsheet grid every Strandbook table uses. {@link org.strandbook.app.ui.sheet.SheetModel}
 * holds the rows (immutable records), their columns, validation, paste, fill down and undo in
 * plain Java; {@link org.strandbook.app.ui.sheet.SheetView} maps keys, mouse and the clipboard of a
 * {@code TableView} onto it.
 *
 * <p>Why {@code TableView} and not ControlsFX's SpreadsheetView: the rows are typed records that a
 * column setter replaces, not a grid of free cells; TableView with cell selection gives keyboard
 * focus, rectangular selection and virtualised rows out of the box, its cells are ordinary nodes
 * that TestFX can find, and the behaviour that matters (validation, paste all-or-nothing, undo)
 * lives in the model anyway, where a plain unit test reaches it.
 */
package org.strandbook.app.ui.sheet;
