package org.strandbook.optics.attenuation;

import java.util.List;
import java.util.Locale;
import java.util.Objects;

import org.strandbook.optics.WavelengthRange;

/**
 * Model of the spectral attenuation of a pure-silica-core fiber, in dB/km:
 * α = α_Rayleigh + α_IR + α_UV + ppm_OH·α_OH + α_H₂ + α_radiation.
 *
 * <ul>
 * <li>Rayleigh A/λ⁴, A = 0.75 dB·km⁻¹·µm⁴ (from memory: Ohashi et al., J. Lightwave Technol. 10,
 * 539 (1992)).</li>
 * <li>Infrared multiphonon edge A·exp(−B/λ), A = 7.81×10¹¹ dB/km, B = 48.48 µm (from memory:
 * G. Keiser, "Optical Fiber Communications").</li>
 * <li>Ultraviolet tail A·exp(B/λ) of a pure-silica core, A = 0.001 dB/km, B = 4.67 µm (from memory:
 * a pure-silica fit in M. Sørensen's PhD thesis, DTU Fotonik 2013); it is below 1 dB/km beyond
 * ~750 nm, consistent with Keck, Maurer and Schultz (Appl. Phys. Lett. 22, 307 (1973)) finding no
 * intrinsic UV effect beyond about 700 nm. Defect bands of UV-grade fibers below 400 nm are not
 * modelled.</li>
 * <li>OH bands near 945, 1240, 1383, 2210 and 2720 nm, linear in OH ppm
 * ({@link AttenuationShapes#SILICA_OH_BANDS}).</li>
 * <li>Optional molecular hydrogen ({@link HydrogenLoading}) and radiation darkening (amplitude in
 * dB/km at {@link AttenuationShapes#RADIATION_REFERENCE_NM} times
 * {@link AttenuationShapes#radiationDarkeningShape(double)}).</li>
 * </ul>
 *
 * <p>Valid 210–3000 nm (the lower end is that of the fused-silica Sellmeier data the rest of a
 * light path needs); outside, every call throws an {@link IllegalArgumentException}. Immutable;
 * {@code with…} methods return modified copies.
 */
public final class SilicaAttenuation implements AttenuationModel {

    public static final WavelengthRange VALID_RANGE = new WavelengthRange(210, 3000);

    public static final double RAYLEIGH_PURE_SILICA_DB_KM_UM4 = 0.75;
    public static final double IR_EDGE_A_DB_PER_KM = 7.81e11;
    public static final double IR_EDGE_B_UM = 48.48;
    public static final double UV_TAIL_A_DB_PER_KM = 1.0e-3;
    public static final double UV_TAIL_B_UM = 4.67;

    private final SilicaFiberGrade grade;
    private final double ohPpm;
    private final double rayleighDbKmUm4;
    private final double irEdgeADbPerKm;
    private final double irEdgeBUm;
    private final double uvTailADbPerKm;
    private final double uvTailBUm;
    private final List<OhBand> ohBands;
    private final HydrogenLoading hydrogen;
    private final double radiationDbPerKm;
    private final int hash;

    private SilicaAttenuation(SilicaFiberGrade grade, double ohPpm, double rayleighDbKmUm4,
            double irEdgeADbPerKm, double irEdgeBUm, double uvTailADbPerKm, double uvTailBUm,
            List<OhBand> ohBands, HydrogenLoading hydrogen, double radiationDbPerKm) {
        this.grade = Objects.requireNonNull(grade, "grade");
        this.ohPpm = requireNonNegative(ohPpm, "OH content (ppm)");
        this.rayleighDbKmUm4 = requireNonNegative(rayleighDbKmUm4, "Rayleigh coefficient");
        this.irEdgeADbPerKm = requireNonNegative(irEdgeADbPerKm, "IR edge A");
        this.irEdgeBUm = requireNonNegative(irEdgeBUm, "IR edge B");
        this.uvTailADbPerKm = requireNonNegative(uvTailADbPerKm, "UV tail A");
        this.uvTailBUm = requireNonNegative(uvTailBUm, "UV tail B");
        this.ohBands = List.copyOf(ohBands);
        this.hydrogen = Objects.requireNonNull(hydrogen, "hydrogen");
        this.radiationDbPerKm = requireNonNegative(radiationDbPerKm, "radiation-induced attenuation");
        this.hash = Objects.hash(grade, ohPpm, rayleighDbKmUm4, irEdgeADbPerKm, irEdgeBUm,
                uvTailADbPerKm, uvTailBUm, this.ohBands, hydrogen, radiationDbPerKm);
    }

    /** A fiber of the grade with its typical OH content. */
    public static SilicaAttenuation of(SilicaFiberGrade grade) {
        return of(grade, grade.typicalOhPpm());
    }

    /** A fiber of the grade with the given OH content (ppm by weight, ≥ 0). */
    public static SilicaAttenuation of(SilicaFiberGrade grade, double ohPpm) {
        return new SilicaAttenuation(grade, ohPpm, RAYLEIGH_PURE_SILICA_DB_KM_UM4,
                IR_EDGE_A_DB_PER_KM, IR_EDGE_B_UM, UV_TAIL_A_DB_PER_KM, UV_TAIL_B_UM,
                AttenuationShapes.SILICA_OH_BANDS, HydrogenLoading.NONE, 0.0);
    }

    public SilicaAttenuation withOhPpm(double newOhPpm) {
        return new SilicaAttenuation(grade, newOhPpm, rayleighDbKmUm4, irEdgeADbPerKm, irEdgeBUm,
                uvTailADbPerKm, uvTailBUm, ohBands, hydrogen, radiationDbPerKm);
    }

    public SilicaAttenuation withHydrogen(HydrogenLoading newHydrogen) {
        return new SilicaAttenuation(grade, ohPpm, rayleighDbKmUm4, irEdgeADbPerKm, irEdgeBUm,
                uvTailADbPerKm, uvTailBUm, ohBands, newHydrogen, radiationDbPerKm);
    }

    /** Radiation darkening with the given attenuation (dB/km) at the NBOHC reference wavelength. */
    public SilicaAttenuation withRadiationDarkeningDbPerKm(double atReferenceDbPerKm) {
        return new SilicaAttenuation(grade, ohPpm, rayleighDbKmUm4, irEdgeADbPerKm, irEdgeBUm,
                uvTailADbPerKm, uvTailBUm, ohBands, hydrogen, atReferenceDbPerKm);
    }

    public SilicaAttenuation withRayleighCoefficient(double dbKmUm4) {
        return new SilicaAttenuation(grade, ohPpm, dbKmUm4, irEdgeADbPerKm, irEdgeBUm,
                uvTailADbPerKm, uvTailBUm, ohBands, hydrogen, radiationDbPerKm);
    }

    public SilicaAttenuation withInfraredEdge(double aDbPerKm, double bUm) {
        return new SilicaAttenuation(grade, ohPpm, rayleighDbKmUm4, aDbPerKm, bUm,
                uvTailADbPerKm, uvTailBUm, ohBands, hydrogen, radiationDbPerKm);
    }

    public SilicaAttenuation withUltravioletTail(double aDbPerKm, double bUm) {
        return new SilicaAttenuation(grade, ohPpm, rayleighDbKmUm4, irEdgeADbPerKm, irEdgeBUm,
                aDbPerKm, bUm, ohBands, hydrogen, radiationDbPerKm);
    }

    public SilicaAttenuation withOhBands(List<OhBand> bands) {
        return new SilicaAttenuation(grade, ohPpm, rayleighDbKmUm4, irEdgeADbPerKm, irEdgeBUm,
                uvTailADbPerKm, uvTailBUm, bands, hydrogen, radiationDbPerKm);
    }

    public SilicaFiberGrade grade() {
        return grade;
    }

    public double ohPpm() {
        return ohPpm;
    }

    public HydrogenLoading hydrogen() {
        return hydrogen;
    }

    public List<OhBand> ohBands() {
        return ohBands;
    }

    @Override
    public WavelengthRange validRange() {
        return VALID_RANGE;
    }

    @Override
    public double attenuationDbPerKm(double wavelengthNm) {
        VALID_RANGE.require(wavelengthNm, describe());
        double a = AttenuationShapes.rayleighDbPerKm(wavelengthNm, rayleighDbKmUm4)
                + AttenuationShapes.infraredEdgeDbPerKm(wavelengthNm, irEdgeADbPerKm, irEdgeBUm)
                + AttenuationShapes.ultravioletTailDbPerKm(wavelengthNm, uvTailADbPerKm, uvTailBUm);
        if (ohPpm > 0) {
            a += ohPpm * AttenuationShapes.ohAbsorptionDbPerKmPerPpm(wavelengthNm, ohBands);
        }
        a += hydrogen.attenuationDbPerKm(wavelengthNm);
        if (radiationDbPerKm > 0) {
            a += radiationDbPerKm * AttenuationShapes.radiationDarkeningShape(wavelengthNm);
        }
        return a;
    }

    /** The infrared multiphonon edge alone (dB/km): for checks and charts. */
    public double infraredEdgeDbPerKm(double wavelengthNm) {
        VALID_RANGE.require(wavelengthNm, describe());
        return AttenuationShapes.infraredEdgeDbPerKm(wavelengthNm, irEdgeADbPerKm, irEdgeBUm);
    }

    /** The ultraviolet tail alone (dB/km). */
    public double ultravioletTailDbPerKm(double wavelengthNm) {
        VALID_RANGE.require(wavelengthNm, describe());
        return AttenuationShapes.ultravioletTailDbPerKm(wavelengthNm, uvTailADbPerKm, uvTailBUm);
    }

    /** Rayleigh scattering alone (dB/km). */
    public double rayleighDbPerKm(double wavelengthNm) {
        VALID_RANGE.require(wavelengthNm, describe());
        return AttenuationShapes.rayleighDbPerKm(wavelengthNm, rayleighDbKmUm4);
    }

    @Override
    public String describe() {
        return String.format(Locale.ROOT, "silica attenuation model (%s grade, %s ppm OH)", grade.label(),
                ohPpm == Math.rint(ohPpm) ? String.format(Locale.ROOT, "%.0f", ohPpm) : String.valueOf(ohPpm));
    }

    @Override
    public boolean equals(Object o) {
        return o == this || (o instanceof SilicaAttenuation s
                && hash == s.hash
                && grade == s.grade
                && Double.compare(ohPpm, s.ohPpm) == 0
                && Double.compare(rayleighDbKmUm4, s.rayleighDbKmUm4) == 0
                && Double.compare(irEdgeADbPerKm, s.irEdgeADbPerKm) == 0
                && Double.compare(irEdgeBUm, s.irEdgeBUm) == 0
                && Double.compare(uvTailADbPerKm, s.uvTailADbPerKm) == 0
                && Double.compare(uvTailBUm, s.uvTailBUm) == 0
                && Double.compare(radiationDbPerKm, s.radiationDbPerKm) == 0
                && ohBands.equals(s.ohBands)
                && hydrogen.equals(s.hydrogen));
    }

    @Override
    public int hashCode() {
        return hash;
    }

    @Override
    public String toString() {
        return describe();
    }

    private static double requireNonNegative(double v, String what) {
        if (!(v >= 0) || !Double.isFinite(v)) {
            throw new IllegalArgumentException(what + " must be a finite number ≥ 0, was " + v);
        }
        return v;
    }
}
