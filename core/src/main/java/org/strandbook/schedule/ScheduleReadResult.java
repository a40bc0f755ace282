package org.strandbook.schedule;

import java.util.List;

/**
 * What reading a cable schedule gave: either a schedule that passed every rule, or every problem
 * found (never both, never a partial schedule), so nothing is written from a flawed file.
 */
public sealed interface ScheduleReadResult {

    /** The problems found; empty exactly when the schedule was accepted. */
    List<ScheduleProblem> problems();

    default boolean isAccepted() {
        return this instanceof Accepted;
    }

    /**
     * The schedule passed every rule.
     *
     * @param schedule the schedule as read
     * @param origins  the cell each item was entered in, for problems found later (say, by the store)
     */
    record Accepted(CableSchedule schedule, ScheduleOrigins origins) implements ScheduleReadResult {

        public Accepted {
            if (schedule == null || origins == null) {
                throw new IllegalArgumentException("an accepted result needs its schedule and their origins");
            }
        }

        @Override
        public List<ScheduleProblem> problems() {
            return List.of();
        }
    }

    /** The schedule was rejected; {@code problems} lists every problem found, in sheet order. */
    record Rejected(List<ScheduleProblem> problems) implements ScheduleReadResult {

        public Rejected {
            problems = List.copyOf(problems);
            if (problems.isEmpty()) {
                throw new IllegalArgumentException("a rejected result needs at least one problem");
            }
        }
    }
}
