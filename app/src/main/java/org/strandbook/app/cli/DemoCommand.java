package org.strandbook.app.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.UncheckedIOException;
import java.nio.file.Path;
import java.time.Instant;
import java.util.List;
import java.util.concurrent.Callable;

import org.strandbook.dossier.DossierContent;
import org.strandbook.dossier.DossierProgress;
import org.strandbook.dossier.DossierScope;
import org.strandbook.dossier.DossierWriter;
import org.strandbook.dossier.WorkbookDossier;
import org.strandbook.evaluation.PointEvaluator;
import org.strandbook.evaluation.SiteEvaluation;
import org.strandbook.evaluation.SiteEvaluator;
import org.strandbook.samplesite.DemoSite;
import org.strandbook.samplesite.ScanGenerator;
import org.strandbook.server.PlantServer;
import org.strandbook.server.SiteSync;
import org.strandbook.server.StandingReport;
import org.strandbook.store.Workbook;

import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;

/**
 * {@code strandbook demo [--out DIR]}: the invented Saltmarsh Ridge Works, end to end: schedule and
 * scan files written, imported into a fresh workbook, evaluated, and summarised point by point.
 */
@Command(name = "demo", mixinStandardHelpOptions = true,
        description = "Build the invented demo plant (cable schedule, two years of scan files, workbook), "
            + "evaluate it, write its commissioning dossier (XLSX) and print a summary per point.")
final class DemoCommand implements Callable<Integer> {

    @Option(names = "--out", paramLabel = "DIR",
            description = "Folder for the workbook, schedule and scan files (default: strandbook-demo, or"
                    + " strandbook-demo-2, -3 ... when an earlier demo is there; an earlier demo is never overwritten).")
    Path out;

    @Option(names = "--seed", paramLabel = "N", description = "Generator seed (default: the demo's own).")
    Long seed;

    /** With {@code --server}, the demo pushes itself to a plant server after it is built. */
    @Mixin
    ServerOptions serverOptions;

    @Spec
    CommandSpec spec;

    @Override
    public Integer call() {
        PrintWriter o = spec.commandLine().getOut();
        PrintWriter err = spec.commandLine().getErr();
        o.println("Strandbook demo: Saltmarsh Ridge Works, an invented plant. Fiber work in a real plant: never look"
                + " into a live fiber end; IEC 60079-28 governs optical power in explosive atmospheres; local codes, your"
                + " site's permit to work and licensed practice take precedence (README, section Safety).");
        Path folder = out != null ? out : freshDefaultFolder();
        DemoSite.Built built;
        try {
            built = DemoSite.build(folder, seed == null ? ScanGenerator.DEMO_SEED : seed, step -> {
                err.println("  " + step);
                err.flush();
            });
        } catch (IOException e) {
            throw new UncheckedIOException("cannot write the demo into " + folder + ": " + e.getMessage(), e);
        }
        o.printf(java.util.Locale.ROOT, "workbook  %s%nschedule  %s%nscans     %d files under %s%n",
                built.workbook(), built.schedule(), built.scanFiles(), built.scanFolder());
        SiteEvaluation site;
        Path dossier = folder.resolve("saltmarsh-ridge-dossier.xlsx");
        try (Workbook wb = Workbook.open(built.workbook(), DemoSite.USER)) {
            site = SiteEvaluator.withDefaults().evaluate(wb, List.of(), SiteEvaluator.Progress.NONE);
            err.println("  writing the commissioning dossier");
            err.flush();
            DossierContent content = WorkbookDossier.read(wb, DossierScope.everything(), PointEvaluator.withDefaults(),
                    Instant.now(), new StrandbookVersion().getVersion()[0], DossierProgress.NONE);
            DossierWriter.withShippedTemplate().write(content, dossier, false, DossierProgress.NONE);
        } catch (IOException e) {
            throw new UncheckedIOException("cannot write the dossier " + dossier + ": " + e.getMessage(), e);
        }
        o.printf(java.util.Locale.ROOT, "dossier   %s%n", dossier);
        o.println();
        EvaluationText.summary(site, o);
        o.println();
        if (serverOptions.given()) {
            pushToServer(built.workbook(), site, o, err);
        }
        o.println("Next: strandbook evaluate " + built.workbook() + " --point AT-4102   |   strandbook trend "
                + built.workbook());
        o.flush();
        return StrandbookCommand.EXIT_OK;
    }

    private void pushToServer(Path workbook, SiteEvaluation site, PrintWriter o, PrintWriter err) {
        PlantServer server = serverOptions.connect();
        try (Workbook wb = Workbook.open(workbook, DemoSite.USER)) {
            SiteSync.Outcome pushed = new SiteSync(server, wb, wb.site().get().name(), new ServerProgress(err)).run();
            int reported = StandingReport.publish(server, wb.site().get().name(),
                    StandingReport.of(site, wb.points().list()));
            o.printf(java.util.Locale.ROOT, "server    %s: %d record(s) pushed, the status of %d point(s) reported%n",
                    server.login().displayUrl(), pushed.pushed(), reported);
        }
    }

    private static Path freshDefaultFolder() {
        Path folder = Path.of("strandbook-demo");
        for (int n = 2; java.nio.file.Files.exists(folder.resolve(DemoSite.WORKBOOK_NAME)); n++) {
            folder = Path.of("strandbook-demo-" + n);
        }
        return folder;
    }
}
