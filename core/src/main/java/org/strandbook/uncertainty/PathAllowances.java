package org.strandbook.uncertainty;

import java.util.ArrayList;
import java.util.Iterator;
import java.util.List;

import org.strandbook.optics.path.FiberSegment;
import org.strandbook.optics.path.JointElement;
import org.strandbook.optics.path.LightPath;
import org.strandbook.optics.path.PathElement;
import org.strandbook.optics.path.ProbeElement;

/**
 * The allowance of every input of one light path, one entry per element in path order, resolved
 * once per point (element, then catalog, then shipped default) so that a Monte Carlo run only
 * samples them.
 *
 * @param elements one per element of the path, in path order
 */
public record PathAllowances(List<ElementAllowances> elements) {

    public PathAllowances {
        elements = List.copyOf(elements);
    }

    /**
     * The shipped defaults for every element of {@code path}.
     *
     * @param jointSources what each joint rests on, in path order (one per joint)
     */
    public static PathAllowances shipped(LightPath path, List<JointSource> jointSources) {
        BudgetInputUncertainties shipped = BudgetInputUncertainties.SHIPPED;
        Iterator<JointSource> joints = jointSources.iterator();
        List<ElementAllowances> out = new ArrayList<>();
        for (PathElement e : path.elements()) {
            if (e instanceof FiberSegment) {
                out.add(new ElementAllowances.Fiber(shipped.fiberLength(), shipped.attenuation(), shipped.ohContent(),
                        shipped.bendRadius()));
            } else if (e instanceof JointElement j) {
                if (!joints.hasNext()) {
                    throw new IllegalArgumentException("joint '" + j.label() + "': no source given for it");
                }
                out.add(new ElementAllowances.Lumped(shipped.joint(joints.next())));
            } else if (e instanceof ProbeElement) {
                out.add(new ElementAllowances.Lumped(shipped.probeFixedLoss()));
            } else {
                out.add(new ElementAllowances.Exact());
            }
        }
        if (joints.hasNext()) {
            throw new IllegalArgumentException("more joint sources than joints on path '" + path.name() + "'");
        }
        return new PathAllowances(out);
    }
}
