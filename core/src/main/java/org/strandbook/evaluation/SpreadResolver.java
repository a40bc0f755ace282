package org.strandbook.evaluation;

import java.util.Objects;

import org.strandbook.site.CableSegment;
import org.strandbook.site.Catalog;
import org.strandbook.site.ConnectorType;
import org.strandbook.site.FiberType;
import org.strandbook.site.Joint;
import org.strandbook.site.LossBasis;
import org.strandbook.site.ProbeType;
import org.strandbook.site.SpreadInput;
import org.strandbook.site.StatedSpread;
import org.strandbook.site.StatedSpreads;
import org.strandbook.uncertainty.Allowance;
import org.strandbook.uncertainty.BasisKind;
import org.strandbook.uncertainty.BudgetInputUncertainties;
import org.strandbook.uncertainty.ElementAllowances;
import org.strandbook.uncertainty.JointSource;

/**
 * The allowance each input of a point's budget takes: the element's own stated spread, else its
 * catalog row's, else the shipped default (design choice: the nearer statement is the better
 * informed one: a joint's own reading knows more than its connector type's datasheet). Each
 * allowance says in its basis text which of the three it came from.
 */
public final class SpreadResolver {

    private final Catalog catalog;
    private final BudgetInputUncertainties defaults;

    SpreadResolver(Catalog catalog, BudgetInputUncertainties defaults) {
        this.catalog = Objects.requireNonNull(catalog, "catalog");
        this.defaults = Objects.requireNonNull(defaults, "defaults");
    }

    /** A joint's loss: its own spread, its connector types' (if not measured), or the shipped default. */
    ElementAllowances.Lumped joint(Joint joint) {
        boolean measured = joint.lossDb().isPresent() && joint.lossBasis() == LossBasis.MEASURED;
        ConnectorType a = catalog.connector(joint.connectorTypeA());
        ConnectorType b = catalog.connector(joint.connectorTypeB());
        Allowance shipped = defaults.joint(measured ? JointSource.MEASURED
                : a.airGap() || b.airGap() ? JointSource.ASSUMED_AIR_GAP : JointSource.ASSUMED_CONTACT);
        StatedSpread own = joint.spreads().of(SpreadInput.JOINT_LOSS).orElse(null);
        if (own != null) {
            String how = measured ? "measured, " : "";
            return new ElementAllowances.Lumped(stated(own, shipped, 0, measured ? BasisKind.MEASURED
                    : BasisKind.STATED, "element " + joint.label() + ": " + how + own, joint.spreads()));
        }
        // the upstream type speaks for the pair unless only the downstream one states a spread
        ConnectorType type = a.spreads().of(SpreadInput.CONNECTOR_LOSS).isPresent() ? a : b;
        StatedSpread typed = type.spreads().of(SpreadInput.CONNECTOR_LOSS).orElse(null);
        if (!measured && typed != null) {
            return new ElementAllowances.Lumped(stated(typed, shipped, type.typicalLossDb(), BasisKind.STATED,
                    "connector type " + type.code() + ": " + typed, type.spreads()));
        }
        return new ElementAllowances.Lumped(shipped);
    }

    /** A cable run: length and bend radius from the element, attenuation and OH content from its fiber type. */
    ElementAllowances.Fiber segment(CableSegment segment, double tightestRadiusMm) {
        FiberType fiber = catalog.fiber(segment.fiberTypeCode());
        String element = "element " + segment.label() + ": ";
        String type = "fiber type " + fiber.code() + ": ";
        return new ElementAllowances.Fiber(
                pick(segment.spreads(), SpreadInput.LENGTH, defaults.fiberLength(), segment.lengthM(), element),
                pick(fiber.spreads(), SpreadInput.ATTENUATION, defaults.attenuation(), 1, type),
                pick(fiber.spreads(), SpreadInput.OH_CONTENT, defaults.ohContent(), fiber.ohPpm(), type),
                pick(segment.spreads(), SpreadInput.BEND_RADIUS, defaults.bendRadius(), tightestRadiusMm, element));
    }

    /** A probe's fixed loss: its probe type's spread or the shipped default. */
    ElementAllowances.Lumped probe(ProbeType probe) {
        return new ElementAllowances.Lumped(pick(probe.spreads(), SpreadInput.PROBE_FIXED_LOSS,
                defaults.probeFixedLoss(), probe.fixedLossDb(), "probe type " + probe.code() + ": "));
    }

    /**
     * A basis that opens with the project's own labels ("from memory", "common practice", "design
     * choice") is counted as that kind, so a shipped or site row can say how firm its figure is.
     */
    static BasisKind kindOf(String basis) {
        String b = basis.toLowerCase(java.util.Locale.ROOT);
        if (b.startsWith("from memory")) {
            return BasisKind.FROM_MEMORY;
        }
        if (b.startsWith("common practice")) {
            return BasisKind.COMMON_PRACTICE;
        }
        if (b.startsWith("design choice")) {
            return BasisKind.DESIGN_CHOICE;
        }
        return BasisKind.STATED;
    }

    private static Allowance pick(StatedSpreads spreads, SpreadInput input, Allowance shipped, double nominal,
            String where) {
        return spreads.of(input).map(s -> stated(s, shipped, nominal, BasisKind.STATED, where + s, spreads))
                .orElse(shipped);
    }

    /**
     * The stated spread as an allowance shaped like the shipped one (same input name and unit).
     *
     * @param nominal the entered value in the spread's own unit (ppm, mm, dB), for a range or for a
     *        spread in that unit of an input the budget treats as relative
     */
    public static Allowance stated(StatedSpread spread, Allowance like, double nominal, BasisKind given, String text,
            StatedSpreads owner) {
        BasisKind kind = given == BasisKind.STATED ? kindOf(owner.basis()) : given;
        String basis = text + (owner.basis().isEmpty() ? " (no basis given)" : ", " + owner.basis());
        boolean relativeInput = like.unit().equals("relative");
        double below;
        double above;
        if (spread.form() == StatedSpread.Form.RANGE) {
            below = Math.max(0, nominal - spread.low());
            above = Math.max(0, spread.high() - nominal);
        } else {
            below = spread.low();
            above = spread.high();
        }
        if (spread.relative()) {
            return new Allowance(like.what(), like.unit(), below / 100, above / 100, 0, 0, spread.normal(), kind,
                    basis);
        }
        if (relativeInput) {
            double f = nominal > 0 ? 1 / nominal : 0;
            return new Allowance(like.what(), like.unit(), below * f, above * f, 0, 0, spread.normal(), kind, basis);
        }
        return new Allowance(like.what(), like.unit(), 0, 0, below, above, spread.normal(), kind, basis);
    }
}
