package org.strandbook.app.cli;

import java.io.PrintWriter;
import java.util.Locale;
import java.util.concurrent.Callable;

import org.strandbook.site.Inspection;
import org.strandbook.site.InspectionGrade;
import org.strandbook.store.Workbook;

import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;

/** {@code strandbook inspect SITE --point TAG --joint LABEL --grade GRADE --by NAME}: records an end-face inspection. */
@Command(name = "inspect", mixinStandardHelpOptions = true,
        description = "Record an end-face inspection of a joint (grades after the zones of IEC 61300-3-35): the "
            + "joint's grade is its latest inspection, and scans are diagnosed with the grade of their day. "
            + "Never look into a live fiber end: see the README's Safety section.")
final class InspectCommand implements Callable<Integer> {

    @Mixin
    WorkbookFileOptions workbook;

    @Option(names = "--point", required = true, paramLabel = "TAG", description = "The measurement point.")
    String point;

    @Option(names = "--joint", required = true, paramLabel = "LABEL", description = "The joint inspected, e.g. J2.")
    String joint;

    @Option(names = "--grade", required = true, paramLabel = "GRADE",
            description = "clean, acceptable, dirty or damaged.")
    String grade;

    @Option(names = "--by", required = true, paramLabel = "NAME", description = "Who inspected it.")
    String inspector;

    @Mixin
    RecordTimeOption at;

    @Option(names = "--remark", paramLabel = "TEXT", description = "What was seen.")
    String remark;

    @Option(names = "--picture", paramLabel = "FILE", description = "File name of the end-face picture kept.")
    String picture;

    @Spec
    CommandSpec spec;

    @Override
    public Integer call() {
        InspectionGrade g = parseGrade(grade);
        Inspection inspection = new Inspection(point, joint, at.instant(), inspector, g, remark,
                picture);
        boolean hazardous;
        try (Workbook wb = workbook.open()) {
            wb.inspections().add(inspection);
            hazardous = wb.points().get(point).map(p -> p.hazardousArea()).orElse(false);
        }
        PrintWriter out = spec.commandLine().getOut();
        out.println("recorded: " + point + " " + joint + " graded " + g.name().toLowerCase(Locale.ROOT) + " on "
                + inspection.inspectedAt() + " by " + inspection.inspector()
                + (g.needsAction() ? "; the joint needs cleaning or replacement before it is trusted" : ""));
        if (hazardous) {
            FieldCautions.hazardousPoint(spec.commandLine().getErr(), point);
        }
        out.flush();
        return StrandbookCommand.EXIT_OK;
    }

    static InspectionGrade parseGrade(String text) {
        String key = text == null ? "" : text.strip().toUpperCase(Locale.ROOT).replace('-', '_');
        for (InspectionGrade g : InspectionGrade.values()) {
            if (g != InspectionGrade.NOT_INSPECTED && g.name().equals(key)) {
                return g;
            }
        }
        throw new UsageProblem("--grade '" + text + "' is not one of clean, acceptable, dirty, damaged");
    }
}
