package org.strandbook.app.ui.workbook;

import java.nio.file.Path;

import org.strandbook.app.ui.task.JobProgress;
import org.strandbook.store.Workbook;

/**
 * The commissioning dossier export, as the window reaches it. The window finds an implementation
 * with {@link java.util.ServiceLoader}; while a build has none, its menu item stays disabled and
 * says why. An implementation runs on the workbook's background thread and reports progress.
 */
public interface DossierExport {

    /** The file name extension the dossier is written with, without the dot, e.g. "xlsx". */
    String extension();

    /** Writes the dossier of {@code workbook} to {@code target}, whole or not at all. */
    void export(Workbook workbook, Path target, JobProgress progress) throws Exception;
}
