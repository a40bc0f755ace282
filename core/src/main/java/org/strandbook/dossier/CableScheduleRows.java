package org.strandbook.dossier;

import java.util.Comparator;
import java.util.List;
import java.util.Optional;
import java.util.stream.Collectors;

import org.apache.poi.ss.usermodel.Row;
import org.strandbook.optics.bend.BendRadiusCheck;
import org.strandbook.optics.bend.MinimumBendRadius;
import org.strandbook.site.Bend;
import org.strandbook.site.CableSegment;
import org.strandbook.site.FiberType;
import org.strandbook.site.Inspection;
import org.strandbook.site.Joint;
import org.strandbook.site.PathElement;
import org.strandbook.site.PathLeg;
import org.strandbook.site.StatedSpreads;

/**
 * The cable schedule as installed: every element of every leg in the order light meets it, with
 * lengths, bends against the fiber's long-term minimum radius, and end-face grades (as recorded on
 * the joint and as last inspected).
 */
final class CableScheduleRows {

    private CableScheduleRows() {
    }

    static void fill(TableSheet t, DossierContent content) {
        for (DossierPoint p : content.points()) {
            for (PathLeg leg : p.legs()) {
                List<PathElement> elements = leg.elements();
                for (int i = 0; i < elements.size(); i++) {
                    Row r = t.newRowStyled();
                    t.text(r, DossierColumn.CABLE_TAG, p.tag());
                    t.text(r, DossierColumn.CABLE_LEG, leg.direction().name());
                    t.number(r, DossierColumn.CABLE_POSITION, i + 1);
                    if (elements.get(i) instanceof CableSegment s) {
                        segment(t, r, s, content.catalog().findFiber(s.fiberTypeCode()));
                        spreads(t, r, s.spreads());
                    } else if (elements.get(i) instanceof Joint j) {
                        joint(t, r, j, latest(p.inspections(), j.label()));
                        spreads(t, r, j.spreads());
                    }
                }
            }
        }
    }

    private static void segment(TableSheet t, Row r, CableSegment s, Optional<FiberType> fiber) {
        t.text(r, DossierColumn.CABLE_ELEMENT, "CABLE");
        t.text(r, DossierColumn.CABLE_LABEL, s.label());
        t.text(r, DossierColumn.CABLE_TYPE, s.fiberTypeCode());
        t.number(r, DossierColumn.CABLE_LENGTH_M, s.lengthM());
        if (s.bends().isEmpty()) {
            t.text(r, DossierColumn.CABLE_BENDS, "none recorded");
        } else {
            t.text(r, DossierColumn.CABLE_BENDS, s.bends().stream()
                    .map(b -> DossierText.decimal(b.radiusMm(), 0) + " mm × " + b.count())
                    .collect(Collectors.joining("; ")));
        }
        Optional<Bend> tightest = s.bends().stream().min(Comparator.comparingDouble(Bend::radiusMm));
        tightest.ifPresent(b -> t.number(r, DossierColumn.CABLE_TIGHTEST_MM, b.radiusMm()));
        if (fiber.isEmpty()) {
            t.text(r, DossierColumn.CABLE_BEND_CHECK, "fiber type not in catalog");
            return;
        }
        double claddingUm = fiber.get().claddingUm();
        t.number(r, DossierColumn.CABLE_MIN_RADIUS_MM, MinimumBendRadius.longTermMm(claddingUm));
        tightest.ifPresent(b -> {
            BendRadiusCheck check = MinimumBendRadius.check(claddingUm, b.radiusMm());
            t.text(r, DossierColumn.CABLE_BEND_CHECK, switch (check.verdict()) {
                case OK -> "OK";
                case BELOW_LONG_TERM -> "below long-term minimum";
                case BELOW_SHORT_TERM -> "below short-term minimum";
            });
        });
    }

    private static void joint(TableSheet t, Row r, Joint j, Optional<Inspection> last) {
        t.text(r, DossierColumn.CABLE_ELEMENT, "JOINT");
        t.text(r, DossierColumn.CABLE_LABEL, j.label());
        t.text(r, DossierColumn.CABLE_TYPE, j.connectorTypeA().equals(j.connectorTypeB()) ? j.connectorTypeA()
                : j.connectorTypeA() + " → " + j.connectorTypeB());
        t.text(r, DossierColumn.CABLE_GRADE, j.grade().name());
        last.ifPresent(i -> {
            t.time(r, DossierColumn.CABLE_INSPECTED, i.inspectedAt());
            t.text(r, DossierColumn.CABLE_INSPECTOR, i.inspector());
            t.text(r, DossierColumn.CABLE_INSPECTED_GRADE, i.grade().name());
        });
        j.lossDb().ifPresent(loss -> t.number(r, DossierColumn.CABLE_LOSS_DB, loss));
        t.text(r, DossierColumn.CABLE_LOSS_BASIS, j.lossDb().isPresent() ? j.lossBasis().name()
                : "typical of type");
    }

    /** The element's own spreads, "length ±0.5 m; bend radius ±20 %"; blank when it states none. */
    private static void spreads(TableSheet t, Row r, StatedSpreads spreads) {
        if (spreads.byInput().isEmpty()) {
            return;
        }
        t.text(r, DossierColumn.CABLE_SPREAD, spreads.byInput().entrySet().stream()
                .sorted(java.util.Map.Entry.comparingByKey())
                .map(e -> e.getKey().words() + " " + e.getValue()).collect(Collectors.joining("; ")));
        t.text(r, DossierColumn.CABLE_SPREAD_BASIS, spreads.basis());
    }

    /** The latest inspection of a joint, by its label. */
    static Optional<Inspection> latest(List<Inspection> inspections, String jointLabel) {
        return inspections.stream().filter(i -> i.jointLabel().equals(jointLabel))
                .max(Comparator.comparing(Inspection::inspectedAt));
    }
}
