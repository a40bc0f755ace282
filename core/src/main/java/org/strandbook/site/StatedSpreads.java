package org.strandbook.site;

import java.util.EnumMap;
import java.util.Map;
import java.util.Objects;
import java.util.Optional;
import java.util.Set;

/**
 * The spreads a catalog row or path element states for its own inputs, with the basis in the
 * site's words ("datasheet rev C", "insertion-loss certificate 0412"). An input it does not state
 * falls back to the catalog or to the shipped default.
 *
 * @param byInput the stated spreads
 * @param basis   where they come from, in the site's words; empty when not said
 */
public record StatedSpreads(Map<SpreadInput, StatedSpread> byInput, String basis) {

    /** Nothing stated: every input takes its default. */
    public static final StatedSpreads NONE = new StatedSpreads(Map.of(), "");

    public StatedSpreads {
        byInput = byInput.isEmpty() ? Map.of() : Map.copyOf(new EnumMap<>(byInput));
        basis = basis == null ? "" : basis.strip();
        byInput.values().forEach(Objects::requireNonNull);
    }

    public Optional<StatedSpread> of(SpreadInput input) {
        return Optional.ofNullable(byInput.get(input));
    }

    /** The same with {@code input}'s spread set, or cleared when {@code spread} is null. */
    public StatedSpreads with(SpreadInput input, StatedSpread spread) {
        Map<SpreadInput, StatedSpread> next = new EnumMap<>(SpreadInput.class);
        next.putAll(byInput);
        if (spread == null) {
            next.remove(input);
        } else {
            next.put(input, spread);
        }
        return new StatedSpreads(next, basis);
    }

    public StatedSpreads withBasis(String text) {
        return new StatedSpreads(byInput, text);
    }

    public boolean isEmpty() {
        return byInput.isEmpty() && basis.isEmpty();
    }

    /** Refuses a spread of an input the owner does not have (a length spread on a connector type). */
    StatedSpreads requireOnly(Set<SpreadInput> allowed, String owner) {
        for (SpreadInput input : byInput.keySet()) {
            if (!allowed.contains(input)) {
                throw new IllegalArgumentException(owner + " has no " + input.words() + " to state a spread of");
            }
        }
        return this;
    }
}
