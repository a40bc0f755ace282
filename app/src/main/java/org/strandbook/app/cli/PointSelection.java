package org.strandbook.app.cli;

import java.util.List;

import org.strandbook.evaluation.SiteEvaluation;
import org.strandbook.evaluation.SiteEvaluator;
import org.strandbook.store.Workbook;

import picocli.CommandLine.Option;

/** {@code --point TAG} and {@code --json}, shared by the commands that evaluate a site. */
final class PointSelection {

    @Option(names = "--point", paramLabel = "TAG", description = "Only this point, with its details.")
    String point;

    @Option(names = "--json", description = "JSON (fields listed in the README) instead of a table.")
    boolean json;

    /** Evaluates the chosen point, or every point, of the workbook. */
    SiteEvaluation evaluate(WorkbookFileOptions workbook) {
        try (Workbook wb = workbook.openForReading()) {
            return SiteEvaluator.withDefaults().evaluate(wb, point == null ? List.of() : List.of(point),
                    SiteEvaluator.Progress.NONE);
        }
    }
}
