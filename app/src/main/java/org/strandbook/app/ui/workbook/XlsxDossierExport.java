package org.strandbook.app.ui.workbook;

import java.nio.file.Path;
import java.time.Instant;

import org.strandbook.app.ui.task.JobProgress;
import org.strandbook.dossier.DossierContent;
import org.strandbook.dossier.DossierScope;
import org.strandbook.dossier.DossierWriter;
import org.strandbook.dossier.WorkbookDossier;
import org.strandbook.evaluation.PointEvaluator;
import org.strandbook.store.Workbook;

/** The window's dossier export: the whole site, with the shipped template, as the command line writes it. */
public final class XlsxDossierExport implements DossierExport {

    @Override
    public String extension() {
        return "xlsx";
    }

    @Override
    public void export(Workbook workbook, Path target, JobProgress progress) throws Exception {
        String version = XlsxDossierExport.class.getPackage().getImplementationVersion();
        DossierContent content = WorkbookDossier.read(workbook, DossierScope.everything(), PointEvaluator.withDefaults(),
                Instant.now(), "strandbook " + (version == null ? "development" : version),
                (stage, done, total) -> {
                    progress.update(total == 0 ? 0 : 0.5 * done / total, stage);
                    return !progress.isCancelled();
                });
        DossierWriter.withShippedTemplate().write(content, target, true, (stage, done, total) -> {
            progress.update(total == 0 ? 0.5 : 0.5 + 0.5 * done / total, stage);
            return !progress.isCancelled();
        });
    }
}
