package org.strandbook.app.ui.path;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Optional;

import org.strandbook.site.CableSegment;
import org.strandbook.site.Joint;
import org.strandbook.site.PathDirection;
import org.strandbook.site.PathElement;
import org.strandbook.site.PathLeg;

/**
 * A point's legs as the two sheets show them, and back. A leg interleaves segments and joints; the
 * sheets hold them apart, each row keeping its place in the leg, so that joining the sheets gives
 * the leg in the order light meets its elements.
 */
public final class LegRows {

    /** A point's legs as sheet rows: send leg first, then return, each in the order light meets them. */
    public record Split(List<LegSegment> segments, List<LegJoint> joints) {

        public Split {
            segments = List.copyOf(segments);
            joints = List.copyOf(joints);
        }
    }

    private record Placed(double position, int kindOrder, int row, PathElement element) {
    }

    private LegRows() {
    }

    public static Split split(List<PathLeg> legs) {
        List<LegSegment> segments = new ArrayList<>();
        List<LegJoint> joints = new ArrayList<>();
        for (PathDirection d : PathDirection.values()) {
            Optional<PathLeg> leg = legs.stream().filter(l -> l.direction() == d).findFirst();
            if (leg.isEmpty()) {
                continue;
            }
            List<PathElement> elements = leg.get().elements();
            for (int i = 0; i < elements.size(); i++) {
                if (elements.get(i) instanceof CableSegment s) {
                    segments.add(new LegSegment(d, i + 1, s));
                } else if (elements.get(i) instanceof Joint j) {
                    joints.add(new LegJoint(d, i + 1, j));
                }
            }
        }
        return new Split(segments, joints);
    }

    /**
     * The legs the rows describe: each direction's elements by place, a segment before a joint at
     * the same place, then in sheet order. A direction without rows has no leg.
     */
    public static List<PathLeg> join(String pointTag, List<LegSegment> segments, List<LegJoint> joints) {
        List<PathLeg> legs = new ArrayList<>();
        for (PathDirection d : PathDirection.values()) {
            List<Placed> placed = new ArrayList<>();
            for (int r = 0; r < segments.size(); r++) {
                LegSegment s = segments.get(r);
                if (s.direction() == d) {
                    placed.add(new Placed(s.position(), 0, r, s.segment()));
                }
            }
            for (int r = 0; r < joints.size(); r++) {
                LegJoint j = joints.get(r);
                if (j.direction() == d) {
                    placed.add(new Placed(j.position(), 1, r, j.joint()));
                }
            }
            if (placed.isEmpty()) {
                continue;
            }
            placed.sort(Comparator.comparingDouble(Placed::position).thenComparingInt(Placed::kindOrder)
                    .thenComparingInt(Placed::row));
            legs.add(new PathLeg(pointTag, d, placed.stream().map(Placed::element).toList()));
        }
        return legs;
    }

    /**
     * The place of a row inserted right after a row at {@code position}: halfway to the next row of
     * the same sheet and leg, and never past the next whole place, so that it lands before the
     * element of the other sheet that followed.
     */
    static double placeAfter(double position, List<Double> sameLegPlaces) {
        double next = sameLegPlaces.stream().mapToDouble(Double::doubleValue).filter(p -> p > position).min()
                .orElse(Double.POSITIVE_INFINITY);
        return position + Math.min(0.5, (next - position) / 2);
    }

    /**
     * The labels of the elements either side of joint {@code row}'s place: "C-1 → C-2", with
     * "analyzer" and "probe" at the ends of the legs.
     */
    public static String between(LegJoint joint, List<PathLeg> legs) {
        Optional<PathLeg> leg = legs.stream().filter(l -> l.direction() == joint.direction()).findFirst();
        if (leg.isEmpty()) {
            return "";
        }
        List<PathElement> elements = leg.get().elements();
        int at = -1;
        for (int i = 0; i < elements.size(); i++) {
            if (elements.get(i) == joint.joint()) {
                at = i;
                break;
            }
        }
        if (at < 0) {
            return "";
        }
        boolean send = joint.direction() == PathDirection.SEND;
        String before = at == 0 ? (send ? "analyzer" : "probe") : elements.get(at - 1).label();
        String after = at == elements.size() - 1 ? (send ? "probe" : "analyzer") : elements.get(at + 1).label();
        return before + " \u2192 " + after;
    }
}
