package org.strandbook.optics;

/**
 * Fresnel reflection at normal incidence between two media, and the loss of the faces a light
 * path crosses.
 *
 * <p>R = ((n₁ − n₀)/(n₁ + n₀))² for one face (Fresnel; e.g. M. Born and E. Wolf, "Principles of
 * Optics", normal-incidence limit); one face passes 1 − R.
 *
 * <p><b>Two faces</b> (a connector air gap, an uncoated window) are counted with incoherent
 * multiple reflections: T = (1 − R₁)(1 − R₂)/(1 − R₁R₂), for equal faces (1 − R)/(1 + R). Why not the
 * single-pass (1 − R)²: the two faces of a gap or window are parallel and close, so the light
 * bounced back and forth between them stays inside the receiving core's acceptance and still
 * arrives; a lamp's short coherence length and the gap's variation across a large core wash out the
 * etalon fringes, leaving the incoherent sum. For silica in air the two formulas differ by about
 * 0.005 dB, the incoherent one being the smaller loss.
 */
public final class Fresnel {

    private Fresnel() {
    }

    /** Normal-incidence power reflectance (0–1) of the face between indices n1 and n0. */
    public static double reflectance(double n1, double n0) {
        requireIndex(n1);
        requireIndex(n0);
        double r = (n1 - n0) / (n1 + n0);
        return r * r;
    }

    /** Loss of one face in dB: −10·log₁₀(1 − R). */
    public static double faceLossDb(double n1, double n0) {
        return -10.0 * Math.log10(1.0 - reflectance(n1, n0));
    }

    /**
     * Loss in dB of two parallel faces with incoherent multiple reflections between them:
     * −10·log₁₀[(1 − R₁)(1 − R₂)/(1 − R₁R₂)].
     */
    public static double facePairLossDb(double reflectance1, double reflectance2) {
        double t = (1.0 - reflectance1) * (1.0 - reflectance2) / (1.0 - reflectance1 * reflectance2);
        return -10.0 * Math.log10(t);
    }

    /** Loss in dB of a gap of index n0 between two glasses of index n1: (1 − R)/(1 + R). */
    public static double gapLossDb(double n1, double n0) {
        double r = reflectance(n1, n0);
        return facePairLossDb(r, r);
    }

    /** The same gap counted single-pass, (1 − R)², for comparison: −20·log₁₀(1 − R). */
    public static double gapLossDbSinglePass(double n1, double n0) {
        return 2.0 * faceLossDb(n1, n0);
    }

    /**
     * Loss in dB of {@code faceCount} faces between {@code glass} and {@code outside} crossed in
     * sequence, grouped in pairs (each pair a window or gap, incoherent) plus one single face if
     * the count is odd.
     */
    public static double facesLossDb(double nGlass, double nOutside, int faceCount) {
        if (faceCount < 0) {
            throw new IllegalArgumentException("face count must not be negative, was " + faceCount);
        }
        return (faceCount / 2) * gapLossDb(nGlass, nOutside)
                + (faceCount % 2) * faceLossDb(nGlass, nOutside);
    }

    /** Loss spectrum (dB) of one face between two materials on a grid. */
    public static double[] faceLossDb(OpticalMaterial glass, OpticalMaterial outside, WavelengthGrid grid) {
        return facesLossDb(glass, outside, 1, grid);
    }

    /** Loss spectrum (dB) of {@code faceCount} faces as {@link #facesLossDb(double, double, int)}. */
    public static double[] facesLossDb(OpticalMaterial glass, OpticalMaterial outside, int faceCount,
            WavelengthGrid grid) {
        double[] n1 = glass.refractiveIndex(grid);
        double[] n0 = outside.refractiveIndex(grid);
        double[] loss = new double[grid.size()];
        for (int i = 0; i < loss.length; i++) {
            loss[i] = facesLossDb(n1[i], n0[i], faceCount);
        }
        return loss;
    }

    /**
     * Loss spectrum (dB) of a gap between two glasses (each its own index) filled with
     * {@code gapMedium}, incoherent multiple reflections.
     */
    public static double[] gapLossDb(OpticalMaterial glassBefore, OpticalMaterial gapMedium,
            OpticalMaterial glassAfter, WavelengthGrid grid) {
        double[] n1 = glassBefore.refractiveIndex(grid);
        double[] n0 = gapMedium.refractiveIndex(grid);
        double[] n2 = glassAfter.refractiveIndex(grid);
        double[] loss = new double[grid.size()];
        for (int i = 0; i < loss.length; i++) {
            loss[i] = facePairLossDb(reflectance(n1[i], n0[i]), reflectance(n2[i], n0[i]));
        }
        return loss;
    }

    /**
     * Fringe spacing in nm of the etalon formed by a clean gap or crack: Δλ = λ²/(2·n·d).
     *
     * @param gapIndex index of the medium in the gap
     * @param gapUm gap thickness in µm, positive
     */
    public static double etalonFringeSpacingNm(double wavelengthNm, double gapIndex, double gapUm) {
        if (!(gapUm > 0)) {
            throw new IllegalArgumentException("gap must be positive, was " + gapUm + " µm");
        }
        return wavelengthNm * wavelengthNm / (2.0 * gapIndex * gapUm * 1e3);
    }

    /** Fringe spacing in cm⁻¹ of the same etalon: Δν̃ = 1/(2·n·d), independent of wavelength. */
    public static double etalonFringeSpacingCm(double gapIndex, double gapUm) {
        if (!(gapUm > 0)) {
            throw new IllegalArgumentException("gap must be positive, was " + gapUm + " µm");
        }
        return 1.0 / (2.0 * gapIndex * gapUm * 1e-4);
    }

    private static void requireIndex(double n) {
        if (!(n >= 1.0) || !Double.isFinite(n)) {
            throw new IllegalArgumentException("refractive index must be a number ≥ 1, was " + n);
        }
    }
}
