package org.strandbook.optics;

import java.util.Arrays;
import java.util.Objects;

/**
 * A material whose index follows the three-term Sellmeier equation
 * n² − 1 = Σ Bᵢλ²/(λ² − Cᵢ²), λ in µm, with Cᵢ the resonance wavelengths in µm (not Cᵢ²).
 */
public final class SellmeierMaterial implements OpticalMaterial {

    /**
     * Fused silica at 20 °C. Source: I. H. Malitson, "Interspecimen comparison of the refractive
     * index of fused silica", J. Opt. Soc. Am. 55, 1205 (1965); valid 0.21–3.71 µm.
     */
    public static final SellmeierMaterial FUSED_SILICA = new SellmeierMaterial("fused silica",
            new double[] {0.6961663, 0.4079426, 0.8974794},
            new double[] {0.0684043, 0.1162414, 9.896161},
            new WavelengthRange(210, 3710));

    /**
     * Synthetic sapphire, ordinary ray (what a c-cut window presents along its axis), 20 °C.
     * Source: the 20 °C fit printed in M. J. Dodge, "Refractive index", Handbook of Laser Science and
     * Technology vol. IV (CRC, 1986) (announced as I. H. Malitson and M. J. Dodge, J. Opt. Soc. Am.
     * 62, 1405 (1972), a meeting abstract); valid 0.2–5.0 µm.
     */
    public static final SellmeierMaterial SAPPHIRE_ORDINARY = new SellmeierMaterial("sapphire (ordinary ray)",
            new double[] {1.4313493, 0.65054713, 5.3414021},
            new double[] {0.0726631, 0.1193242, 18.028251},
            new WavelengthRange(200, 5000));

    private final String name;
    private final double[] b;
    private final double[] cSquaredUm2;
    private final WavelengthRange validRange;
    private final int hash;

    /**
     * @param b strengths Bᵢ (dimensionless)
     * @param cUm resonance wavelengths Cᵢ in µm (the equation squares them)
     * @param validRange wavelengths where the fit was made
     */
    public SellmeierMaterial(String name, double[] b, double[] cUm, WavelengthRange validRange) {
        this.name = Objects.requireNonNull(name, "name");
        if (b.length != cUm.length || b.length == 0) {
            throw new IllegalArgumentException("Sellmeier needs as many B as C coefficients, at least one");
        }
        this.b = b.clone();
        this.cSquaredUm2 = new double[cUm.length];
        for (int i = 0; i < cUm.length; i++) {
            cSquaredUm2[i] = cUm[i] * cUm[i];
        }
        this.validRange = Objects.requireNonNull(validRange, "validRange");
        this.hash = Objects.hash(name, Arrays.hashCode(this.b), Arrays.hashCode(cSquaredUm2), validRange);
    }

    @Override
    public String name() {
        return name;
    }

    @Override
    public WavelengthRange validRange() {
        return validRange;
    }

    @Override
    public double refractiveIndex(double wavelengthNm) {
        validRange.require(wavelengthNm, name);
        double l2 = wavelengthNm * 1e-3 * (wavelengthNm * 1e-3);
        double sum = 1.0;
        for (int i = 0; i < b.length; i++) {
            sum += b[i] * l2 / (l2 - cSquaredUm2[i]);
        }
        return Math.sqrt(sum);
    }

    @Override
    public boolean equals(Object o) {
        return o == this || (o instanceof SellmeierMaterial other
                && hash == other.hash
                && name.equals(other.name)
                && Arrays.equals(b, other.b)
                && Arrays.equals(cSquaredUm2, other.cSquaredUm2)
                && validRange.equals(other.validRange));
    }

    @Override
    public int hashCode() {
        return hash;
    }

    @Override
    public String toString() {
        return name;
    }
}
