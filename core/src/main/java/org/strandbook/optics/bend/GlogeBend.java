package org.strandbook.optics.bend;

import java.util.Objects;

import org.strandbook.optics.FiberGeometry;
import org.strandbook.optics.OpticalMaterial;
import org.strandbook.optics.WavelengthGrid;

/**
 * Macrobending loss of a fully filled multimode step-index fiber after D. Gloge, "Bending loss in
 * multimode fibers with graded and ungraded core index", Appl. Opt. 11, 2506 (1972) (formula cited
 * from memory): the fraction of modes still guided in a bend of radius R is
 * <pre>
 *   M_eff/M_∞ = 1 − [(α+2)/(2αΔ)]·[2a/R + (3/(2·n₂·k·R))^(2/3)]
 * </pre>
 * with α → ∞ for a step index (prefactor 1/(2Δ)), a the core radius, Δ = NA²/(2n₁²), n₂ the
 * cladding index and k = 2π/λ. The loss −10·log₁₀(M_eff/M_∞) assumes every mode carries equal
 * power: a worst case. The second term makes the loss grow with wavelength; for large cores the
 * first dominates.
 *
 * <p>When the bracket drives the ratio toward or below zero the formula has left its range; the
 * ratio is then clamped to {@link #MIN_GUIDED_FRACTION} (30 dB) and the result flagged.
 *
 * <p><b>Several bends: the tightest is charged once.</b> Gloge's ratio is the share of modes a bend
 * of radius R cannot guide, for a fully filled fiber. Those modes leave within the first bend at
 * that radius; a later bend at the same or a larger radius finds them already gone and, by the same
 * formula, takes nothing more. They come back only through mode coupling, which in a step-index
 * silica fiber with a smooth route is weak over the lengths of a plant loop (D. Gloge, "Optical
 * power flow in multimode fibers", Bell Syst. Tech. J. 51, 1767 (1972), which relates the coupling
 * to random bends of the fiber axis; page and the size of the coupling from memory). The trade uses exactly this when it strips high-order modes with a
 * mandrel wrap: on a fully filled fiber the first turns remove them and further turns add little
 * (FED-STD-1037C, "mandrel wrapping"). So a segment is charged the Gloge loss of its tightest bend
 * once ({@link #chargedBends(int)}); charging every bend would multiply a worst case that is only
 * reached once.
 */
public final class GlogeBend {

    /** Smallest guided fraction reported: the ratio is clamped here (30 dB) and flagged. */
    public static final double MIN_GUIDED_FRACTION = 1e-3;

    private GlogeBend() {
    }

    /**
     * How many bends of a run are charged the Gloge loss of its tightest radius: one when any bend
     * is recorded, none otherwise (see the class comment for why).
     *
     * @param recordedBends bends recorded on one run of fiber, ≥ 0
     */
    public static int chargedBends(int recordedBends) {
        if (recordedBends < 0) {
            throw new IllegalArgumentException("bend count must not be negative, was " + recordedBends);
        }
        return recordedBends == 0 ? 0 : 1;
    }

    /**
     * Loss of one bend.
     *
     * @param coreUm core diameter (µm)
     * @param na numerical aperture
     * @param coreIndex core index n₁ at the wavelength
     * @param bendRadiusMm bend radius to the fiber axis (mm), positive
     * @param wavelengthNm vacuum wavelength (nm)
     */
    public static BendLoss lossPerBend(double coreUm, double na, double coreIndex, double bendRadiusMm,
            double wavelengthNm) {
        if (!(coreUm > 0) || !Double.isFinite(coreUm)) {
            throw new IllegalArgumentException("core diameter must be a positive number, was " + coreUm + " µm");
        }
        if (!(bendRadiusMm > 0) || !Double.isFinite(bendRadiusMm)) {
            throw new IllegalArgumentException("bend radius must be a positive number, was " + bendRadiusMm + " mm");
        }
        if (!(wavelengthNm > 0)) {
            throw new IllegalArgumentException("wavelength must be positive, was " + wavelengthNm + " nm");
        }
        double n2 = FiberGeometry.claddingIndex(coreIndex, na);
        double delta = FiberGeometry.relativeIndexDifference(coreIndex, na);
        double radiusM = bendRadiusMm * 1e-3;
        double coreRadiusM = coreUm * 0.5e-6;
        double k = 2.0 * Math.PI / (wavelengthNm * 1e-9);
        double bracket = 2.0 * coreRadiusM / radiusM + Math.pow(3.0 / (2.0 * n2 * k * radiusM), 2.0 / 3.0);
        double ratio = 1.0 - bracket / (2.0 * delta);
        boolean clamped = ratio < MIN_GUIDED_FRACTION;
        double used = clamped ? MIN_GUIDED_FRACTION : ratio;
        return new BendLoss(-10.0 * Math.log10(used), used, clamped);
    }

    /** Loss of one bend at every grid point, the core index taken from {@code coreMaterial}. */
    public static BendLossSpectrum lossPerBend(double coreUm, double na, OpticalMaterial coreMaterial,
            double bendRadiusMm, WavelengthGrid grid) {
        Objects.requireNonNull(coreMaterial, "coreMaterial");
        double[] n1 = coreMaterial.refractiveIndex(grid);
        double[] loss = new double[grid.size()];
        int clamped = 0;
        for (int i = 0; i < loss.length; i++) {
            BendLoss b = lossPerBend(coreUm, na, n1[i], bendRadiusMm, grid.wavelengthNm(i));
            loss[i] = b.lossDb();
            if (b.clamped()) {
                clamped++;
            }
        }
        return new BendLossSpectrum(loss, clamped);
    }
}
