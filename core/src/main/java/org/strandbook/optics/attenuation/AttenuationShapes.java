package org.strandbook.optics.attenuation;

import java.util.List;

import org.strandbook.optics.WavelengthGrid;
import org.strandbook.optics.Wavenumber;

/**
 * The individual spectral shapes that make up silica fiber attenuation, as public pure functions so
 * that fault diagnosis can fit them to a measured excess-loss spectrum.
 *
 * <p>Band shapes: OH bands are Gaussians in wavenumber with a fading Lorentzian wing
 * ({@link OhBand}: the OH bands of wet silica reach far beyond their cores); H₂ bands are plain
 * Gaussians in wavenumber (vibrational overtones and combinations are nearly symmetric on an energy
 * axis); radiation-induced colour-centre bands are Gaussians in photon energy. Widths are modelling
 * choices.
 */
public final class AttenuationShapes {

    // declared first: the radiation normalisation below is computed during class initialisation
    private static final double FOUR_LN2 = 4.0 * Math.log(2.0);

    /** hc in eV·nm, for photon energy E = hc/λ (CODATA 2018 exact SI value, 1239.841984… eV·nm). */
    public static final double HC_EV_NM = 1239.8419843320026;

    /**
     * Peak of the 2.72 µm OH fundamental per ppm OH by weight (dB/km/ppm), derived from its decadic
     * molar absorptivity ε = 77.5 L·mol⁻¹·cm⁻¹ (Stevenson and Jack, as quoted in "Near infrared
     * absorption spectra of silica: OH overtones", Appl. Spectrosc. 25, 378 (1971)): 1 ppm of OH
     * (17.007 g/mol) in silica of 2.20 g/cm³ is 1.2936×10⁻⁴ mol/L, an absorbance of ε·c = 1.0025×10⁻²
     * per cm, that is 10·A = 10,025 dB/km.
     */
    public static final double OH_FUNDAMENTAL_PEAK_DB_PER_KM_PER_PPM = 10 * 77.5 * (2200e-6 / 17.007) * 1e5;

    /** Share of each OH band's peak carried by its Lorentzian wing (design choice, see below). */
    public static final double OH_WING_FRACTION = 0.10;
    /** Wavenumber distance (cm⁻¹) over which an OH band's wing fades by 1/e (design choice). */
    public static final double OH_WING_REACH_CM = 1000;

    /**
     * The OH bands of silica with their peak dB/km per ppm OH (by weight), each with the source of
     * its strength:
     * <ul>
     * <li>945 nm, 1.0: from memory (the value usually attributed to Keck, Maurer and Schultz, Appl.
     * Phys. Lett. 22, 307 (1973), whose abstract states only that OH accounts for the absorption
     * between 700 and 1100 nm to within ±0.7 dB/km);</li>
     * <li>1240 nm, 3.0: from memory (2.5–4 is what is usually quoted);</li>
     * <li>1383 nm, 62.7: from memory of O. Humbach et al., "Analysis of OH absorption bands in
     * synthetic silica", J. Non-Cryst. Solids 203, 19 (1996) (not re-read; older papers give
     * 40–65);</li>
     * <li>2210 nm, 150: from memory ("of order 10²");</li>
     * <li>2720 nm: {@link #OH_FUNDAMENTAL_PEAK_DB_PER_KM_PER_PPM}, derived from a quoted ε.</li>
     * </ul>
     * Widths (FWHM, cm⁻¹) are from memory of published spectra and serve the shape only. Every band
     * carries a Lorentzian wing of {@link #OH_WING_FRACTION} of its peak fading over
     * {@link #OH_WING_REACH_CM}: a design choice, set so that wet fiber (several hundred ppm) is as
     * opaque between the 2.21 µm and 2.72 µm bands as the trade knows it to be (more than 3 dB/m at
     * 800 ppm from 2.2 to 2.5 µm), while the wings stay below 0.1 dB/km per ppm in the 1.55 µm
     * window. The span is filled in wet silica by the OH combination bands at 3750–4510 cm⁻¹ that
     * Efimov and Pogareva resolve (Chem. Geol. 229, 198 (2006)); the wing stands for them.
     */
    public static final List<OhBand> SILICA_OH_BANDS = List.of(
            ohBand(945, 1.0, 220),
            ohBand(1240, 3.0, 230),
            ohBand(1383, 62.7, 160),
            ohBand(2210, 150.0, 120),
            ohBand(2720, OH_FUNDAMENTAL_PEAK_DB_PER_KM_PER_PPM, 110));

    /** Centre of the first-overtone H₂ band (nm). */
    public static final double HYDROGEN_BAND_1240_NM = 1240;
    /** Centre of the fundamental H₂ band (nm). */
    public static final double HYDROGEN_BAND_2420_NM = 2420;
    private static final double HYDROGEN_1240_FWHM_CM = 150;
    private static final double HYDROGEN_2420_FWHM_CM = 100;

    /** Photon energy (eV) of the non-bridging oxygen hole centre band, ≈ 630 nm. */
    public static final double NBOHC_BAND_EV = 1.97;
    /** Reference wavelength at which {@link #radiationDarkeningShape(double)} equals 1. */
    public static final double RADIATION_REFERENCE_NM = HC_EV_NM / NBOHC_BAND_EV;

    // visible/NIR colour-centre bands (energy eV, FWHM eV, relative amplitude): NBOHC 1.97 eV and
    // self-trapped holes 1.63 and 1.88 eV (energies from memory: Girard et al., IEEE Trans. Nucl.
    // Sci. 60 (2013)); amplitudes and widths are a modelling choice
    private static final double[][] RADIATION_BANDS = {
        {1.63, 0.35, 0.4},
        {1.88, 0.35, 0.4},
        {NBOHC_BAND_EV, 0.17, 1.0},
    };
    // the visible tails of the UV bands (E′ 5.8 eV, NBOHC 4.8 eV) as an exponential in energy
    private static final double RADIATION_TAIL_WIDTH_EV = 0.4;
    private static final double RADIATION_NORMALISATION = 1.0 / rawRadiationShape(NBOHC_BAND_EV);


    private AttenuationShapes() {
    }

    private static OhBand ohBand(double centerNm, double peakDbPerKmPerPpm, double fwhmCm) {
        return new OhBand(centerNm, peakDbPerKmPerPpm, fwhmCm, OH_WING_FRACTION, OH_WING_REACH_CM);
    }

    /** Photon energy in eV of a vacuum wavelength in nm. */
    public static double photonEnergyEv(double wavelengthNm) {
        return HC_EV_NM / wavelengthNm;
    }

    /** Unit-peak Gaussian in wavenumber centred on {@code centerNm} with FWHM {@code fwhmCm}. */
    public static double gaussianInWavenumber(double wavelengthNm, double centerNm, double fwhmCm) {
        double d = (Wavenumber.wavenumberCmFromNm(wavelengthNm) - Wavenumber.wavenumberCmFromNm(centerNm)) / fwhmCm;
        return Math.exp(-FOUR_LN2 * d * d);
    }

    /** Unit-peak Gaussian in photon energy centred on {@code centerEv} with FWHM {@code fwhmEv}. */
    public static double gaussianInPhotonEnergy(double wavelengthNm, double centerEv, double fwhmEv) {
        double d = (photonEnergyEv(wavelengthNm) - centerEv) / fwhmEv;
        return Math.exp(-FOUR_LN2 * d * d);
    }

    /**
     * Rayleigh scattering α = A/λ⁴ in dB/km, λ in µm, A in dB·km⁻¹·µm⁴ (≈ 0.75 for a pure-silica
     * core, from memory: Ohashi et al., J. Lightwave Technol. 10, 539 (1992)).
     */
    public static double rayleighDbPerKm(double wavelengthNm, double coefficientDbKmUm4) {
        double um = wavelengthNm * 1e-3;
        double um2 = um * um;
        return coefficientDbKmUm4 / (um2 * um2);
    }

    /** Infrared multiphonon edge α = A·exp(−B/λ) in dB/km, λ and B in µm. */
    public static double infraredEdgeDbPerKm(double wavelengthNm, double aDbPerKm, double bUm) {
        return aDbPerKm * Math.exp(-bUm / (wavelengthNm * 1e-3));
    }

    /** Ultraviolet (Urbach) tail α = A·exp(B/λ) in dB/km, λ and B in µm. */
    public static double ultravioletTailDbPerKm(double wavelengthNm, double aDbPerKm, double bUm) {
        return aDbPerKm * Math.exp(bUm / (wavelengthNm * 1e-3));
    }

    /** OH absorption per ppm OH (dB/km/ppm) from {@link #SILICA_OH_BANDS} at one wavelength. */
    public static double ohAbsorptionDbPerKmPerPpm(double wavelengthNm) {
        return ohAbsorptionDbPerKmPerPpm(wavelengthNm, SILICA_OH_BANDS);
    }

    /** OH absorption per ppm OH (dB/km/ppm) of the given bands at one wavelength. */
    public static double ohAbsorptionDbPerKmPerPpm(double wavelengthNm, List<OhBand> bands) {
        double sum = 0;
        for (OhBand band : bands) {
            sum += band.dbPerKmPerPpm(wavelengthNm);
        }
        return sum;
    }

    /** OH absorption per ppm OH (dB/km/ppm) from {@link #SILICA_OH_BANDS} on a grid. */
    public static double[] ohAbsorptionDbPerKmPerPpm(WavelengthGrid grid) {
        double[] s = new double[grid.size()];
        for (int i = 0; i < s.length; i++) {
            s[i] = ohAbsorptionDbPerKmPerPpm(grid.wavelengthNm(i));
        }
        return s;
    }

    /**
     * Shape of the molecular-hydrogen loss: 1 at the 1240 nm peak, {@code relativePeak2420} at the
     * 2420 nm peak, Gaussians in wavenumber. Band positions from the H₂-in-fiber literature
     * (the 2.42 µm fundamental: "Increased attenuation in optical fibres caused by diffusion of
     * molecular hydrogen at room temperature", Electron. Lett. 1983, authors K. J. Beales, D. M.
     * Cooper and J. D. Rush, vol. 19, p. 917 from memory; the 1.24 µm overtone: "Loss increase for
     * optical fibers exposed to hydrogen atmosphere", 1985, from its abstract); the
     * band ratio and widths are parameters, not claims.
     */
    public static double hydrogenBandShape(double wavelengthNm, double relativePeak2420) {
        return gaussianInWavenumber(wavelengthNm, HYDROGEN_BAND_1240_NM, HYDROGEN_1240_FWHM_CM)
                + relativePeak2420 * gaussianInWavenumber(wavelengthNm, HYDROGEN_BAND_2420_NM, HYDROGEN_2420_FWHM_CM);
    }

    /** {@link #hydrogenBandShape(double, double)} on a grid. */
    public static double[] hydrogenBandShape(WavelengthGrid grid, double relativePeak2420) {
        double[] s = new double[grid.size()];
        for (int i = 0; i < s.length; i++) {
            s[i] = hydrogenBandShape(grid.wavelengthNm(i), relativePeak2420);
        }
        return s;
    }

    /**
     * Shape of radiation-induced darkening of a silica core (dimensionless, 1 at
     * {@link #RADIATION_REFERENCE_NM} ≈ 629 nm): Gaussian colour-centre bands in photon energy
     * (NBOHC 1.97 eV, self-trapped holes 1.63 and 1.88 eV) on the exponential visible tail of the
     * UV defect bands, so it rises toward short wavelengths. For fitting an amplitude to measured
     * excess loss; it predicts no dose response.
     */
    public static double radiationDarkeningShape(double wavelengthNm) {
        return RADIATION_NORMALISATION * rawRadiationShape(photonEnergyEv(wavelengthNm));
    }

    /** {@link #radiationDarkeningShape(double)} on a grid. */
    public static double[] radiationDarkeningShape(WavelengthGrid grid) {
        double[] s = new double[grid.size()];
        for (int i = 0; i < s.length; i++) {
            s[i] = radiationDarkeningShape(grid.wavelengthNm(i));
        }
        return s;
    }

    /** Second radiation constant c₂ = hc/k in µm·K (CODATA 2018: 1.438776877… × 10⁻² m·K). */
    public static final double SECOND_RADIATION_CONSTANT_UM_K = 14387.76877;
    /** dB per natural-log unit, 10/ln 10. */
    private static final double DB_PER_NEPER_POWER = 10.0 / Math.log(10.0);

    /**
     * How much brighter a thermal lamp looks at one wavelength per kelvin its colour temperature
     * rises, dB/K: 10·log₁₀(e)·∂ln B/∂T of Planck's law B ∝ λ⁻⁵/(e^x − 1), x = c₂/(λT), which is
     * (10/ln 10)·(x/T)·eˣ/(eˣ − 1). In Wien's limit (x ≫ 1, the NIR for a halogen filament) this is
     * c₂/(λT²): linear in 1/λ, largest at short wavelengths.
     */
    public static double planckBrighteningDbPerK(double wavelengthNm, double temperatureK) {
        double x = SECOND_RADIATION_CONSTANT_UM_K / (wavelengthNm * 1e-3 * temperatureK);
        // eˣ/(eˣ − 1) = 1/(1 − e⁻ˣ), written so that it never overflows
        return DB_PER_NEPER_POWER * (x / temperatureK) / -Math.expm1(-x);
    }

    private static double rawRadiationShape(double energyEv) {
        double sum = Math.exp((energyEv - NBOHC_BAND_EV) / RADIATION_TAIL_WIDTH_EV);
        for (double[] band : RADIATION_BANDS) {
            double d = (energyEv - band[0]) / band[1];
            sum += band[2] * Math.exp(-FOUR_LN2 * d * d);
        }
        return sum;
    }
}
