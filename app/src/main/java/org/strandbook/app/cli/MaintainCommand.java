package org.strandbook.app.cli;

import java.io.PrintWriter;
import java.time.Instant;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.concurrent.Callable;

import org.strandbook.site.Bend;
import org.strandbook.site.CableSegment;
import org.strandbook.site.Inspection;
import org.strandbook.site.InspectionGrade;
import org.strandbook.site.Joint;
import org.strandbook.site.LossBasis;
import org.strandbook.site.MaintenanceAction;
import org.strandbook.site.MaintenanceKind;
import org.strandbook.site.PathElement;
import org.strandbook.store.UnknownEntryException;
import org.strandbook.store.Workbook;

import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;

/**
 * {@code strandbook maintain SITE --point TAG --action KIND [--element LABEL] --by NAME ...}: records
 * a maintenance action; a replacement changes the path from its date on and keeps the old one in
 * the path's history.
 */
@Command(name = "maintain", mixinStandardHelpOptions = true,
        description = "Record a maintenance action at a point: clean-joint, reterminate, replace-connector, "
            + "replace-segment, reroute, replace-probe or retake-reference, with who, when, what and why. "
            + "A replacement (--new-length-m, --new-fiber, --new-label, --bend, --straight, --connector, --loss-db) "
            + "changes the predicted budget from its date on; scans taken before it are still judged against "
            + "the path as it was; likewise a replaced probe's new type (--probe-type). Work on fibers and process connections: see the README's Safety section.")
final class MaintainCommand implements Callable<Integer> {

    @Mixin
    WorkbookFileOptions workbook;

    @Option(names = "--point", required = true, paramLabel = "TAG", description = "The measurement point.")
    String point;

    @Option(names = "--action", required = true, paramLabel = "KIND", description = "What was done: clean-joint, "
            + "reterminate, replace-connector, replace-segment, reroute, replace-probe, retake-reference.")
    String action;

    @Option(names = "--element", paramLabel = "LABEL",
            description = "The joint (J2) or cable ID worked on; not for the probe or the reference.")
    String element;

    @Option(names = "--by", required = true, paramLabel = "NAME", description = "Who did the work.")
    String by;

    @Mixin
    RecordTimeOption at;

    @Option(names = "--what", paramLabel = "TEXT", description = "What was done, in your words.")
    String what;

    @Option(names = "--why", paramLabel = "TEXT", description = "Why: the finding, inspection or schedule behind it.")
    String why;

    @Option(names = "--new-length-m", paramLabel = "M", description = "Replacement segment: its fiber length, m.")
    Double newLengthM;

    @Option(names = "--new-fiber", paramLabel = "CODE", description = "Replacement segment: its fiber type code.")
    String newFiber;

    @Option(names = "--new-label", paramLabel = "ID", description = "Replacement segment: its new cable ID.")
    String newLabel;

    @Option(names = "--bend", paramLabel = "RADIUS_MM:COUNT",
            description = "Replacement or rerouted segment: a bend of this radius (mm), this many times; repeatable.")
    List<String> bends = new ArrayList<>();

    @Option(names = "--straight", description = "Rerouted segment: no bend tighter than its cable's rating remains.")
    boolean straight;

    @Option(names = "--connector", paramLabel = "CODE[/CODE]",
            description = "Replacement connector or re-termination: the connector type code(s) of the joint.")
    String connector;

    @Option(names = "--loss-db", paramLabel = "DB", description = "Replacement joint: its measured loss, dB.")
    Double lossDb;

    @Option(names = "--probe-type", paramLabel = "CODE", description = "replace-probe: the catalog code of the probe "
            + "type fitted, when it differs; the prediction uses it from this date on.")
    String probeType;

    @Option(names = "--grade-after", paramLabel = "GRADE",
            description = "Also record the end-face inspection done after the work (clean, acceptable, dirty, damaged).")
    String gradeAfter;

    @Spec
    CommandSpec spec;

    @Override
    public Integer call() {
        MaintenanceKind kind;
        try {
            kind = MaintenanceKind.parse(action);
        } catch (IllegalArgumentException e) {
            throw new UsageProblem("--action: " + e.getMessage());
        }
        Instant when = at.instant();
        InspectionGrade after = gradeAfter == null ? null : InspectCommand.parseGrade(gradeAfter);
        if (after != null && kind.role() != MaintenanceKind.ElementRole.JOINT) {
            throw new UsageProblem("--grade-after applies to work on a joint, not to " + kind.words());
        }
        String label = element == null ? "" : element.strip();
        if (!label.isEmpty() && kind.role() == MaintenanceKind.ElementRole.NONE) {
            throw new UsageProblem("--element names a joint or cable; " + kind.words() + " works on none"
                    + (kind == MaintenanceKind.REPLACE_PROBE ? " (the new probe type goes in --probe-type)" : ""));
        }
        if (probeType != null && kind != MaintenanceKind.REPLACE_PROBE) {
            throw new UsageProblem("--probe-type applies to replace-probe, not to " + kind.words());
        }
        String fitted = probeType == null ? "" : probeType.strip();
        boolean hazardous;
        try (Workbook wb = workbook.open()) {
            Optional<PathElement> replacement = replacement(wb, kind, label);
            MaintenanceAction a = new MaintenanceAction(point, kind, label, when, by, what, why, replacement, fitted);
            wb.inTransaction(() -> {
                wb.maintenance().add(a);
                if (after != null) {
                    wb.inspections().add(new Inspection(point, label, when, by, after, "after " + kind.words()));
                }
            });
            hazardous = wb.points().get(point).map(p -> p.hazardousArea()).orElse(false);
        }
        PrintWriter out = spec.commandLine().getOut();
        out.println("recorded: " + kind.words() + " at " + point + (label.isEmpty() ? "" : " " + label) + " on " + when
                + " by " + by.strip() + (replacement(kind) ? "; the path changes from this date on" : "")
                + (fitted.isEmpty() ? "" : "; probe type " + fitted + " is predicted from this date on"));
        out.flush();
        if (hazardous) {
            FieldCautions.hazardousPoint(spec.commandLine().getErr(), point);
        }
        return StrandbookCommand.EXIT_OK;
    }

    private boolean replacement(MaintenanceKind kind) {
        return kind.mayChangePath() && (newLengthM != null || newFiber != null || newLabel != null || !bends.isEmpty()
                || straight || connector != null || lossDb != null);
    }

    private Optional<PathElement> replacement(Workbook wb, MaintenanceKind kind, String label) {
        if (!replacement(kind)) {
            if (newLengthM != null || newFiber != null || newLabel != null || !bends.isEmpty() || straight
                    || connector != null || lossDb != null) {
                throw new UsageProblem(kind.words() + " does not change the path; leave out the replacement options");
            }
            return Optional.empty();
        }
        PathElement now = wb.paths().legs(point).stream().flatMap(l -> l.elements().stream())
                .filter(e -> e.label().equalsIgnoreCase(label)).findFirst()
                .orElseThrow(() -> new UnknownEntryException("point " + point + " has no element '" + label
                        + "' on its path today"));
        if (now instanceof CableSegment s) {
            if (connector != null || lossDb != null) {
                throw new UsageProblem("--connector and --loss-db apply to a joint; " + label + " is a cable");
            }
            List<Bend> newBends = bends.isEmpty() && !straight ? s.bends() : parseBends();
            return Optional.of(new CableSegment(newLabel == null ? s.label() : newLabel,
                    newFiber == null ? s.fiberTypeCode() : newFiber, newLengthM == null ? s.lengthM() : newLengthM,
                    newBends));
        }
        Joint j = (Joint) now;
        if (newLengthM != null || newFiber != null || newLabel != null || !bends.isEmpty() || straight) {
            throw new UsageProblem("segment options apply to a cable; " + label + " is a joint");
        }
        String a = j.connectorTypeA();
        String b = j.connectorTypeB();
        if (connector != null) {
            String[] codes = connector.split("/", 2);
            a = codes[0].strip();
            b = codes.length > 1 ? codes[1].strip() : a;
        }
        return Optional.of(new Joint(j.label(), a, b, j.grade(),
                lossDb == null ? OptionalDouble.empty() : OptionalDouble.of(lossDb),
                lossDb == null ? LossBasis.ASSUMED : LossBasis.MEASURED));
    }

    private List<Bend> parseBends() {
        List<Bend> out = new ArrayList<>();
        for (String b : bends) {
            String[] parts = b.split(":", 2);
            try {
                out.add(new Bend(Double.parseDouble(parts[0].strip()), parts.length > 1
                        ? Integer.parseInt(parts[1].strip()) : 1));
            } catch (IllegalArgumentException e) {
                throw new UsageProblem("--bend '" + b + "' is not RADIUS_MM:COUNT, e.g. 60:2");
            }
        }
        return out;
    }
}
