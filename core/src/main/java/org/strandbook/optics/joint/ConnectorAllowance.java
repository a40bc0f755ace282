package org.strandbook.optics.joint;

import java.util.Objects;

/**
 * An entered loss for a mated connector pair, standing for everything extrinsic (misalignment, air
 * gap, Fresnel, end-face condition); a core or NA mismatch between the fibers is added on top.
 *
 * @param lossDb loss of the mated pair (dB), ≥ 0
 * @param basis where the number comes from, shown in reports
 */
public record ConnectorAllowance(double lossDb, String basis) implements JointMechanics {

    /** 0.75 dB per mated pair: telecom cabling allowance (from memory: ANSI/TIA-568.3-D). */
    public static final ConnectorAllowance TIA_568_MATED_PAIR =
            new ConnectorAllowance(0.75, "0.75 dB per mated pair, TIA-568 cabling allowance (from memory)");

    /** About 1 dB for an SMA 905 class large-core pair with its air gap (from memory: 0.5–1.5 dB). */
    public static final ConnectorAllowance SMA_905_TYPICAL =
            new ConnectorAllowance(1.0, "about 1 dB per SMA 905 class mated pair incl. air gap (from memory)");

    /** The default for an unmeasured connector of a process light path: the SMA 905 class value. */
    public static final ConnectorAllowance DEFAULT = SMA_905_TYPICAL;

    public ConnectorAllowance {
        if (!(lossDb >= 0) || !Double.isFinite(lossDb)) {
            throw new IllegalArgumentException("connector loss must be a finite number ≥ 0 dB, was " + lossDb);
        }
        Objects.requireNonNull(basis, "basis");
    }

    /** A loss entered by the user, e.g. from a measurement or a datasheet. */
    public static ConnectorAllowance entered(double lossDb) {
        return new ConnectorAllowance(lossDb, "entered");
    }
}
