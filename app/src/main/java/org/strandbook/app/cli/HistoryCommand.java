package org.strandbook.app.cli;

import java.io.PrintWriter;
import java.util.List;
import java.util.concurrent.Callable;

import org.strandbook.handover.PointEvent;
import org.strandbook.handover.PointHistory;
import org.strandbook.store.Workbook;

import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;

/** {@code strandbook history SITE --point TAG [--json]}: a point's records in time order. */
@Command(name = "history", mixinStandardHelpOptions = true,
        description = "Show a point's history in time order: scans, inspections, maintenance actions, notes and "
            + "sign-offs (with whether each signature still covers the point).")
final class HistoryCommand implements Callable<Integer> {

    @Mixin
    WorkbookFileOptions workbook;

    @Option(names = "--point", required = true, paramLabel = "TAG", description = "The measurement point.")
    String point;

    @Option(names = "--json", description = "One JSON object per entry instead of a table.")
    boolean json;

    @Spec
    CommandSpec spec;

    @Override
    public Integer call() {
        List<PointEvent> events;
        try (Workbook wb = workbook.open()) {
            events = PointHistory.read(wb, point);
        }
        PrintWriter out = spec.commandLine().getOut();
        if (json) {
            out.print("[");
            for (int i = 0; i < events.size(); i++) {
                PointEvent e = events.get(i);
                out.print((i == 0 ? "\n" : ",\n") + "{\"at\":" + JsonText.string(e.at().toString()) + ",\"kind\":"
                        + JsonText.string(e.kind().word()) + ",\"subject\":" + JsonText.string(e.subject())
                        + ",\"who\":" + JsonText.string(e.who()) + ",\"text\":" + JsonText.string(e.text()) + "}");
            }
            out.println(events.isEmpty() ? "]" : "\n]");
        } else if (events.isEmpty()) {
            out.println("no records for point " + point);
        } else {
            TextTable table = new TextTable(new String[] {"time", "record", "on", "by", "what"},
                    new String[] {"UTC", "", "", "", ""}).leftAligned(0, 1, 2, 3, 4);
            for (PointEvent e : events) {
                table.row(e.at().toString().substring(0, 16).replace('T', ' '), e.kind().word(), e.subject(),
                        e.who(), e.text().replace('\n', ' '));
            }
            table.print(out);
        }
        out.flush();
        return StrandbookCommand.EXIT_OK;
    }
}
