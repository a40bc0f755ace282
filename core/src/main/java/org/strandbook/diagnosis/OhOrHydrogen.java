package org.strandbook.diagnosis;

import java.util.List;
import java.util.Locale;
import java.util.Optional;

import org.strandbook.optics.attenuation.AttenuationShapes;

/**
 * OH in the glass and molecular hydrogen both absorb near 1240 nm; only OH has the 1383 nm first
 * overtone and the 2210 nm combination band, only hydrogen the 2420 nm fundamental. Where a loop scan
 * observed none of these (a short-range analyzer ending near 1300 nm), the spectrum cannot tell the
 * two apart, so the two fitted amounts are reported as one finding that says so and ranks the
 * candidates by the point's records (hydrogen service, process temperature) without headlining
 * either. Band positions: Humbach et al., J. Non-Cryst. Solids 203, 19 (1996) for OH; the hydrogen
 * fundamental near 2.42 µm after Beales, Cooper and Rush, Electron. Lett. 19, 917 (1983), from memory.
 * Ranking by the records is a design choice.
 */
final class OhOrHydrogen {

    /** Bands only one of the two has, nm: a band seen (measured or dark) here decides between them. */
    static final List<Double> DECIDING_BANDS_NM = List.of(1383.0, 2210.0, AttenuationShapes.HYDROGEN_BAND_2420_NM);
    /** Where the combined amount is stated, in order of preference: the band both share, then OH's 945 nm. */
    private static final List<Double> SHARED_BANDS_NM = List.of(AttenuationShapes.HYDROGEN_BAND_1240_NM, 945.0);

    private OhOrHydrogen() {
    }

    /** The one finding for both, and its largest effect at any measured wavelength (dB) for ranking. */
    record Undecided(Finding finding, double peakDb) {
    }

    /**
     * The undecided finding, if the measured range observed no deciding band and the two fitted
     * amounts together reach the reporting threshold.
     *
     * @param ohLossDb the fitted OH loss over the grid, dB
     * @param h2LossDb the fitted hydrogen loss over the grid, dB
     */
    static Optional<Undecided> whereUndecided(double[] ohLossDb, double[] h2LossDb, double sharePercent,
                                              MeasuredRange range, PathEvidence evidence, double minReportDb) {
        if (DECIDING_BANDS_NM.stream().anyMatch(range::observedAt)) {
            return Optional.empty();
        }
        double[] both = new double[ohLossDb.length];
        double peak = 0;
        double ohEffect = 0;
        double h2Effect = 0;
        for (int i = 0; i < both.length; i++) {
            both[i] = ohLossDb[i] + h2LossDb[i];
            if (range.usable(i)) {
                peak = Math.max(peak, Math.abs(both[i]));
                ohEffect += Math.abs(ohLossDb[i]);
                h2Effect += Math.abs(h2LossDb[i]);
            }
        }
        if (peak < minReportDb) {
            return Optional.empty();
        }
        StatedAmount at = StatedAmount.of(range, both, SHARED_BANDS_NM);
        double amount = at.shapeValue();
        String decidingBand = "the 1383 nm band is " + range.whyNotMeasured(1383);
        String text = String.format(Locale.ROOT, "%s%.1f dB excess at %.0f nm. OH or hydrogen: %s, and without"
                        + " it (or the 2210 and 2420 nm bands) OH in the glass and molecular hydrogen look the same. %s"
                        + " To decide, measure this loop once on an analyzer that reaches 1383 nm, or re-measure"
                        + " later: hydrogen loss follows the process, OH in a wrong fiber does not change.%s",
                at.atLeast() ? "at least " : "≈", amount, at.atNm(), decidingBand, evidence(evidence),
                DeviationDiagnoser.lowerBoundReason(at, range));
        List<Cause> candidates = evidence.hydrogenService()
                ? List.of(Cause.OH_OR_HYDROGEN, Cause.HYDROGEN_DARKENING, Cause.HIGH_OH_FIBER)
                : List.of(Cause.OH_OR_HYDROGEN, Cause.HIGH_OH_FIBER, Cause.HYDROGEN_DARKENING);
        String checkFirst = evidence.hydrogenService() && !evidence.probeTails().isEmpty()
                ? evidence.probeTails().get(0) : "";
        Signature larger = h2Effect > ohEffect ? Signature.HYDROGEN : Signature.OH_BANDS;
        return Optional.of(new Undecided(new Finding(larger, candidates, amount, at.atNm(), sharePercent, checkFirst,
                text, at.atLeast()), peak));
    }

    private static String evidence(PathEvidence evidence) {
        if (evidence.hydrogenService()) {
            String hot = evidence.processTemperatureC().isPresent()
                    ? String.format(Locale.ROOT, " at %.0f °C", evidence.processTemperatureC().getAsDouble()) : "";
            return "The point is recorded in hydrogen service" + hot + ", which makes hydrogen near the probe ("
                    + String.join(" and ", evidence.probeTails()) + ") the likelier; hot hydrogen also reacts with"
                    + " the glass to OH that does not recede.";
        }
        return "The point is not recorded in hydrogen service, which makes a high-OH fiber the likelier: check the"
                + " grade printed on each cord and cable of the path.";
    }
}
