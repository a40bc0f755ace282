package org.strandbook.evaluation;

import java.util.List;
import java.util.Locale;
import java.util.Optional;

import org.strandbook.diagnosis.Cause;
import org.strandbook.diagnosis.Diagnosis;
import org.strandbook.diagnosis.Finding;
import org.strandbook.diagnosis.Signature;
import org.strandbook.site.MeasurementPoint;
import org.strandbook.throughput.ThroughputResult;

/**
 * The evaluation of one measurement point: its prediction, its latest measurement against it, what
 * is wrong, and where its loss is heading.
 *
 * @param point      the point
 * @param status     the worst band status, or REVIEW when no scan could be evaluated
 * @param predicted  the predicted loop budget with each element's contribution
 * @param latest     the latest paired scans, if any
 * @param measured   the latest measured loss spectrum, if any
 * @param verdicts   acceptance per band of interest for the latest scan
 * @param diagnosis  the latest deviation's diagnosis, if measured
 * @param trends     loss history and forecast per band
 * @param problems   what could not be evaluated, in words (unpaired scans, missing data)
 * @param intervals  under the coverage-interval rule, the limits each band was judged against (one
 *                   per verdict, in its order); empty under the fixed tolerance
 */
public record PointEvaluation(MeasurementPoint point, Status status, PredictedBudget predicted,
                              Optional<ScanPair> latest, Optional<ThroughputResult> measured,
                              List<BandVerdict> verdicts, Optional<Diagnosis> diagnosis, List<BandTrend> trends,
                              List<String> problems, List<BandInterval> intervals) {

    public PointEvaluation {
        verdicts = List.copyOf(verdicts);
        trends = List.copyOf(trends);
        problems = List.copyOf(problems);
        intervals = List.copyOf(intervals);
    }

    /** An evaluation under the fixed tolerance. */
    public PointEvaluation(MeasurementPoint point, Status status, PredictedBudget predicted,
                           Optional<ScanPair> latest, Optional<ThroughputResult> measured,
                           List<BandVerdict> verdicts, Optional<Diagnosis> diagnosis, List<BandTrend> trends,
                           List<String> problems) {
        this(point, status, predicted, latest, measured, verdicts, diagnosis, trends, problems, List.of());
    }

    /** The limits {@code band} was judged against under the coverage-interval rule, if it was. */
    public Optional<BandInterval> interval(org.strandbook.site.WavelengthBand band) {
        return intervals.stream().filter(i -> i.prediction().band().equals(band)).findFirst();
    }

    /** The band with the least margin (or the first failing one), if any was judged. */
    public Optional<BandVerdict> worstBand() {
        return verdicts.stream().min((a, b) -> {
            int s = b.status().compareTo(a.status());
            if (s != 0) {
                return s;
            }
            return Double.compare(nanLow(a.marginDb()), nanLow(b.marginDb()));
        });
    }

    private static double nanLow(double v) {
        return Double.isNaN(v) ? Double.NEGATIVE_INFINITY : v;
    }

    /**
     * True when every band was judged on the coverage interval and passed: whatever the fit found
     * lies within what the recorded parts may lose, and sends nobody into the field.
     */
    public boolean passedOnInterval() {
        return status == Status.PASS && !intervals.isEmpty();
    }

    /** The finding in one line: the diagnosis summary, or why nothing was measured. */
    public String finding() {
        if (diagnosis.isPresent()) {
            // a pass on the interval names the fitted size but no cause and no place to walk to: the
            // deviation is one the recorded parts may have, so it must not send anyone into the field
            return passedOnInterval() && diagnosis.get().first().isPresent()
                    ? "every band lies inside the prediction's coverage interval widened by the measurement's own"
                    + " uncertainty: what the fit found (largest term " + size(diagnosis.get().first().get())
                    + ") is within what the recorded parts may lose; nothing to do in the field"
                    : diagnosis.get().summary();
        }
        return problems.isEmpty() ? "not measured yet" : problems.get(0);
    }

    /** The finding in a few words for a one-line summary: cause, size, element to check first. */
    public String shortFinding() {
        if (diagnosis.isEmpty()) {
            return problems.isEmpty() ? "not measured yet" : "not evaluated";
        }
        return diagnosis.get().first().map(f -> {
            String size = size(f);
            if (passedOnInterval()) {
                return "as predicted within its coverage interval (largest fitted term " + size + ")";
            }
            return f.cause().words() + ", " + size + (f.checkFirst().isEmpty() ? "" : "; check " + f.checkFirst());
        }).orElse("as predicted");
    }

    /** A finding's size in a few words: how much, and where or that it is wavelength-flat. */
    private static String size(Finding f) {
        return Double.isInfinite(f.amountDb()) ? "no light"
                : f.signature() == Signature.FRINGES
                ? String.format(Locale.ROOT, "ripple of %.2f dB peak to peak", 2 * f.amountDb())
                : f.cause() == Cause.RECORDS_LIST_MORE_LOSS
                ? String.format(Locale.ROOT, "up to ≈%.1f dB under prediction, at %.0f nm", -f.amountDb(), f.atNm())
                : f.cause() == Cause.REFERENCE_OR_RECORDS
                ? String.format(Locale.ROOT, "≈%.1f dB under prediction", -f.amountDb())
                : Double.isNaN(f.atNm()) || f.signature() == Signature.FLAT_EXCESS
                ? String.format(Locale.ROOT, "≈%.1f dB, wavelength-flat", f.amountDb())
                : String.format(Locale.ROOT, "%s%.1f dB at %.0f nm", f.atLeast() ? "≥" : "≈",
                f.amountDb(), f.atNm());
    }
}
