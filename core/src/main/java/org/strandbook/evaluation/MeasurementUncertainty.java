package org.strandbook.evaluation;

import java.util.List;
import java.util.Locale;
import java.util.Objects;

import org.apache.commons.math3.distribution.NormalDistribution;
import org.strandbook.optics.WavelengthGrid;
import org.strandbook.uncertainty.BasisKind;
import org.strandbook.uncertainty.BudgetRow;
import org.strandbook.uncertainty.PooledRepeatability;

/**
 * The measurement's own standard uncertainty of a band's (or sub-band's) mean loss, dB: detector
 * noise from the dark scans and the repeatability of the reference, independent, so combined in
 * quadrature (JCGM 100:2008, 5.1.2 with unit sensitivities, losses in dB being additive).
 *
 * <ul>
 * <li>Noise: the per-wavelength σ_L of the one-cord method (loop, reference and both darks, see
 *     {@code OneCordThroughput}) averaged over the measured points of the range,
 *     u = √(Σ σᵢ²)/n — readings at different wavelengths have independent noise. Wavelengths
 *     interpolated between the same two readings are in fact correlated, so for scans coarser than
 *     the grid this is a little optimistic; a band holds tens of readings either way.</li>
 * <li>Reference repeatability: what re-connecting the launch cord and re-taking the reference
 *     moves, the same at every wavelength of a band, so it does not average down. Pooled from
 *     repeated references of the same cord in one visit where the workbook holds them
 *     ({@link PooledRepeatability}), else {@link #DEFAULT_REFERENCE_REPEATABILITY_DB}.</li>
 * </ul>
 *
 * @param noiseDb standard uncertainty of the mean loss from detector noise, dB
 * @param repeatabilityDb standard uncertainty from re-taking the reference, dB
 * @param repeatabilityBasis where the repeatability comes from
 * @param repeatabilityText the words shown beside it
 */
public record MeasurementUncertainty(double noiseDb, double repeatabilityDb, BasisKind repeatabilityBasis,
        String repeatabilityText) {

    /**
     * Design choice: 0.1 dB standard uncertainty for re-connecting the launch cord and re-taking
     * the reference, until the workbook holds repeated references of the same cord.
     */
    public static final double DEFAULT_REFERENCE_REPEATABILITY_DB = 0.1;

    private static final String DEFAULT_TEXT = "0.1 dB for re-connecting the launch cord and re-taking the reference,"
            + " until the workbook holds repeated references of the same cord";

    public MeasurementUncertainty {
        if (!(noiseDb >= 0) || !Double.isFinite(noiseDb)) {
            throw new IllegalArgumentException("noise uncertainty must be a finite number ≥ 0 dB, was " + noiseDb);
        }
        if (!(repeatabilityDb >= 0) || !Double.isFinite(repeatabilityDb)) {
            throw new IllegalArgumentException("repeatability must be a finite number ≥ 0 dB, was " + repeatabilityDb);
        }
        Objects.requireNonNull(repeatabilityBasis, "repeatabilityBasis");
        Objects.requireNonNull(repeatabilityText, "repeatabilityText");
    }

    /** The noise of a range with the default repeatability. */
    public static MeasurementUncertainty withDefaultRepeatability(double noiseDb) {
        return new MeasurementUncertainty(noiseDb, DEFAULT_REFERENCE_REPEATABILITY_DB, BasisKind.DESIGN_CHOICE,
                DEFAULT_TEXT);
    }

    /** The noise of a range with a repeatability pooled from repeated references. */
    public static MeasurementUncertainty withPooledRepeatability(double noiseDb, PooledRepeatability pooled) {
        return new MeasurementUncertainty(noiseDb, pooled.standardDeviation(), BasisKind.MEASURED,
                pooled.describe("the band loss between repeated references of the same cord"));
    }

    /** u(L), dB. */
    public double standardUncertaintyDb() {
        return Math.hypot(noiseDb, repeatabilityDb);
    }

    /** U = k·u(L) with k the normal coverage factor for {@code coverage} (JCGM 100:2008, G.1.3). */
    public double expandedDb(double coverage) {
        return coverageFactor(coverage) * standardUncertaintyDb();
    }

    /** k = Φ⁻¹((1 + p)/2): 1.960 for p = 0.95 (JCGM 100:2008, table G.1). */
    public static double coverageFactor(double coverage) {
        if (!(coverage > 0 && coverage < 1)) {
            throw new IllegalArgumentException("coverage probability must lie in (0, 1), was " + coverage);
        }
        return new NormalDistribution().inverseCumulativeProbability(0.5 * (1 + coverage));
    }

    /**
     * Standard uncertainty of the mean of the measured points of {@code lossSigmaDb} between
     * {@code fromNm} and {@code toNm} (inclusive), dB; NaN when none was measured there.
     */
    public static double meanNoiseDb(WavelengthGrid grid, double[] lossSigmaDb, double fromNm, double toNm) {
        grid.requireSameLength(lossSigmaDb);
        double sum = 0;
        int n = 0;
        for (int i = 0; i < grid.size(); i++) {
            double nm = grid.wavelengthNm(i);
            if (nm >= fromNm && nm <= toNm && Double.isFinite(lossSigmaDb[i])) {
                sum += lossSigmaDb[i] * lossSigmaDb[i];
                n++;
            }
        }
        return n == 0 ? Double.NaN : Math.sqrt(sum) / n;
    }

    /** The same repeatability with another noise (a sub-band's). */
    public MeasurementUncertainty withNoiseDb(double newNoiseDb) {
        return new MeasurementUncertainty(newNoiseDb, repeatabilityDb, repeatabilityBasis, repeatabilityText);
    }

    /** The two inputs as rows of an uncertainty budget (sensitivity 1, losses in dB add). */
    public List<BudgetRow> rows() {
        double u = standardUncertaintyDb();
        double total = u * u;
        return List.of(
                new BudgetRow("detector noise (band mean)", "dB", normal(noiseDb), BasisKind.MEASURED,
                        "from the dark scans' noise, propagated through the one-cord loss", noiseDb, 1, noiseDb,
                        total == 0 ? 0 : noiseDb * noiseDb / total),
                new BudgetRow("reference repeatability", "dB", normal(repeatabilityDb), repeatabilityBasis,
                        repeatabilityText, repeatabilityDb, 1, repeatabilityDb,
                        total == 0 ? 0 : repeatabilityDb * repeatabilityDb / total));
    }

    private static String normal(double sd) {
        return String.format(Locale.ROOT, "normal 0 ± %.3g (1 s.d.)", sd);
    }
}
