package org.strandbook.app.cli;

import java.io.PrintWriter;
import java.time.Instant;
import java.util.Locale;
import java.util.concurrent.Callable;

import org.strandbook.server.FleetView;
import org.strandbook.server.PointStanding;

import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;

/**
 * {@code strandbook fleet --server URL}: across the sites of a plant server, each site's points by
 * status, every point ranked by urgency, and with {@code --since} the points whose status changed.
 * Statuses are those the laptops reported at their last sync.
 */
@Command(name = "fleet", mixinStandardHelpOptions = true, subcommands = FleetExportCommand.class,
        description = "Across the sites of a plant server (those your role may see): each site's points by status, "
            + "every point ranked by urgency (FAIL first, then the earliest date a margin runs out), and with --since "
            + "the points whose status changed. Statuses are as the laptops evaluated them at their last sync.")
final class FleetCommand implements Callable<Integer> {

    @Mixin
    ServerOptions serverOptions;

    @Option(names = "--since", paramLabel = "DATE",
            description = "List the points whose status changed since DATE (2026-05-03, or a date and time in UTC).")
    String since;

    @Option(names = "--json", description = "Print the fleet as JSON.")
    boolean json;

    @Spec
    CommandSpec spec;

    @Override
    public Integer call() {
        Instant from = since == null ? null : FieldTime.since("--since", since);
        FleetView.Fleet fleet = FleetView.read(serverOptions.connect(), from);
        PrintWriter out = spec.commandLine().getOut();
        if (json) {
            out.println(json(fleet));
        } else {
            print(fleet, out);
        }
        out.flush();
        return StrandbookCommand.EXIT_OK;
    }

    private static void print(FleetView.Fleet fleet, PrintWriter out) {
        TextTable sites = new TextTable(new String[] {"site", "PASS", "REVIEW", "FAIL", "not evaluated", "last sync"},
                new String[] {"", "points", "points", "points", "points", "UTC"}).leftAligned(0, 5);
        for (FleetView.SiteCounts s : fleet.sites()) {
            sites.row(s.site(), Long.toString(s.pass()), Long.toString(s.review()), Long.toString(s.fail()),
                    Long.toString(s.notEvaluated()), s.lastSync() == null ? "never" : FieldTime.shown(s.lastSync()));
        }
        if (fleet.sites().isEmpty()) {
            out.println("no site on this server that your login may read: a site appears at its first sync, and the"
                    + " server's owner makes each technician a member of the sites they work on (README, Plant server)");
            return;
        }
        sites.print(out);
        out.println();
        TextTable ranking = new TextTable(new String[] {"rank", "site", "point", "status", "worst band", "margin",
            "runs out"}, new String[] {"", "", "", "", "", "dB", "date"}).leftAligned(1, 2, 3, 4, 6);
        int rank = 1;
        for (PointStanding p : fleet.ranking()) {
            ranking.row(Integer.toString(rank++), p.site(), p.tag(), p.status(), p.worstBand() == null ? "" : p.worstBand(),
                    p.marginDb() == null ? "" : String.format(Locale.ROOT, "%.2f", p.marginDb()),
                    p.runOutDate() == null ? "" : p.runOutDate().toString());
        }
        ranking.print(out);
        if (fleet.since() != null) {
            out.println();
            out.println("status changed since " + fleet.since() + ": " + fleet.changes().size() + " point(s)");
            for (FleetView.StatusChange c : fleet.changes()) {
                out.println("  " + c.site() + " " + c.tag() + ": " + (c.before() == null ? "first reported " + c.after()
                        : c.before() + " -> " + c.after()) + " (" + FieldTime.shown(c.at()) + " UTC)");
            }
        }
    }

    private static String json(FleetView.Fleet fleet) {
        StringBuilder sb = new StringBuilder("{\"sites\":[");
        for (int i = 0; i < fleet.sites().size(); i++) {
            FleetView.SiteCounts s = fleet.sites().get(i);
            sb.append(i == 0 ? "" : ",").append("{\"site\":").append(JsonText.string(s.site()))
                    .append(",\"pass\":").append(s.pass()).append(",\"review\":").append(s.review())
                    .append(",\"fail\":").append(s.fail()).append(",\"not_evaluated\":").append(s.notEvaluated())
                    .append(",\"last_sync\":").append(s.lastSync() == null ? "null" : JsonText.string(s.lastSync().toString()))
                    .append('}');
        }
        sb.append("],\"ranking\":[");
        for (int i = 0; i < fleet.ranking().size(); i++) {
            PointStanding p = fleet.ranking().get(i);
            sb.append(i == 0 ? "" : ",").append("{\"site\":").append(JsonText.string(p.site()))
                    .append(",\"point\":").append(JsonText.string(p.tag()))
                    .append(",\"status\":").append(JsonText.string(p.status()))
                    .append(",\"worst_band\":").append(p.worstBand() == null ? "null" : JsonText.string(p.worstBand()))
                    .append(",\"margin_db\":").append(p.marginDb() == null ? "null" : JsonText.number(p.marginDb()))
                    .append(",\"run_out_date\":").append(p.runOutDate() == null ? "null" : JsonText.string(p.runOutDate().toString()))
                    .append(",\"evaluated_at\":").append(JsonText.string(p.evaluatedAt().toString())).append('}');
        }
        sb.append("],\"since\":").append(fleet.since() == null ? "null" : JsonText.string(fleet.since().toString()))
                .append(",\"changed\":[");
        for (int i = 0; i < fleet.changes().size(); i++) {
            FleetView.StatusChange c = fleet.changes().get(i);
            sb.append(i == 0 ? "" : ",").append("{\"site\":").append(JsonText.string(c.site()))
                    .append(",\"point\":").append(JsonText.string(c.tag()))
                    .append(",\"before\":").append(c.before() == null ? "null" : JsonText.string(c.before()))
                    .append(",\"after\":").append(JsonText.string(c.after()))
                    .append(",\"at\":").append(JsonText.string(c.at().toString())).append('}');
        }
        return sb.append("]}").toString();
    }
}
