package org.strandbook.app.ui.path;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.ArrayList;
import java.util.List;
import java.util.OptionalDouble;

import org.junit.jupiter.api.Test;
import org.strandbook.site.CableSegment;
import org.strandbook.site.InspectionGrade;
import org.strandbook.site.Joint;
import org.strandbook.site.LossBasis;
import org.strandbook.site.PathDirection;
import org.strandbook.site.PathElement;
import org.strandbook.site.PathLeg;

/**
 * A point's legs split into the segment and joint sheets and joined back. The order is the order
 * light meets the elements, as a cable schedule lists them (common practice).
 */
class LegRowsTest {

    private static CableSegment cable(String label) {
        return new CableSegment(label, "F-1", 10, List.of());
    }

    private static Joint joint(String label) {
        return new Joint(label, "K-1", "K-1", InspectionGrade.CLEAN, OptionalDouble.empty(), LossBasis.ASSUMED);
    }

    private static final List<PathLeg> LEGS = List.of(
            new PathLeg("P-1", PathDirection.SEND, List.of(cable("S1"), joint("J1"), cable("S2"), joint("J2"))),
            new PathLeg("P-1", PathDirection.RETURN, List.of(joint("J3"), cable("R1"), joint("J4"), cable("R2"))));

    private static List<String> labels(List<PathLeg> legs, PathDirection d) {
        return legs.stream().filter(l -> l.direction() == d).findFirst().orElseThrow().elements().stream()
                .map(PathElement::label).toList();
    }

    @Test
    void splittingIntoTwoSheetsAndJoiningGivesTheLegsBack() {
        LegRows.Split split = LegRows.split(LEGS);

        assertEquals(4, split.segments().size());
        assertEquals(4, split.joints().size());
        assertEquals(LEGS, LegRows.join("P-1", split.segments(), split.joints()));
    }

    @Test
    void aSegmentInsertedBelowAnotherComesBeforeTheJointThatFollowedIt() {
        LegRows.Split split = LegRows.split(LEGS);
        List<LegSegment> segments = new ArrayList<>(split.segments());
        LegSegment s1 = segments.get(0);
        double place = LegRows.placeAfter(s1.position(), segments.stream()
                .filter(s -> s.direction() == PathDirection.SEND).map(LegSegment::position).toList());
        segments.add(1, new LegSegment(PathDirection.SEND, place, cable("S1b")));

        List<PathLeg> joined = LegRows.join("P-1", segments, split.joints());

        assertEquals(List.of("S1", "S1b", "J1", "S2", "J2"), labels(joined, PathDirection.SEND));
        assertEquals(List.of("J3", "R1", "J4", "R2"), labels(joined, PathDirection.RETURN));
    }

    @Test
    void aJointNamesWhatItConnectsWithTheAnalyzerAndProbeAtTheEnds() {
        LegRows.Split split = LegRows.split(LEGS);
        List<PathLeg> joined = LegRows.join("P-1", split.segments(), split.joints());

        List<String> between = split.joints().stream().map(j -> LegRows.between(j, joined)).toList();

        assertEquals(List.of("S1 \u2192 S2", "S2 \u2192 probe", "probe \u2192 R1", "R1 \u2192 R2"), between);
    }
}
