package org.strandbook.site;

import java.util.Locale;
import java.util.Objects;

/**
 * How a site decides PASS, REVIEW or FAIL from a measured loss and its prediction.
 *
 * <ul>
 * <li>{@link Kind#FIXED_TOLERANCE}: the measured band loss may exceed the predicted line by the
 *     point's tolerance (site default 1 dB), the rule of installed-loss testing against a
 *     calculated budget;</li>
 * <li>{@link Kind#COVERAGE_INTERVAL}: the decision rule of ILAC-G8:09/2019 with a guard band
 *     (JCGM 106:2012, clause 8: acceptance zone and guard band): PASS when the measured loss lies inside the prediction's coverage
 *     interval widened by the measurement's own expanded uncertainty, FAIL when it lies beyond that
 *     by more than the guard band, REVIEW in between.</li>
 * </ul>
 *
 * @param kind which rule
 * @param coverage coverage probability of the prediction's interval and of the measurement's
 *        expanded uncertainty, in (0.5, 1); kept under the fixed rule so that switching back and
 *        forth loses nothing
 * @param guardBandDb width of the band beyond the widened interval in which a result is neither
 *        accepted nor rejected, dB, ≥ 0
 */
public record DecisionRule(Kind kind, double coverage, double guardBandDb) {

    /** The two rules a site may choose. */
    public enum Kind {
        FIXED_TOLERANCE("fixed", "fixed tolerance"),
        COVERAGE_INTERVAL("interval", "coverage interval");

        private final String code;
        private final String words;

        Kind(String code, String words) {
            this.code = code;
            this.words = words;
        }

        /** The word the command line and the workbook use: "fixed" or "interval". */
        public String code() {
            return code;
        }

        public String words() {
            return words;
        }

        /** The rule named {@code code} ("fixed" or "interval", any case). */
        public static Kind ofCode(String code) {
            for (Kind k : values()) {
                if (k.code.equalsIgnoreCase(code == null ? "" : code.strip())) {
                    return k;
                }
            }
            throw new IllegalArgumentException("decision rule '" + code + "' is not known: give fixed or interval");
        }
    }

    /** Design choice: the coverage probability most calibration certificates state. */
    public static final double DEFAULT_COVERAGE = 0.95;
    /**
     * Design choice: 0.2 dB, about the re-mating scatter of one large-core connector pair, so that a
     * result a single re-mate could move across the limit is sent for review, not failed.
     */
    public static final double DEFAULT_GUARD_BAND_DB = 0.2;

    /** Today's rule, the default of every site that has chosen none. */
    public static final DecisionRule FIXED = new DecisionRule(Kind.FIXED_TOLERANCE, DEFAULT_COVERAGE,
            DEFAULT_GUARD_BAND_DB);

    public DecisionRule {
        Objects.requireNonNull(kind, "kind");
        if (!(coverage > 0.5 && coverage < 1)) {
            throw new IllegalArgumentException(String.format(Locale.ROOT,
                    "coverage probability %s must lie between 0.5 and 1 (e.g. 0.95)", coverage));
        }
        if (!(guardBandDb >= 0) || !Double.isFinite(guardBandDb) || guardBandDb > 10) {
            throw new IllegalArgumentException(String.format(Locale.ROOT,
                    "guard band %s dB must be a number from 0 to 10 dB", guardBandDb));
        }
    }

    /** The coverage-interval rule at the default coverage and guard band. */
    public static DecisionRule interval() {
        return new DecisionRule(Kind.COVERAGE_INTERVAL, DEFAULT_COVERAGE, DEFAULT_GUARD_BAND_DB);
    }

    public boolean onInterval() {
        return kind == Kind.COVERAGE_INTERVAL;
    }

    public DecisionRule withKind(Kind newKind) {
        return new DecisionRule(newKind, coverage, guardBandDb);
    }

    public DecisionRule withCoverage(double newCoverage) {
        return new DecisionRule(kind, newCoverage, guardBandDb);
    }

    public DecisionRule withGuardBandDb(double newGuardBandDb) {
        return new DecisionRule(kind, coverage, newGuardBandDb);
    }

    /** The rule in one line, e.g. "coverage interval, 95 % coverage, guard band 0.20 dB". */
    public String describe(double toleranceDb) {
        return onInterval()
                ? String.format(Locale.ROOT, "coverage interval: PASS inside the prediction's %s %% coverage interval"
                        + " widened by the measurement's own expanded uncertainty, FAIL beyond it by more than the"
                        + " guard band of %.2f dB, REVIEW between", percent(), guardBandDb)
                : String.format(Locale.ROOT, "fixed tolerance: FAIL when the band loses more than %.2f dB above the"
                        + " predicted line", toleranceDb);
    }

    /** The coverage as a percentage without trailing zeros: "95", "99.7". */
    public String percent() {
        return percent(coverage);
    }

    /** A coverage probability as a percentage, without a needless decimal: 95, 99.7. */
    public static String percent(double coverage) {
        double p = 100 * coverage;
        return p == Math.rint(p) ? Long.toString((long) p) : String.format(Locale.ROOT, "%.1f", p);
    }
}
