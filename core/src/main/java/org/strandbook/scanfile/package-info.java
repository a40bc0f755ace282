/**
 * Reading and writing the spectrum files that process analyzers export: lamp reference scans,
 * loop scans and dark scans, as delimited text or JCAMP-DX.
 *
 * <p>{@link org.strandbook.scanfile.SpectrumFiles} is the way in: it refuses files over 64 MiB,
 * fingerprints the bytes (SHA-256), decodes the text (UTF-8 with or without byte-order mark,
 * UTF-16 with one) and picks the reader by content. Every refusal is a checked
 * {@link org.strandbook.scanfile.SpectrumFileException} reading {@code file:line: what is wrong}.
 * The result, {@link org.strandbook.scanfile.SpectrumFile}, always holds an ascending wavelength
 * axis in nm and remembers the file's own abscissa unit ({@link org.strandbook.scanfile.XUnit}).
 *
 * <p>{@link org.strandbook.scanfile.JcampDxWriter} and
 * {@link org.strandbook.scanfile.DelimitedSpectrumWriter} write what the readers read, replacing
 * a target file whole or not at all.
 *
 * <p>JCAMP-DX after McDonald &amp; Wilks, Appl. Spectrosc. 42, 151 (1988) (version 4.24) and
 * Lampen et al., Appl. Spectrosc. 48, 1545 (1994) (version 5). Pure code: no database, no UI.
 */
package org.strandbook.scanfile;
