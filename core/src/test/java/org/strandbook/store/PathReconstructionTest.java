package org.strandbook.store;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.time.Instant;
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
import org.strandbook.store.PathReconstruction.PathChange;

/**
 * The path at a moment from copies made by actions on laptops that may not have known of each other.
 * The expected legs follow from the record-keeping rule alone (an action replaces one element where it
 * stands; the path at t is the path after every action at or before t), so each check is worked out by
 * hand from the scenario, with no physics involved.
 */
class PathReconstructionTest {

    private static final String TAG = "AT-4107";
    private static final Instant D1 = Instant.parse("2026-05-04T08:00:00Z");
    private static final Instant D2 = Instant.parse("2026-05-11T08:00:00Z");
    private static final Instant D3 = Instant.parse("2026-05-18T08:00:00Z");

    private static final CableSegment S = segment("C7-S1", 40.0);
    private static final CableSegment S_NEW = segment("C7-S1", 140.0);
    private static final CableSegment S_THIRD = segment("C7-S1", 60.0);
    private static final Joint C = joint("J2", 0.9);
    private static final Joint C_NEW = joint("J2", 0.3);
    private static final CableSegment R = segment("C7-R1", 41.0);

    private static CableSegment segment(String label, double lengthM) {
        return new CableSegment(label, "LOH-200", lengthM, List.of());
    }

    private static Joint joint(String label, double lossDb) {
        return new Joint(label, "SMA-A", null, InspectionGrade.CLEAN, OptionalDouble.of(lossDb), LossBasis.MEASURED);
    }

    /** Send: segment, joint; return: one segment. */
    private static List<PathLeg> path(PathElement send0, PathElement send1) {
        return List.of(new PathLeg(TAG, PathDirection.SEND, List.of(send0, send1)),
                new PathLeg(TAG, PathDirection.RETURN, List.of(R)));
    }

    private static PathChange segmentChange(long id, Instant at, List<PathLeg> copy) {
        return new PathChange(id, at, "C7-S1", true, copy);
    }

    private static PathChange jointChange(long id, Instant at, List<PathLeg> copy) {
        return new PathChange(id, at, "J2", false, copy);
    }

    @Test
    void twoOfflineChangesAtDifferentPlacesEachHoldFromTheirOwnDate() {
        // laptop A replaced S at D1, laptop B the joint at D2; both copied the path as built
        List<PathChange> changes = List.of(segmentChange(1, D1, path(S, C)), jointChange(2, D2, path(S, C)));
        List<PathLeg> today = path(S_NEW, C_NEW);

        assertEquals(path(S, C), PathReconstruction.at(changes, today, D1.minusSeconds(1)));
        assertEquals(path(S_NEW, C), PathReconstruction.at(changes, today, D1.plusSeconds(60)));
        assertEquals(today, PathReconstruction.at(changes, today, D2));
    }

    @Test
    void copiesMadeInOrderOnOneWorkbookAreTakenAsTheyAre() {
        List<PathChange> changes = List.of(segmentChange(1, D1, path(S, C)), jointChange(2, D2, path(S_NEW, C)));
        assertEquals(path(S_NEW, C), PathReconstruction.at(changes, path(S_NEW, C_NEW), D1.plusSeconds(60)));
    }

    @Test
    void whatTheEarlierChangePutInComesFromTheNextCopyThatSawItWhenThePlaceChangedAgain() {
        // a third laptop that knew A's change but not B's replaced S again at D3
        List<PathChange> changes = List.of(segmentChange(1, D1, path(S, C)), jointChange(2, D2, path(S, C)),
                segmentChange(3, D3, path(S_NEW, C)));
        List<PathLeg> today = path(S_THIRD, C_NEW);

        assertEquals(path(S_NEW, C), PathReconstruction.at(changes, today, D1.plusSeconds(60)));
        assertEquals(path(S_NEW, C_NEW), PathReconstruction.at(changes, today, D2.plusSeconds(60)));
    }

    @Test
    void theSameElementReplacedOnTwoLaptopsKeepsTheCopysElementForTheFirstOneIsRecordedNowhere() {
        // A put S_NEW in at D1, B (unaware) S_THIRD at D2; the workbook kept B's. A's element is in no copy
        List<PathChange> changes = List.of(segmentChange(1, D1, path(S, C)), segmentChange(2, D2, path(S, C)));
        assertEquals(path(S, C), PathReconstruction.at(changes, path(S_THIRD, C), D1.plusSeconds(60)));
    }

    @Test
    void aLegReEnteredSinceWithAnotherElementCountKeepsTheCopysElement() {
        List<PathChange> changes = List.of(segmentChange(1, D1, path(S, C)), jointChange(2, D2, path(S, C)));
        List<PathLeg> reEntered = List.of(new PathLeg(TAG, PathDirection.SEND, List.of(joint("J0", 0.5), S_NEW, C_NEW)),
                new PathLeg(TAG, PathDirection.RETURN, List.of(R)));
        assertEquals(path(S, C), PathReconstruction.at(changes, reEntered, D1.plusSeconds(60)));
    }

    @Test
    void thePathBeforeAnActionCarriesEveryEarlierChange() {
        List<PathChange> changes = List.of(segmentChange(1, D1, path(S, C)), jointChange(2, D2, path(S, C)));
        assertEquals(path(S_NEW, C), PathReconstruction.before(changes, 1, path(S_NEW, C_NEW)));
    }
}
