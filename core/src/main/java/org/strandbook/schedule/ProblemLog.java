package org.strandbook.schedule;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Locale;

/**
 * The problems found in one schedule. They are listed in the order a user walks the workbook (file
 * problems first, then sheet by sheet in tab order, row by row, column by column), whatever order
 * the checks found them in. Past {@link #LIMIT} entries further problems are only counted, so a
 * sheet of garbage cannot flood the screen; the last line then says how many were left out.
 */
final class ProblemLog {

    static final int LIMIT = 1000;

    private final List<ScheduleProblem> problems = new ArrayList<>();
    private int leftOut;

    void add(ScheduleProblem problem) {
        if (problems.size() < LIMIT) {
            problems.add(problem);
        } else {
            leftOut++;
        }
    }

    boolean isEmpty() {
        return problems.isEmpty();
    }

    int count() {
        return problems.size() + leftOut;
    }

    List<ScheduleProblem> toList() {
        List<ScheduleProblem> all = new ArrayList<>(problems);
        all.sort(Comparator.comparingInt(ProblemLog::sheetOrder)
                .thenComparingInt(ScheduleProblem::row)
                .thenComparingInt(p -> p.column().length())
                .thenComparing(ScheduleProblem::column));
        if (leftOut > 0) {
            all.add(ScheduleProblem.ofFile(String.format(Locale.ROOT,
                    "... and %d more problems not listed; correct the ones above and import again", leftOut)));
        }
        return List.copyOf(all);
    }

    private static int sheetOrder(ScheduleProblem problem) {
        if (problem.sheet().isEmpty()) {
            return -1;
        }
        for (ScheduleSheet s : ScheduleSheet.values()) {
            if (s.title().equals(problem.sheet())) {
                return s.ordinal();
            }
        }
        return ScheduleSheet.values().length;
    }
}
