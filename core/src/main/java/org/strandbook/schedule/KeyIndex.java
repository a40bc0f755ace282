package org.strandbook.schedule;

import java.util.HashMap;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;

/**
 * The tags, IDs or codes a sheet defines, for duplicate and reference checks. Keys are unique
 * ignoring case (P-101 and p-101 would confuse anyone reading the plant), while references must
 * match exactly; a reference that matches only ignoring case gets a hint.
 *
 * <p>An index is incomplete when its defining sheet could not be read: reference checks against it
 * are then skipped, since the missing key may sit on the unreadable sheet.
 */
final class KeyIndex {

    private final Map<String, String> spellingByFolded = new HashMap<>();
    private final Map<String, ScheduleCell> placeByFolded = new HashMap<>();
    private boolean complete = true;

    /** Adds a key known from elsewhere (the shipped catalog). */
    void addKnown(String key) {
        spellingByFolded.putIfAbsent(fold(key), key);
    }

    /**
     * Registers a key defined at {@code place}; returns the place of an earlier definition equal
     * ignoring case, if any. Callers check {@link #isKnownElsewhere} first.
     */
    Optional<ScheduleCell> define(String key, ScheduleCell place) {
        String folded = fold(key);
        ScheduleCell earlier = placeByFolded.get(folded);
        if (earlier != null) {
            return Optional.of(earlier);
        }
        spellingByFolded.putIfAbsent(folded, key);
        placeByFolded.put(folded, place);
        return Optional.empty();
    }

    /** True when the key was known before being defined on a sheet (a shipped catalog code). */
    boolean isKnownElsewhere(String key) {
        String folded = fold(key);
        return spellingByFolded.containsKey(folded) && !placeByFolded.containsKey(folded);
    }

    Optional<ScheduleCell> placeOf(String key) {
        return Optional.ofNullable(placeByFolded.get(fold(key)));
    }

    void markIncomplete() {
        complete = false;
    }

    boolean isComplete() {
        return complete;
    }

    /**
     * Checks a reference: null when it is fine (or cannot be judged), else the message naming
     * {@code what} and where keys come from.
     */
    String unknownReference(String reference, String what, String whereDefined) {
        if (!complete) {
            return null;
        }
        String spelling = spellingByFolded.get(fold(reference));
        if (spelling != null && spelling.equals(reference)) {
            return null;
        }
        String message = "unknown " + what + " '" + reference + "': not " + whereDefined;
        return spelling == null ? message : message + " (did you mean '" + spelling + "'? letter case counts)";
    }

    private static String fold(String key) {
        return key.toLowerCase(Locale.ROOT);
    }
}
