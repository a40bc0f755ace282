package org.strandbook.store;

import java.time.Instant;
import java.util.ArrayList;
import java.util.EnumMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.Optional;
import java.util.Set;

import org.strandbook.site.CableSegment;
import org.strandbook.site.PathDirection;
import org.strandbook.site.PathElement;
import org.strandbook.site.PathLeg;

/**
 * A point's path at a moment, rebuilt from the copies its path-changing actions kept and from today's
 * path, right also when the copies were made on laptops that did not know of each other.
 *
 * <p>Each action replaced one element by one of the same kind at the same place (direction and
 * position; {@link PathRepository#replaceElement} updates the row where it stands), after copying the
 * whole path as its laptop knew it. The path at t starts from the copy of the first change after t,
 * as on one workbook. A copy made offline may still show, at some place, the element an earlier
 * action (at or before t, recorded on another laptop) had already replaced: the copy's element is
 * then identical to that earlier action's own copy there. That place gets what the earlier action
 * put in: the element there in the copy of the next action that changed the same place, or today's
 * element when none did.
 *
 * <p>Where that element is recorded nowhere the copy's element stays: when the next action at the
 * place replaced the very element the earlier one did without knowing of it (the same element
 * replaced on two laptops), its copy shows the old element, not the earlier action's; and when the
 * leg was re-entered since (another element count, another kind at the place) a position no longer
 * names the same element. The stored copies are never changed: they are records of what each
 * laptop knew, and travel to the plant server as they are.
 */
final class PathReconstruction {

    /**
     * One path-changing action as the history holds it.
     *
     * @param actionId     the action's row
     * @param performedAt  when the work was done
     * @param elementLabel the joint label or cable ID it replaced
     * @param segment      true when it replaced a cable segment, false for a joint
     * @param copy         the legs its laptop knew just before it, send before return
     */
    record PathChange(long actionId, Instant performedAt, String elementLabel, boolean segment, List<PathLeg> copy) {

        PathChange {
            Objects.requireNonNull(performedAt, "performedAt");
            Objects.requireNonNull(elementLabel, "elementLabel");
            copy = List.copyOf(copy);
        }

        /** Where in its own copy the replaced element stood; empty when the label is missing or ambiguous there. */
        Optional<Place> place() {
            Place found = null;
            for (PathLeg leg : copy) {
                List<PathElement> elements = leg.elements();
                for (int i = 0; i < elements.size(); i++) {
                    PathElement e = elements.get(i);
                    if (e.label().equalsIgnoreCase(elementLabel) && (e instanceof CableSegment) == segment) {
                        if (found != null) {
                            return Optional.empty();
                        }
                        found = new Place(leg.direction(), i);
                    }
                }
            }
            return Optional.ofNullable(found);
        }
    }

    /** A place in a point's path: the leg and the index in it (0 for the first element). */
    record Place(PathDirection direction, int index) {
    }

    private PathReconstruction() {
    }

    /**
     * The legs at {@code at}: those before the first change after it, or today's when none came after.
     *
     * @param changes the point's path-changing actions by time, ties in the order recorded
     * @param today   the point's legs today
     */
    static List<PathLeg> at(List<PathChange> changes, List<PathLeg> today, Instant at) {
        for (int k = 0; k < changes.size(); k++) {
            if (changes.get(k).performedAt().isAfter(at)) {
                return before(changes, k, today);
            }
        }
        return today;
    }

    /**
     * The legs just before change {@code k}: its copy, with each place an earlier change replaced
     * unknown to it given what that earlier change put there.
     *
     * @param changes the point's path-changing actions by time, ties in the order recorded
     * @param today   the point's legs today
     */
    static List<PathLeg> before(List<PathChange> changes, int k, List<PathLeg> today) {
        Map<PathDirection, List<PathElement>> path = elements(changes.get(k).copy());
        Set<Place> places = new LinkedHashSet<>();
        for (int i = 0; i < k; i++) {
            changes.get(i).place().ifPresent(places::add);
        }
        for (Place place : places) {
            int latest = -1;
            boolean unaware = false;
            for (int i = 0; i < k; i++) {
                PathChange earlier = changes.get(i);
                if (earlier.place().equals(Optional.of(place))) {
                    latest = i;
                    Optional<PathElement> shown = elementAt(path, place, earlier.copy());
                    unaware |= shown.isPresent() && shown.equals(elementAt(earlier.copy(), place, earlier.copy()));
                }
            }
            if (unaware) {
                Optional<PathElement> put = putIn(changes, latest, today);
                if (put.isPresent()) {
                    path.get(place.direction()).set(place.index(), put.get());
                }
            }
        }
        String tag = changes.get(k).copy().isEmpty() ? "" : changes.get(k).copy().get(0).pointTag();
        List<PathLeg> out = new ArrayList<>();
        path.forEach((direction, elements) -> out.add(new PathLeg(tag, direction, elements)));
        return out;
    }

    /** What change {@code i} put in its place, where anything records it. */
    private static Optional<PathElement> putIn(List<PathChange> changes, int i, List<PathLeg> today) {
        PathChange change = changes.get(i);
        Place place = change.place().orElseThrow();
        Optional<PathElement> replaced = elementAt(change.copy(), place, change.copy());
        for (int j = i + 1; j < changes.size(); j++) {
            PathChange next = changes.get(j);
            if (next.place().equals(Optional.of(place))) {
                Optional<PathElement> there = elementAt(next.copy(), place, change.copy());
                // the same element replaced on two laptops: the next copy holds the old one, not ours
                return there.equals(replaced) ? Optional.empty() : there;
            }
        }
        return elementAt(today, place, change.copy());
    }

    private static Optional<PathElement> elementAt(List<PathLeg> legs, Place place, List<PathLeg> shapeOf) {
        return elementAt(elements(legs), place, shapeOf);
    }

    /**
     * The element at {@code place}, when the leg there has as many elements as in {@code shapeOf} and
     * one of the same kind at the place: otherwise a position no longer names the same element.
     */
    private static Optional<PathElement> elementAt(Map<PathDirection, List<PathElement>> path, Place place,
                                                   List<PathLeg> shapeOf) {
        List<PathElement> leg = path.getOrDefault(place.direction(), List.of());
        List<PathElement> shape = elements(shapeOf).getOrDefault(place.direction(), List.of());
        if (leg.size() != shape.size() || place.index() >= leg.size()) {
            return Optional.empty();
        }
        PathElement e = leg.get(place.index());
        return e.getClass() == shape.get(place.index()).getClass() ? Optional.of(e) : Optional.empty();
    }

    private static Map<PathDirection, List<PathElement>> elements(List<PathLeg> legs) {
        Map<PathDirection, List<PathElement>> out = new EnumMap<>(PathDirection.class);
        for (PathLeg leg : legs) {
            out.put(leg.direction(), new ArrayList<>(leg.elements()));
        }
        return out;
    }
}
