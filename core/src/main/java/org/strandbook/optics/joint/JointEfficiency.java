package org.strandbook.optics.joint;

import org.apache.commons.math3.analysis.UnivariateFunction;
import org.apache.commons.math3.analysis.integration.IterativeLegendreGaussIntegrator;
import org.apache.commons.math3.analysis.integration.UnivariateIntegrator;

/**
 * Power coupling efficiency η (0–1] of a joint between two multimode step-index fibers whose
 * modes are uniformly filled, from geometric optics. Loss in dB is −10·log₁₀ η.
 *
 * <h2>Phase-space derivation</h2>
 * A uniformly filled step-index fiber emits a uniform radiance L from every point of its core disc
 * (radius a) into every direction within the acceptance cone θₐ, sin θₐ = NA/n₀ in the gap medium
 * of index n₀. Describe a ray by its position x on the face and its direction sine vector
 * p = (sin θ cos φ, sin θ sin φ). Since d²p = sin θ cos θ dθ dφ = cos θ dΩ, a uniform radiance is
 * exactly a uniform density in (x, p): the emitted power fills the product of the core disc and the
 * disc |p| ≤ sin θₐ uniformly. The receiving fiber guides a ray when the ray hits its core and makes
 * an angle ≤ its own θₐ with its axis. η is the fraction of the emitted phase-space volume that
 * lands inside the accepted one:
 * <ul>
 * <li><b>Core mismatch</b>: position overlap of two concentric discs, (a₂/a₁)² when a₂ &lt; a₁.</li>
 * <li><b>NA mismatch</b>: direction overlap of two concentric discs, (NA₂/NA₁)² when NA₂ &lt; NA₁.</li>
 * <li><b>Lateral offset</b> d: overlap area of two circles of radius a whose centres are d apart,
 * divided by πa²: η = (2/π)[arccos u − u√(1 − u²)], u = d/2a (the textbook result, e.g. Keiser;
 * Senior, from memory).</li>
 * <li><b>End gap</b> s: a ray leaving at angle θ walks s·tan θ sideways before it reaches the
 * other face, so each direction sees the lateral-offset overlap at u = s·tan θ/2a and the directions
 * are weighted uniformly in p: η = (2/sin²θₐ)∫₀^θₐ η_offset(s·tan θ/2a) sin θ cos θ dθ. It falls as
 * 1 − (4/3π)·s·NA/(a·n₀) for small gaps and toward (a·n₀/(s·NA))² for large ones.</li>
 * <li><b>Angular tilt</b> τ of the receiving axis: positions still overlap fully; a direction at
 * (θ, φ) from the emitting axis makes an angle with the tilted axis whose cosine is
 * cos θ cos τ + sin θ sin τ cos φ, and is accepted when that angle is ≤ θₐ, i.e. for
 * |φ| ≤ φ₀(θ) = arccos[(cos θₐ − cos θ cos τ)/(sin θ sin τ)]. With the cos θ dΩ weighting,
 * η = (1/(π sin²θₐ))∫₀^θₐ 2φ₀(θ) sin θ cos θ dθ: exact for the two cones on the direction sphere,
 * it tends to the offset formula with u = τ/2θₐ for small angles and to zero at τ = 2θₐ.</li>
 * </ul>
 * Textbooks quote gap and tilt formulas that differ from each other by factors of two; these are
 * the geometric results for a fully filled fiber, a worst case (a fiber that is not fully filled
 * loses less). Combined misalignments are multiplied as independent factors, which is exact for a
 * single misalignment and an approximation for several; Fresnel reflection is counted separately.
 */
public final class JointEfficiency {

    private static final double RELATIVE_ACCURACY = 1e-9;
    private static final double ABSOLUTE_ACCURACY = 1e-13;
    private static final int MAX_EVALUATIONS = 2_000_000;

    private JointEfficiency() {
    }

    /** Efficiency → loss in dB, −10·log₁₀ η. */
    public static double lossDb(double efficiency) {
        if (!(efficiency > 0 && efficiency <= 1.0 + 1e-12)) {
            throw new IllegalArgumentException("coupling efficiency must lie in (0, 1], was " + efficiency);
        }
        return -10.0 * Math.log10(Math.min(1.0, efficiency));
    }

    /** Core-diameter mismatch: (d₂/d₁)² from a larger to a smaller core, 1 the other way. */
    public static double coreMismatch(double coreUmFrom, double coreUmTo) {
        requirePositive(coreUmFrom, "core diameter (µm)");
        requirePositive(coreUmTo, "core diameter (µm)");
        double r = coreUmTo / coreUmFrom;
        return r < 1 ? r * r : 1.0;
    }

    /** NA mismatch: (NA₂/NA₁)² from a larger to a smaller NA, 1 the other way. */
    public static double naMismatch(double naFrom, double naTo) {
        requireNa(naFrom);
        requireNa(naTo);
        double r = naTo / naFrom;
        return r < 1 ? r * r : 1.0;
    }

    /**
     * Lateral offset {@code offsetUm} between equal cores of diameter {@code coreUm}:
     * (2/π)[arccos u − u√(1 − u²)], u = offset/coreDiameter.
     *
     * @throws IllegalArgumentException when the offset is not smaller than the core diameter
     */
    public static double lateralOffset(double offsetUm, double coreUm) {
        requirePositive(coreUm, "core diameter (µm)");
        requireNonNegative(offsetUm, "lateral offset (µm)");
        if (offsetUm >= coreUm) {
            throw new IllegalArgumentException("lateral offset " + offsetUm + " µm is not smaller than the core diameter "
                    + coreUm + " µm: no light couples");
        }
        return offsetOverlap(offsetUm / coreUm);
    }

    /** Overlap fraction of two equal circles at normalised centre distance u = d/2a (0 for u ≥ 1). */
    static double offsetOverlap(double u) {
        if (u >= 1.0) {
            return 0.0;
        }
        if (u <= 0.0) {
            return 1.0;
        }
        return 2.0 / Math.PI * (Math.acos(u) - u * Math.sqrt(1.0 - u * u));
    }

    /**
     * End gap {@code gapUm} between equal fibers (core {@code coreUm}, NA {@code na}) filled with a
     * medium of index {@code gapIndex}; see the class comment for the derivation.
     */
    public static double endGap(double gapUm, double coreUm, double na, double gapIndex) {
        requireNonNegative(gapUm, "end gap (µm)");
        requirePositive(coreUm, "core diameter (µm)");
        requireNa(na);
        requireGapIndex(na, gapIndex);
        if (gapUm == 0) {
            return 1.0;
        }
        double thetaA = Math.asin(na / gapIndex);
        double sin2 = Math.sin(thetaA) * Math.sin(thetaA);
        double twoA = coreUm;
        // beyond θ* = atan(2a/s) a ray misses the other core entirely
        double upper = Math.min(thetaA, Math.atan(twoA / gapUm));
        double integral = integrate(theta -> offsetOverlap(gapUm * Math.tan(theta) / twoA)
                * Math.sin(theta) * Math.cos(theta), 0, upper);
        return 2.0 * integral / sin2;
    }

    /**
     * Angular tilt {@code tiltDeg} between the axes of equal fibers of numerical aperture {@code na}
     * in a gap medium of index {@code gapIndex}; see the class comment for the derivation.
     *
     * @throws IllegalArgumentException when the tilt reaches twice the acceptance half-angle
     */
    public static double tilt(double tiltDeg, double na, double gapIndex) {
        requireNonNegative(tiltDeg, "tilt (°)");
        requireNa(na);
        requireGapIndex(na, gapIndex);
        if (tiltDeg == 0) {
            return 1.0;
        }
        double thetaA = Math.asin(na / gapIndex);
        double tau = Math.toRadians(tiltDeg);
        if (tau >= 2 * thetaA) {
            throw new IllegalArgumentException("tilt " + tiltDeg + "° reaches twice the acceptance half-angle "
                    + Math.toDegrees(thetaA) + "°: no light couples");
        }
        double cosA = Math.cos(thetaA);
        double cosT = Math.cos(tau);
        double sinT = Math.sin(tau);
        UnivariateFunction f = theta -> {
            double s = Math.sin(theta);
            double c = Math.cos(theta);
            double x0 = (cosA - c * cosT) / (s * sinT);
            double phi0 = x0 <= -1 ? Math.PI : x0 >= 1 ? 0 : Math.acos(x0);
            return 2.0 * phi0 * s * c;
        };
        // the accepted arc is full below θₐ − τ and empty below τ − θₐ: integrate the pieces apart
        double kink = Math.abs(thetaA - tau);
        double integral;
        if (kink > 0 && kink < thetaA) {
            integral = integrate(f, 0, kink) + integrate(f, kink, thetaA);
        } else {
            integral = integrate(f, 0, thetaA);
        }
        double sin2 = Math.sin(thetaA) * Math.sin(thetaA);
        return integral / (Math.PI * sin2);
    }

    private static double integrate(UnivariateFunction f, double lo, double hi) {
        if (hi <= lo) {
            return 0;
        }
        UnivariateIntegrator integrator = new IterativeLegendreGaussIntegrator(8, RELATIVE_ACCURACY, ABSOLUTE_ACCURACY);
        return integrator.integrate(MAX_EVALUATIONS, f, lo, hi);
    }

    private static void requireNa(double na) {
        if (!(na > 0 && na < 1)) {
            throw new IllegalArgumentException("NA must lie between 0 and 1 exclusive, was " + na);
        }
    }

    private static void requireGapIndex(double na, double gapIndex) {
        if (!(gapIndex >= 1.0) || !Double.isFinite(gapIndex)) {
            throw new IllegalArgumentException("gap medium index must be a number ≥ 1, was " + gapIndex);
        }
        if (!(na < gapIndex)) {
            throw new IllegalArgumentException("NA " + na + " must be below the gap medium index " + gapIndex);
        }
    }

    private static void requirePositive(double v, String what) {
        if (!(v > 0) || !Double.isFinite(v)) {
            throw new IllegalArgumentException(what + " must be a positive number, was " + v);
        }
    }

    private static void requireNonNegative(double v, String what) {
        if (!(v >= 0) || !Double.isFinite(v)) {
            throw new IllegalArgumentException(what + " must be a finite number ≥ 0, was " + v);
        }
    }
}
