package org.strandbook.app.cli;

import java.time.Instant;

import org.strandbook.handover.RecordedTime;

/** The {@code --at} time of a record made in the field (see {@link RecordedTime}); a bad one is wrong usage. */
final class FieldTime {

    private FieldTime() {
    }

    static Instant parse(String option, String text) {
        try {
            return RecordedTime.parse(text);
        } catch (IllegalArgumentException e) {
            throw new UsageProblem(option + " " + e.getMessage());
        }
    }
}
