package org.strandbook.samplesite;

import java.time.Duration;
import java.time.Instant;
import java.util.List;
import java.util.Optional;

import org.strandbook.site.CableSegment;
import org.strandbook.site.Inspection;
import org.strandbook.site.InspectionGrade;
import org.strandbook.site.Joint;
import org.strandbook.site.MaintenanceAction;
import org.strandbook.site.MaintenanceKind;
import org.strandbook.site.Note;
import org.strandbook.site.PathLeg;
import org.strandbook.site.SignOff;
import org.strandbook.site.SignOffRole;
import org.strandbook.store.Workbook;

/**
 * The demo's maintenance and handover records: commissioning inspections of every joint, notes, the
 * commissioning sign-offs of revision A, the cleaning of AT-4104's dirty junction-box joint J5 (a step
 * in its trend), and a later like-for-like patch cord replacement at AT-4101 that re-opens its signed
 * point (and so the signed revision). People and events are invented.
 */
final class DemoRecords {

    static final String REOPENED = "AT-4101";
    static final String DIRTY = "AT-4102";
    static final String CLEANED = "AT-4104";
    private static final Instant FIRST_VISIT = ScanGenerator.COMMISSIONING;

    private DemoRecords() {
    }

    static void add(Workbook wb, DemoPlant plant) {
        Instant inspected = FIRST_VISIT.minus(Duration.ofHours(2));
        wb.inTransaction(() -> {
            for (DemoPlant.DemoPoint p : plant.points()) {
                for (PathLeg leg : List.of(p.send(), p.ret())) {
                    for (Joint j : leg.joints()) {
                        boolean dirty = j.grade() == InspectionGrade.DIRTY;
                        wb.inspections().add(new Inspection(p.point().tag(), j.label(), inspected, "I. Marsh",
                                j.grade(), dirty ? "film across the core; no cleaning kit on site that day" : "",
                                dirty ? p.point().tag() + "-" + j.label() + "-commissioning.png" : ""));
                    }
                }
            }
            Instant fourthVisit = FIRST_VISIT.plus(ScanGenerator.VISIT_INTERVAL.multipliedBy(3));
            wb.inspections().add(new Inspection(DIRTY, "J2", fourthVisit.plus(Duration.ofHours(3)), "T. Okonjo",
                    InspectionGrade.DIRTY, "still filmed; junction box JB-41 lid seal perished", ""));
            wb.notes().add(new Note(DIRTY, "J2", fourthVisit.plus(Duration.ofHours(3)), "T. Okonjo",
                    "JB-41 is in the classified area around R-410: cleaning needs a hot-work permit; booked for the "
                            + "next shutdown"));
            wb.notes().add(new Note(REOPENED, FIRST_VISIT.plus(Duration.ofDays(1)), "I. Marsh",
                    "loop accepted at commissioning; reference patch cord P-07 kept in the shelter"));
            Instant signed = FIRST_VISIT.plus(Duration.ofDays(14));
            for (String tag : List.of(REOPENED, "AT-4107")) {
                wb.signOffs().add(new SignOff(SignOffRole.CHECKED, "M. Okonedo", signed, tag, "loop within tolerance",
                        "commissioning lead", "", ""));
            }
            wb.signOffs().add(new SignOff(SignOffRole.PREPARED, "I. Marsh", signed, "", "", "field technician", "", ""));
            wb.signOffs().add(new SignOff(SignOffRole.CHECKED, "M. Okonedo", signed.plus(Duration.ofDays(1)), "", "",
                    "commissioning lead", "", ""));
            wb.signOffs().add(new SignOff(SignOffRole.APPROVED, "R. Fairbairn", signed.plus(Duration.ofDays(2)), "",
                    "", "site analyzer engineer", "", ""));
        });
        addCleaning(wb, plant);
        // after the signatures: a later change that re-opens the signed point and revision A
        DemoPlant.DemoPoint reopened = plant.points().stream().filter(p -> p.point().tag().equals(REOPENED))
                .findFirst().orElseThrow();
        CableSegment cord = reopened.ret().segments().get(reopened.ret().segments().size() - 1);
        Instant sixthVisit = FIRST_VISIT.plus(ScanGenerator.VISIT_INTERVAL.multipliedBy(5));
        wb.maintenance().add(new MaintenanceAction(REOPENED, MaintenanceKind.REPLACE_SEGMENT, cord.label(),
                sixthVisit.minus(Duration.ofDays(10)), "T. Okonjo", "patch cord replaced like for like",
                "jacket cut by the cabinet door", Optional.of(new CableSegment(cord.label(), cord.fiberTypeCode(),
                        cord.lengthM(), List.of()))));
    }

    /** AT-4104's J5: dirty at commissioning, re-inspected still dirty, cleaned on the recorded day. */
    private static void addCleaning(Workbook wb, DemoPlant plant) {
        DemoPlant.JointCleaning cleaning = plant.points().stream().filter(p -> p.point().tag().equals(CLEANED))
                .findFirst().orElseThrow().cleaning().orElseThrow();
        String joint = cleaning.jointLabel();
        Instant cleaned = cleaning.cleanedAt();
        Instant thirdVisit = FIRST_VISIT.plus(ScanGenerator.VISIT_INTERVAL.multipliedBy(2));
        wb.inTransaction(() -> {
            wb.inspections().add(new Inspection(CLEANED, joint, thirdVisit.plus(Duration.ofHours(4)), "R. Valdés",
                    InspectionGrade.DIRTY, "film over the core again after re-mating; swab only, no dry cleaner",
                    ""));
            wb.notes().add(new Note(CLEANED, joint, thirdVisit.plus(Duration.ofHours(4)), "R. Valdés",
                    "loop reads about 2 dB over prediction since commissioning; clean J5 with a dry cleaner at the "
                            + "next visit"));
            wb.maintenance().add(new MaintenanceAction(CLEANED, MaintenanceKind.CLEAN_JOINT, joint, cleaned,
                    "K. Lindqvist", "both end faces cleaned with a dry reel cleaner, re-inspected",
                    "dirty at commissioning and at the third visit; excess flat across the range",
                    Optional.empty()));
            wb.inspections().add(new Inspection(CLEANED, joint, cleaned.plus(Duration.ofMinutes(15)), "K. Lindqvist",
                    InspectionGrade.CLEAN, "after cleaning, under the inspection scope", ""));
        });
    }
}
