package org.strandbook.samplesite;

/**
 * Light through a faulty loop and how a spectrometer records it, written for the tests apart from
 * the diagnoser: none of its band shapes, widths or ratios come from {@code AttenuationShapes} or
 * from the diagnoser's basis, so a diagnosis that only inverts its own shapes fails here.
 *
 * <p>Each shape is a published functional form with parameters recalled or chosen here, labelled
 * as such. Where real glass varies (band ratios, tail slopes), the recovery test draws the
 * parameter per seed rather than fixing it, so the diagnosis cannot lean on one value.
 */
final class IndependentLoopModel {

    /** Counts: a 16-bit converter's full scale. */
    static final double FULL_SCALE_COUNTS = 65_535;
    /** Counts: the dark offset of the converter (design choice of this model). */
    static final double DARK_OFFSET_COUNTS = 1_000;
    /** Counts RMS: read noise (design choice of this model, typical of InGaAs arrays: from memory). */
    static final double READ_NOISE_COUNTS = 6;
    /** Photo-electrons per count: sets the shot noise (design choice of this model). */
    static final double ELECTRONS_PER_COUNT = 8;
    /** Refractive index of fused silica near 1.3 µm, 1.447 (from memory; Malitson 1965 gives 1.4469 at 1300 nm). */
    static final double SILICA_INDEX = 1.447;

    // second radiation constant c₂ = hc/k, µm·K (CODATA 2018)
    private static final double C2_UM_K = 14387.76877;

    private IndependentLoopModel() {
    }

    /** Planck's spectral radiance per unit wavelength, up to a constant (Planck, Ann. Phys. 4, 553 (1901)). */
    static double planck(double wavelengthNm, double temperatureK) {
        double um = wavelengthNm * 1e-3;
        return Math.pow(um, -5) / Math.expm1(C2_UM_K / (um * temperatureK));
    }

    /**
     * Relative response of an extended InGaAs detector: rising from 900 nm, falling off at its
     * ≈2.55 µm cut-off (a smooth curve of this model's own, shaped after makers' published curves
     * from memory).
     */
    static double extendedIngaasResponse(double wavelengthNm) {
        double rise = 1 - Math.exp(-Math.max(0, wavelengthNm - 850) / 180);
        double cutoff = 1 / (1 + Math.exp((wavelengthNm - 2540) / 22));
        return rise * cutoff * (0.5 + 0.5 * wavelengthNm / 2500);
    }

    /** Relative response of a silicon detector: a broad hump near 800 nm, gone by 1150 nm (this model's own). */
    static double siliconResponse(double wavelengthNm) {
        double x = (wavelengthNm - 800) / 260;
        double cutoff = 1 / (1 + Math.exp((wavelengthNm - 1080) / 25));
        return Math.exp(-x * x * x * x) * cutoff + 1e-3;
    }

    /**
     * Loss of OH in silica, dB, for {@code ppmKm} ppm·km: a comb of asymmetric pseudo-Voigt bands in
     * wavenumber (30 % Lorentzian: real band wings fall slower than a Gaussian's). Positions are the
     * silica OH fundamental (2.72 µm) with its combination (2.21 µm) and overtones (1.38, 1.24,
     * 0.945 µm), as commonly tabulated (from memory). Peak strengths in
     * dB/km/ppm: 1.38 µm ≈ 60, 1.24 µm ≈ 2.5, 0.945 µm ≈ 1 (from memory), 2.21 µm ≈ 200 (from
     * memory), 2.72 µm ≈ 10,000 (from memory: molar absorptivity ≈ 77 L·mol⁻¹·cm⁻¹ and silica's
     * density 2.2 g/cm³). Widths and the red-side stretch are this model's own.
     */
    static double ohLossDb(double wavelengthNm, double ppmKm) {
        double k = 1e7 / wavelengthNm;
        double perPpmKm = 10_000 * pseudoVoigt(k, 3673, 40, 70)
                + 200 * pseudoVoigt(k, 4525, 55, 80)
                + 60 * pseudoVoigt(k, 7236, 60, 85)
                + 2.5 * pseudoVoigt(k, 8065, 110, 140)
                + 1.0 * pseudoVoigt(k, 10_582, 120, 150);
        return ppmKm * perPpmKm;
    }

    /**
     * Loss of molecular hydrogen dissolved in the glass, dB, scaled to {@code at1240Db} at the
     * 1.24 µm overtone peak; the fundamental near 2.42 µm is {@code ratio2420} times stronger at its
     * peak. Weaker overtone lines near 1.08, 1.13 and 1.17 µm ride with it (positions from memory:
     * J. Stone, "Interactions of hydrogen and deuterium with silica optical fibers: a review",
     * J. Lightwave Technol. 5, 712 (1987)). Line heights and widths are this model's own.
     */
    static double hydrogenLossDb(double wavelengthNm, double at1240Db, double ratio2420) {
        double k = 1e7 / wavelengthNm;
        double shape = pseudoVoigt(k, 8065, 45, 45)
                + 0.25 * pseudoVoigt(k, 8547, 40, 40)
                + 0.4 * pseudoVoigt(k, 8850, 40, 40)
                + 0.15 * pseudoVoigt(k, 9260, 40, 40)
                + ratio2420 * pseudoVoigt(k, 4132, 35, 35);
        double peak = pseudoVoigt(8065, 8065, 45, 45) + 0.25 * pseudoVoigt(8065, 8547, 40, 40)
                + 0.4 * pseudoVoigt(8065, 8850, 40, 40) + 0.15 * pseudoVoigt(8065, 9260, 40, 40)
                + ratio2420 * pseudoVoigt(8065, 4132, 35, 35);
        return at1240Db * shape / peak;
    }

    /**
     * Radiation-induced loss, dB, scaled to {@code at600Db} at 600 nm: an Urbach edge in photon
     * energy, α ∝ exp(E/E_u) (Urbach, Phys. Rev. 92, 1324 (1953)), the visible tail of the UV
     * colour-centre bands, plus the non-bridging-oxygen hole centre band near 1.9–2.0 eV as a
     * Gaussian in energy (position from memory: Griscom, J. Ceram. Soc. Jpn. 99, 923 (1991)).
     * {@code urbachEv} and the band's share vary from glass to glass and dose to dose.
     */
    static double darkeningLossDb(double wavelengthNm, double at600Db, double urbachEv, double nbohcShare) {
        return at600Db * rawDarkening(wavelengthNm, urbachEv, nbohcShare)
                / rawDarkening(600, urbachEv, nbohcShare);
    }

    private static double rawDarkening(double wavelengthNm, double urbachEv, double nbohcShare) {
        double e = 1239.84198 / wavelengthNm;
        double d = (e - 1.95) / 0.2;
        return Math.exp((e - 2.07) / urbachEv) + nbohcShare * Math.exp(-4 * Math.log(2) * d * d);
    }

    /**
     * Loss of one bend of radius {@code radiusMm} in a step-index multimode fiber with all modes
     * filled, dB: the guided-mode fraction 1 − (1/2Δ)·[2a/R + (3/(2·n₂·k·R))^(2/3)] of D. Gloge,
     * "Bending loss in multimode fibers with graded and ungraded core index", Appl. Opt. 11, 2506
     * (1972), eq. for α → ∞, with Δ ≈ NA²/(2n₁²).
     */
    static double glogeBendLossDb(double wavelengthNm, double coreUm, double na, double radiusMm) {
        double n1 = SILICA_INDEX;
        double delta = na * na / (2 * n1 * n1);
        double n2 = n1 * (1 - delta);
        double radiusUm = radiusMm * 1e3;
        double k = 2 * Math.PI / (wavelengthNm * 1e-3);
        double kept = 1 - (1 / (2 * delta)) * (coreUm / radiusUm + Math.pow(3 / (2 * n2 * k * radiusUm), 2.0 / 3));
        return -10 * Math.log10(Math.max(kept, 1e-9));
    }

    /**
     * An air gap between two silica faces as an etalon, relative to the same two faces summed
     * without interference: dB of extra loss (negative where the fringe transmits more). Airy's
     * transmission T = (1 − R)²/(1 + R² − 2R·cos δ), δ = 4π·d·ν̃ at normal incidence (Born &amp; Wolf,
     * "Principles of Optics", §7.6.1), with R = ((n − 1)/(n + 1))² (Fresnel). Multimode light
     * crosses the gap at many angles and with short coherence, so only a share {@code visibility}
     * of it interferes; the rest adds as the incoherent (1 − R)/(1 + R).
     */
    static double airyGapLossDb(double wavelengthNm, double gapUm, double visibility) {
        double r = Math.pow((SILICA_INDEX - 1) / (SILICA_INDEX + 1), 2);
        double nuCm = 1e7 / wavelengthNm;
        double delta = 4 * Math.PI * gapUm * 1e-4 * nuCm;
        double airy = (1 - r) * (1 - r) / (1 + r * r - 2 * r * Math.cos(delta));
        double incoherent = (1 - r) / (1 + r);
        double t = visibility * airy + (1 - visibility) * incoherent;
        return -10 * Math.log10(t / incoherent);
    }

    /** Peak-to-peak of {@link #airyGapLossDb} over a fringe, dB. */
    static double airyPeakToPeakDb(double visibility) {
        double r = Math.pow((SILICA_INDEX - 1) / (SILICA_INDEX + 1), 2);
        double incoherent = (1 - r) / (1 + r);
        double max = visibility * (1 - r) * (1 - r) / ((1 - r) * (1 - r)) + (1 - visibility) * incoherent;
        double min = visibility * (1 - r) * (1 - r) / ((1 + r) * (1 + r)) + (1 - visibility) * incoherent;
        return 10 * Math.log10(max / min);
    }

    /** Unit-peak pseudo-Voigt in wavenumber, half widths at half maximum differing on the two sides. */
    private static double pseudoVoigt(double k, double centerCm, double hwhmBlueCm, double hwhmRedCm) {
        double x = (k - centerCm) / (k >= centerCm ? hwhmBlueCm : hwhmRedCm);
        double lorentz = 1 / (1 + x * x);
        double gauss = Math.exp(-Math.log(2) * x * x);
        return 0.3 * lorentz + 0.7 * gauss;
    }
}
