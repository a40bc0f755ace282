package org.strandbook.evaluation;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Locale;
import java.util.OptionalDouble;

import org.strandbook.optics.path.FiberSegment;
import org.strandbook.optics.path.FiberSpec;
import org.strandbook.optics.path.JointElement;
import org.strandbook.optics.path.LightPath;
import org.strandbook.optics.path.LossBudget;
import org.strandbook.optics.path.OpticsCache;
import org.strandbook.optics.path.PathElement;
import org.strandbook.site.Bend;
import org.strandbook.site.CableSegment;
import org.strandbook.site.Catalog;
import org.strandbook.site.Joint;
import org.strandbook.site.MeasurementPoint;
import org.strandbook.site.PathLeg;
import org.strandbook.site.ProbeType;
import org.strandbook.uncertainty.BudgetInputUncertainties;
import org.strandbook.uncertainty.ElementAllowances;
import org.strandbook.uncertainty.PathAllowances;

/**
 * Builds a point's predicted loop budget from what the workbook records.
 *
 * <p>What is counted: every cable segment and joint on the send and return legs, and the probe.
 * What is not: the analyzer's own launch and detector faces and the reference patch cord, which
 * the one-cord reference scan divides out.
 *
 * <p>Bends: a segment goes to the optics engine with its tightest recorded radius and the number of
 * bends recorded; the engine charges the tightest once ({@code GlogeBend.chargedBends}), the same
 * rule {@code strandbook fiber} uses.
 */
public final class PointBudgetBuilder {

    private final Catalog catalog;
    private final SpreadResolver spreads;

    public PointBudgetBuilder(Catalog catalog) {
        this.catalog = catalog;
        this.spreads = new SpreadResolver(catalog, BudgetInputUncertainties.SHIPPED);
    }

    /** The predicted budget of the point's loop on the cache's grid. */
    public PredictedBudget build(MeasurementPoint point, PathLeg send, PathLeg ret, OpticsCache cache) {
        List<String> notes = new ArrayList<>();
        List<PathElement> elements = new ArrayList<>();
        List<ElementAllowances> allowances = new ArrayList<>();
        addLeg(send, elements, allowances, notes);
        ProbeType probe = catalog.probe(point.probeTypeCode());
        elements.add(OpticsMapping.probe(probe));
        allowances.add(spreads.probe(probe));
        addLeg(ret, elements, allowances, notes);
        LossBudget budget = LossBudget.of(new LightPath(point.tag(), elements), cache);
        notes.addAll(budget.notes());
        return new PredictedBudget(point.tag(), budget, notes, new PathAllowances(allowances));
    }

    private void addLeg(PathLeg leg, List<PathElement> out, List<ElementAllowances> allowances, List<String> notes) {
        List<org.strandbook.site.PathElement> items = leg.elements();
        if (leg.segments().isEmpty()) {
            throw new IllegalArgumentException("point " + leg.pointTag() + ": the " + leg.direction().name()
                    .toLowerCase(Locale.ROOT) + " leg has no cable segment");
        }
        for (int i = 0; i < items.size(); i++) {
            org.strandbook.site.PathElement item = items.get(i);
            if (item instanceof CableSegment segment) {
                FiberSegment fiber = fiberSegment(segment, notes);
                out.add(fiber);
                allowances.add(spreads.segment(segment, fiber.bendRadiusMm().orElse(0)));
            } else if (item instanceof Joint joint) {
                FiberSpec from = fiberNear(items, i, -1);
                FiberSpec to = fiberNear(items, i, +1);
                out.add(new JointElement(joint.label(), from == null ? to : from, to == null ? from : to,
                        OpticsMapping.allowance(joint, catalog)));
                allowances.add(spreads.joint(joint));
            }
        }
    }

    private FiberSegment fiberSegment(CableSegment segment, List<String> notes) {
        FiberSpec spec = OpticsMapping.fiberSpec(catalog.fiber(segment.fiberTypeCode()));
        if (segment.bends().isEmpty()) {
            return FiberSegment.straight(segment.label(), spec, segment.lengthM());
        }
        Bend tightest = segment.bends().stream().min(Comparator.comparingDouble(Bend::radiusMm)).orElseThrow();
        int recorded = segment.bends().stream().mapToInt(Bend::count).sum();
        if (recorded > 1) {
            notes.add(String.format(Locale.ROOT, "cable %s: %d bends recorded, the tightest (%.0f mm) charged once",
                    segment.label(), recorded, tightest.radiusMm()));
        }
        return new FiberSegment(segment.label(), spec, segment.lengthM(), OptionalDouble.of(tightest.radiusMm()),
                recorded);
    }

    /** The fiber of the nearest cable segment before (step −1) or after (+1) position {@code i}. */
    private FiberSpec fiberNear(List<org.strandbook.site.PathElement> items, int i, int step) {
        for (int j = i + step; j >= 0 && j < items.size(); j += step) {
            if (items.get(j) instanceof CableSegment s) {
                return OpticsMapping.fiberSpec(catalog.fiber(s.fiberTypeCode()));
            }
        }
        return null;
    }
}
