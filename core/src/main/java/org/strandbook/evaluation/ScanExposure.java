package org.strandbook.evaluation;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;

import org.strandbook.site.ScanConditions;
import org.strandbook.site.ScanRecord;

/**
 * How long the detector gathered light for the scans of one pair, and whether their counts can be
 * put on one scale.
 *
 * <p>Detector counts grow in proportion to the integration time t and, where an instrument sums
 * them, to the number of co-added scans c; so are the dark counts. Loop and reference are compared
 * as (S − D)/(t·c), each with a dark of its own t and c (common practice). A co-added count
 * recorded in a scan file is read as summed scans (design choice: an instrument that averages
 * writes none, and 1 changes nothing). Technicians lengthen the integration on long lossy loops;
 * a loop at 4× the reference's time read without this reads 6 dB better than it is.
 *
 * <p>Where the time of loop or reference is not recorded, or a dark cannot be shown to match the
 * scan it corrects, nothing is guessed: the pair carries a problem and its bands are not judged.
 *
 * @param loopIntegrationMs      the loop scan's integration time, ms (0 when not recorded)
 * @param loopCoAdded            the loop scan's co-added count
 * @param referenceIntegrationMs the reference scan's integration time, ms (0 when not recorded)
 * @param referenceCoAdded       the reference scan's co-added count
 * @param problem                why the counts cannot be put on one scale, if they cannot
 */
public record ScanExposure(double loopIntegrationMs, int loopCoAdded, double referenceIntegrationMs,
                           int referenceCoAdded, Optional<String> problem) {

    /** Whether a dark matches the scan it corrects; in order of preference. */
    public enum Match {
        /** Integration time and co-added count both recorded and equal. */
        SAME,
        /** One of the two times is not recorded: cannot be shown either way. */
        UNKNOWN,
        /** Recorded and different: the dark cannot correct the scan. */
        DIFFERENT
    }

    /** Relative difference below which two recorded integration times are the same setting. */
    private static final double SAME_TIME_RELATIVE = 1e-6;

    /** The exposure of {@code pair}'s four scans. */
    public static ScanExposure of(ScanPair pair) {
        ScanConditions loop = pair.loop().conditions();
        ScanConditions ref = pair.reference().conditions();
        List<String> problems = new ArrayList<>();
        if (!recorded(loop) && !recorded(ref)) {
            problems.add("integration times of the loop and reference scans are not recorded");
        } else if (!recorded(loop)) {
            problems.add("integration time of the loop scan is not recorded (reference "
                    + describe(ref) + ")");
        } else if (!recorded(ref)) {
            problems.add("integration time of the reference scan is not recorded (loop "
                    + describe(loop) + ")");
        }
        darkProblem(pair.loopDark(), pair.loop(), "loop").ifPresent(problems::add);
        if (pair.referenceDark().id() != pair.loopDark().id() || pair.reference().id() != pair.loop().id()) {
            darkProblem(pair.referenceDark(), pair.reference(), "reference").ifPresent(p -> {
                if (!problems.contains(p)) {
                    problems.add(p);
                }
            });
        }
        Optional<String> problem = problems.isEmpty() ? Optional.empty()
                : Optional.of("not judged: " + String.join("; ", problems) + ", so loop and reference cannot be"
                        + " shown to be on one scale; record the integration time in the scan files"
                        + " (# integration_ms:) or re-take the scans");
        return new ScanExposure(loop.integrationMs(), loop.coAdded(), ref.integrationMs(), ref.coAdded(), problem);
    }

    /** Whether dark {@code dark} can correct {@code scan}. */
    public static Match match(ScanConditions dark, ScanConditions scan) {
        if (!recorded(dark) || !recorded(scan)) {
            return Match.UNKNOWN;
        }
        double a = dark.integrationMs();
        double b = scan.integrationMs();
        boolean sameTime = Math.abs(a - b) <= SAME_TIME_RELATIVE * Math.max(a, b);
        return sameTime && dark.coAdded() == scan.coAdded() ? Match.SAME : Match.DIFFERENT;
    }

    /** The setting in words, e.g. "integration time 200 ms" or "integration time 50 ms × 16 co-added scans". */
    public static String describe(ScanConditions c) {
        if (!recorded(c)) {
            return "unrecorded integration time";
        }
        return "integration time " + ms(c.integrationMs())
                + (c.coAdded() == 1 ? "" : " × " + c.coAdded() + " co-added scans");
    }

    private static Optional<String> darkProblem(ScanRecord dark, ScanRecord scan, String word) {
        if (match(dark.conditions(), scan.conditions()) != Match.UNKNOWN) {
            return Optional.empty();
        }
        return Optional.of("the " + word + " scan's dark (scan " + dark.id() + ") cannot be shown to have its"
                + " integration time (" + describe(dark.conditions()) + " against " + describe(scan.conditions()) + ")");
    }

    private static boolean recorded(ScanConditions c) {
        return c.integrationMs() > 0;
    }

    private static String ms(double v) {
        return (v == Math.rint(v) ? String.format(Locale.ROOT, "%.0f", v) : String.format(Locale.ROOT, "%s", v)) + " ms";
    }

    /** True when the counts can be put on one scale. */
    public boolean judgeable() {
        return problem.isEmpty();
    }

    /**
     * What a count of {@code scan} is divided by to put it on the common scale: t·c in ms, or 1 when
     * the pair is not judgeable (its numbers are then shown as measured, not judged).
     */
    public double divisor(ScanConditions scan) {
        return judgeable() ? scan.integrationMs() * scan.coAdded() : 1;
    }

    /** (t·c of the loop) / (t·c of the reference); NaN when not judgeable. */
    public double loopToReferenceRatio() {
        return judgeable() ? loopIntegrationMs * loopCoAdded / (referenceIntegrationMs * referenceCoAdded) : Double.NaN;
    }

    /** The normalisation in words, for reports and the status line. */
    public String describeNormalisation() {
        if (!judgeable()) {
            return problem.get();
        }
        String loop = "loop " + ms(loopIntegrationMs) + (loopCoAdded == 1 ? "" : " × " + loopCoAdded);
        String ref = "reference " + ms(referenceIntegrationMs) + (referenceCoAdded == 1 ? "" : " × " + referenceCoAdded);
        double ratio = loopToReferenceRatio();
        if (Math.abs(ratio - 1) <= SAME_TIME_RELATIVE) {
            return loop + ", " + ref + ": taken alike, no normalisation";
        }
        return loop + ", " + ref + String.format(Locale.ROOT,
                ": counts divided by integration time%s (loop counts ÷ %.3g to match the reference, %.2f dB)",
                loopCoAdded == 1 && referenceCoAdded == 1 ? "" : " × co-added scans", ratio,
                10 * Math.log10(ratio));
    }
}
