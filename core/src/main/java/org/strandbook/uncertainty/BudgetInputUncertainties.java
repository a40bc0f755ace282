package org.strandbook.uncertainty;

import java.util.Objects;

/**
 * The uncertainty of every input of a point's loss budget, one {@link Allowance} each, kept in
 * one place so catalogs and single elements can carry their own later. {@link #SHIPPED} holds the
 * defaults with where each comes from.
 *
 * @param airGapConnectorPair loss of an unmeasured air-gap (SMA 905 class) mated pair, dB
 * @param contactConnectorPair loss of an unmeasured physical-contact pair or splice, dB
 * @param measuredJoint loss of a joint measured on site: the measurement's own uncertainty, dB
 * @param fiberLength cable length against the schedule, m
 * @param attenuation the fiber's attenuation model (Rayleigh, UV and IR edges, datasheet), relative
 * @param ohContent the fiber's OH content, relative to the grade's or datasheet's ppm
 * @param probeFixedLoss the probe's entered fixed loss, dB
 * @param bendRadius the recorded radius of the tightest bend, relative
 */
public record BudgetInputUncertainties(Allowance airGapConnectorPair, Allowance contactConnectorPair,
        Allowance measuredJoint, Allowance fiberLength, Allowance attenuation, Allowance ohContent,
        Allowance probeFixedLoss, Allowance bendRadius) {

    /** The shipped defaults; every one says where it comes from. */
    public static final BudgetInputUncertainties SHIPPED = new BudgetInputUncertainties(
            Allowance.rectangular("connector pair loss", "dB", 0, 0.5, BasisKind.FROM_MEMORY,
                    "SMA 905 class air-gap pairs measure about 0.5–1.5 dB: ±0.5 dB about the typical value"),
            Allowance.rectangular("connector pair loss", "dB", 0, 0.3, BasisKind.FROM_MEMORY,
                    "physical-contact pairs and splices vary by a few tenths of a dB: ±0.3 dB"),
            new Allowance("measured joint loss", "dB", 0, 0, 0.1, 0.1, true, BasisKind.DESIGN_CHOICE,
                    "0.1 dB standard uncertainty of an insertion-loss reading until the site states its own"),
            Allowance.rectangular("length", "m", 0.02, 0.1, BasisKind.DESIGN_CHOICE,
                    "schedule length ±2 % or ±0.1 m, whichever is larger"),
            Allowance.rectangular("attenuation", "relative", 0, 0.15, BasisKind.DESIGN_CHOICE,
                    "attenuation model or datasheet curve ±15 % (draw-to-draw spread and model fit)"),
            new Allowance("OH content", "relative", 0.5, 1.0, 0, 0, false, BasisKind.DESIGN_CHOICE,
                    "OH content from half to twice the grade's ppm: grades state a bound, not a value"),
            Allowance.rectangular("probe fixed loss", "dB", 0.2, 0.2, BasisKind.DESIGN_CHOICE,
                    "maker's fixed loss ±20 % or ±0.2 dB, whichever is larger"),
            Allowance.rectangular("bend radius", "relative", 0, 0.2, BasisKind.COMMON_PRACTICE,
                    "a routed radius recorded by eye, ±20 %"));

    public BudgetInputUncertainties {
        Objects.requireNonNull(airGapConnectorPair, "airGapConnectorPair");
        Objects.requireNonNull(contactConnectorPair, "contactConnectorPair");
        Objects.requireNonNull(measuredJoint, "measuredJoint");
        Objects.requireNonNull(fiberLength, "fiberLength");
        Objects.requireNonNull(attenuation, "attenuation");
        Objects.requireNonNull(ohContent, "ohContent");
        Objects.requireNonNull(probeFixedLoss, "probeFixedLoss");
        Objects.requireNonNull(bendRadius, "bendRadius");
    }

    /** The allowance that fits a joint resting on {@code source}. */
    public Allowance joint(JointSource source) {
        return switch (source) {
            case ASSUMED_AIR_GAP -> airGapConnectorPair;
            case ASSUMED_CONTACT -> contactConnectorPair;
            case MEASURED -> measuredJoint;
        };
    }
}
