package org.strandbook.app.cli;

import java.io.PrintWriter;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.Callable;

import org.strandbook.evaluation.SiteEvaluation;
import org.strandbook.evaluation.SiteEvaluator;
import org.strandbook.server.PlantServer;
import org.strandbook.server.SiteSync;
import org.strandbook.server.StandingReport;
import org.strandbook.store.SyncLedger;
import org.strandbook.store.Workbook;

import picocli.CommandLine.ArgGroup;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;

/**
 * {@code strandbook sync SITE --server URL}: pushes what is new in the workbook to its site on the
 * plant server and pulls what others recorded there. Conflicts (one field edited on both sides) are
 * listed, kept both ways, and resolved with {@code --resolve N --keep mine|theirs}.
 */
@Command(name = "sync", mixinStandardHelpOptions = true,
        description = "Push what is new in the workbook to its site on the plant server and pull what others "
            + "recorded. Scans, inspections, actions, notes and signatures never conflict; one field edited here "
            + "and there since the last sync is a conflict: both values are kept and listed until you choose one "
            + "(--resolve N --keep mine|theirs), and the choice is an audited change. A workbook that fails "
            + "`audit verify` is refused.")
final class SyncCommand implements Callable<Integer> {

    enum Keep { mine, theirs }

    static final class Resolution {
        @Option(names = "--resolve", required = true, paramLabel = "N", description = "The conflict to resolve, as `sync` lists it.")
        long conflict;

        @Option(names = "--keep", required = true, paramLabel = "mine|theirs",
                description = "Keep this workbook's value (mine) or the server's (theirs).")
        Keep keep;
    }

    @Mixin
    WorkbookFileOptions workbook;

    @Mixin
    ServerOptions serverOptions;

    @ArgGroup(exclusive = false)
    Resolution resolution;

    @Option(names = "--json", description = "Print the outcome and the open conflicts as JSON.")
    boolean json;

    @Option(names = "--no-evaluate", negatable = false,
            description = "Do not evaluate the site after the sync to report its points' status for `fleet`.")
    boolean noEvaluate;

    @Spec
    CommandSpec spec;

    @Override
    public Integer call() {
        PrintWriter out = spec.commandLine().getOut();
        PlantServer server = serverOptions.connect();
        try (Workbook wb = workbook.open()) {
            if (resolution != null) {
                long openBefore = openConflicts(wb);
                SyncLedger.Conflict c = SiteSync.resolve(wb, resolution.conflict, resolution.keep == Keep.mine,
                        workbook.user());
                long withIt = openBefore - 1 - openConflicts(wb);
                spec.commandLine().getErr().println("conflict " + c.id() + " resolved: keeping "
                        + resolution.keep + " for " + describe(c) + (withIt == 0 ? "" : ", with the " + withIt
                        + " conflict(s) of the records belonging to it"));
            }
            String siteName = wb.syncLedger().peek().map(SyncLedger.State::siteName)
                    .orElseGet(() -> wb.site().get().name());
            SiteSync.Outcome o = new SiteSync(server, wb, siteName, new ServerProgress(spec.commandLine().getErr()))
                    .run();
            int reported = noEvaluate ? 0 : reportStanding(server, wb, siteName);
            if (json) {
                out.println(json(o, reported));
            } else {
                out.println(String.format(Locale.ROOT, "synced with %s: %d record(s) pushed, %d pulled, %d changed"
                                + " on the server, %d changed here; server audit head %d",
                        server.login().displayUrl(), o.pushed(), o.pulled(), o.changedThere(), o.changedHere(),
                        o.serverAuditHead()));
                if (reported > 0) {
                    out.println("reported the status of " + reported + " point(s) for the fleet view");
                }
                for (SyncLedger.Conflict c : o.openConflicts()) {
                    out.println("conflict " + c.id() + ": " + describe(c) + ": mine " + shown(c, c.mine()) + ", theirs "
                            + shown(c, c.theirs()) + (c.theirsBy().isEmpty() ? "" : " (by " + c.theirsBy() + ")"));
                }
                if (!o.openConflicts().isEmpty()) {
                    out.println(o.openConflicts().size() + " conflict(s) wait for a choice: strandbook sync "
                            + workbook.file() + " --server " + server.login().displayUrl()
                            + " --resolve N --keep mine|theirs");
                }
            }
            out.flush();
        }
        return StrandbookCommand.EXIT_OK;
    }

    /** Evaluates the site and sends the points whose standing changed; a failure here does not undo the sync. */
    private int reportStanding(PlantServer server, Workbook wb, String siteName) {
        try {
            spec.commandLine().getErr().println("evaluating the site for the fleet view ...");
            SiteEvaluation evaluation = SiteEvaluator.withDefaults().evaluate(wb, List.of(), SiteEvaluator.Progress.NONE);
            return StandingReport.publish(server, siteName, StandingReport.of(evaluation, wb.points().list()));
        } catch (RuntimeException e) {
            spec.commandLine().getErr().println("strandbook: the sync is complete, but the points' status was not"
                    + " reported for the fleet view: " + e.getMessage());
            return 0;
        }
    }

    private static long openConflicts(Workbook wb) {
        return wb.syncLedger().conflicts().stream().filter(SyncLedger.Conflict::open).count();
    }

    /** A side's value, text in its quotes (it may hold commas), a number with its unit. */
    private static String shown(SyncLedger.Conflict c, String side) {
        return side != null && side.startsWith("\"") ? side : c.shown(side);
    }

    private static String describe(SyncLedger.Conflict c) {
        return c.table().workbookTable() + " " + c.key() + " " + c.field();
    }

    private static String json(SiteSync.Outcome o, int reported) {
        StringBuilder sb = new StringBuilder("{\"pushed\":").append(o.pushed()).append(",\"pulled\":")
                .append(o.pulled()).append(",\"changed_on_server\":").append(o.changedThere())
                .append(",\"changed_here\":").append(o.changedHere()).append(",\"server_audit_head\":")
                .append(o.serverAuditHead()).append(",\"statuses_reported\":").append(reported)
                .append(",\"conflicts\":[");
        List<SyncLedger.Conflict> open = o.openConflicts();
        for (int i = 0; i < open.size(); i++) {
            SyncLedger.Conflict c = open.get(i);
            sb.append(i == 0 ? "" : ",").append("{\"id\":").append(c.id())
                    .append(",\"table\":").append(JsonText.string(c.table().workbookTable()))
                    .append(",\"key\":").append(JsonText.string(c.key()))
                    .append(",\"field\":").append(JsonText.string(c.field()))
                    .append(",\"mine\":").append(JsonText.string(c.mine()))
                    .append(",\"theirs\":").append(JsonText.string(c.theirs()))
                    .append(",\"theirs_by\":").append(JsonText.string(c.theirsBy())).append('}');
        }
        return sb.append("]}").toString();
    }
}
