package org.strandbook.site;

import java.time.Instant;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

/**
 * A point's end-face inspections read as dated events: a joint's grade at a moment is its latest
 * inspection up to then, else the grade entered with the path.
 */
public final class InspectionHistory {

    private final List<Inspection> inspections;

    /** @param inspections the point's inspections, in any order */
    public InspectionHistory(List<Inspection> inspections) {
        List<Inspection> sorted = new ArrayList<>(inspections);
        sorted.sort((a, b) -> a.inspectedAt().compareTo(b.inspectedAt()));
        this.inspections = List.copyOf(sorted);
    }

    /** The joint's latest inspection at or before {@code at}, if any. */
    public Optional<Inspection> latest(String jointLabel, Instant at) {
        Inspection found = null;
        for (Inspection i : inspections) {
            if (i.inspectedAt().isAfter(at)) {
                break;
            }
            if (i.jointLabel().equalsIgnoreCase(jointLabel)) {
                found = i;
            }
        }
        return Optional.ofNullable(found);
    }

    /** The leg with each joint's grade as inspected at {@code at}. */
    public PathLeg gradedAt(PathLeg leg, Instant at) {
        List<PathElement> out = new ArrayList<>(leg.elements().size());
        for (PathElement e : leg.elements()) {
            if (e instanceof Joint j) {
                Optional<Inspection> last = latest(j.label(), at);
                out.add(last.isEmpty() ? j : new Joint(j.label(), j.connectorTypeA(), j.connectorTypeB(),
                        last.get().grade(), j.lossDb(), j.lossBasis(), j.spreads()));
            } else {
                out.add(e);
            }
        }
        return new PathLeg(leg.pointTag(), leg.direction(), out);
    }
}
