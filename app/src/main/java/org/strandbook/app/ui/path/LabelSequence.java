package org.strandbook.app.ui.path;

import java.util.Collection;
import java.util.HashSet;
import java.util.Locale;
import java.util.Set;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/** The next site label after a given one: "C-07" → "C-08", "J3" → "J4", "RUN" → "RUN-2". */
final class LabelSequence {

    private static final Pattern TRAILING_NUMBER = Pattern.compile("^(.*?)(\\d+)$");

    private LabelSequence() {
    }

    /** The first label after {@code label} that {@code taken} does not hold (compared ignoring case). */
    static String nextUnused(String label, Collection<String> taken) {
        Set<String> used = new HashSet<>();
        taken.forEach(t -> used.add(t.toLowerCase(Locale.ROOT)));
        String candidate = next(label);
        while (used.contains(candidate.toLowerCase(Locale.ROOT))) {
            candidate = next(candidate);
        }
        return candidate;
    }

    static String next(String label) {
        Matcher m = TRAILING_NUMBER.matcher(label);
        if (!m.matches()) {
            return label + "-2";
        }
        String digits = m.group(2);
        String incremented = Long.toString(Long.parseLong(digits) + 1);
        StringBuilder padded = new StringBuilder(incremented);
        while (padded.length() < digits.length()) {
            padded.insert(0, '0');
        }
        return m.group(1) + padded;
    }
}
