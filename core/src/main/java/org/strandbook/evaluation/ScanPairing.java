package org.strandbook.evaluation;

import java.time.Duration;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Locale;
import java.util.Optional;

import org.strandbook.site.ScanKind;
import org.strandbook.site.ScanRecord;

/**
 * Which reference and dark scans belong to which loop scan. The rule is explicit and printed with
 * every result, because a wrong pairing silently shifts the whole loss spectrum:
 *
 * <ul>
 *   <li>only scans of the same measurement point are paired;</li>
 *   <li>the reference is the reference scan nearest in time to the loop, within the window
 *       (default 12 h, one visit), an earlier one winning a tie;</li>
 *   <li>each of loop and reference gets the dark scan nearest in time to it within the window whose
 *       integration time and co-added count equal its own; a dark recorded with a different
 *       integration time never corrects it (dark counts grow with integration time), and a dark
 *       whose time or whose scan's time is not recorded is taken only when no matching one exists,
 *       and the evaluation then refuses to judge (see {@link ScanExposure});</li>
 *   <li>a loop scan with no reference or no dark in the window is not evaluated: it is reported
 *       as unpaired, never guessed.</li>
 * </ul>
 */
public final class ScanPairing {

    /** Common practice: reference and dark belong to the same visit as the loop scan. */
    public static final Duration DEFAULT_WINDOW = Duration.ofHours(12);

    private final Duration window;
    private final String rule;

    private ScanPairing(Duration window) {
        if (window.isNegative() || window.isZero()) {
            throw new IllegalArgumentException("pairing window must be positive, was " + window);
        }
        this.window = window;
        this.rule = String.format(Locale.ROOT, "same point; nearest reference and nearest dark within %d h of each"
                + " scan; a dark only of the integration time and co-added count of the scan it corrects",
                window.toHours());
    }

    public static ScanPairing withDefaults() {
        return new ScanPairing(DEFAULT_WINDOW);
    }

    public ScanPairing withWindow(Duration newWindow) {
        return new ScanPairing(newWindow);
    }

    public Duration window() {
        return window;
    }

    /** The rule in one line, for reports. */
    public String describe() {
        return rule;
    }

    /** Pairs every loop scan of one point; {@code scans} may hold all kinds, in any order. */
    public Pairings pair(List<ScanRecord> scans) {
        List<ScanRecord> loops = ofKind(scans, ScanKind.LOOP);
        List<ScanRecord> refs = ofKind(scans, ScanKind.REFERENCE);
        List<ScanRecord> darks = ofKind(scans, ScanKind.DARK);
        List<ScanPair> paired = new ArrayList<>();
        List<UnpairedScan> unpaired = new ArrayList<>();
        for (ScanRecord loop : loops) {
            Optional<ScanRecord> ref = nearest(refs, loop, false);
            if (ref.isEmpty()) {
                unpaired.add(new UnpairedScan(loop, "no reference scan of " + loop.pointTag() + " within "
                        + window.toHours() + " h of the loop scan taken " + loop.takenAt()));
                continue;
            }
            Optional<ScanRecord> loopDark = nearest(darks, loop, true);
            Optional<ScanRecord> refDark = nearest(darks, ref.get(), true);
            if (loopDark.isEmpty() || refDark.isEmpty()) {
                ScanRecord lacking = loopDark.isEmpty() ? loop : ref.get();
                boolean anyInWindow = nearestAtAnyIntegration(darks, lacking).isPresent();
                unpaired.add(new UnpairedScan(loop, "no dark scan of " + loop.pointTag()
                        + (anyInWindow ? " with the " + ScanExposure.describe(lacking.conditions()) + " of" : "")
                        + " within " + window.toHours() + " h of the " + lacking.kind().word() + " scan taken "
                        + lacking.takenAt() + (anyInWindow ? " (darks of other integration times cannot correct it)" : "")));
                continue;
            }
            paired.add(new ScanPair(loop, ref.get(), loopDark.get(), refDark.get(), rule));
        }
        return new Pairings(paired, unpaired);
    }

    private Optional<ScanRecord> nearestAtAnyIntegration(List<ScanRecord> candidates, ScanRecord to) {
        return nearest(candidates, to, false);
    }

    private Optional<ScanRecord> nearest(List<ScanRecord> candidates, ScanRecord to, boolean matchIntegration) {
        Comparator<ScanRecord> order = Comparator.comparing((ScanRecord c) -> distance(c, to))
                .thenComparing(ScanRecord::takenAt);
        if (matchIntegration) {
            // a dark shown to match first, then one that cannot be shown either way
            order = Comparator.comparing((ScanRecord c) -> ScanExposure.match(c.conditions(), to.conditions()))
                    .thenComparing(order);
        }
        // candidates are in time order, so those within the window are one run of them
        ScanRecord best = null;
        for (int i = firstNotBeforeWindow(candidates, to); i < candidates.size(); i++) {
            ScanRecord c = candidates.get(i);
            if (distance(c, to).compareTo(window) > 0) {
                break;
            }
            boolean admissible = !matchIntegration
                    || ScanExposure.match(c.conditions(), to.conditions()) != ScanExposure.Match.DIFFERENT;
            if (admissible && c.pointTag().equals(to.pointTag()) && (best == null || order.compare(best, c) > 0)) {
                best = c;
            }
        }
        return Optional.ofNullable(best);
    }

    /** Index of the first candidate not taken longer than the window before {@code to}. */
    private int firstNotBeforeWindow(List<ScanRecord> candidates, ScanRecord to) {
        int lo = 0;
        int hi = candidates.size();
        while (lo < hi) {
            int mid = (lo + hi) >>> 1;
            ScanRecord c = candidates.get(mid);
            if (c.takenAt().isBefore(to.takenAt()) && distance(c, to).compareTo(window) > 0) {
                lo = mid + 1;
            } else {
                hi = mid;
            }
        }
        return lo;
    }

    private static Duration distance(ScanRecord a, ScanRecord b) {
        // Duration.abs() negates through BigDecimal; measuring the other way round is exact and cheap
        return a.takenAt().isAfter(b.takenAt()) ? Duration.between(b.takenAt(), a.takenAt())
                : Duration.between(a.takenAt(), b.takenAt());
    }

    private static List<ScanRecord> ofKind(List<ScanRecord> scans, ScanKind kind) {
        return scans.stream().filter(s -> s.kind() == kind)
                .sorted(Comparator.comparing(ScanRecord::takenAt)).toList();
    }

    /** A loop scan that could not be paired, and why. */
    public record UnpairedScan(ScanRecord loop, String reason) {
    }

    /** Every loop scan of a point, paired or not, in time order. */
    public record Pairings(List<ScanPair> paired, List<UnpairedScan> unpaired) {

        public Pairings {
            paired = List.copyOf(paired);
            unpaired = List.copyOf(unpaired);
        }

        /** The most recent paired loop scan, if any. */
        public Optional<ScanPair> latest() {
            return paired.isEmpty() ? Optional.empty() : Optional.of(paired.get(paired.size() - 1));
        }
    }
}
