package org.strandbook.app.bench;

import java.util.function.IntToDoubleFunction;

/**
 * Operations per second of one timed trial: whole passes over {@code count} operations until at
 * least the trial time has gone by. The results are summed into a field the JIT cannot prove
 * unused, so the work is not optimised away.
 */
final class TrialRate {

    private final long trialNs;
    private volatile double sink;

    TrialRate(long trialMs) {
        this.trialNs = trialMs * 1_000_000L;
    }

    double perSecond(IntToDoubleFunction work, int count) {
        long start = System.nanoTime();
        long done = 0;
        double acc = 0;
        long elapsed;
        do {
            for (int i = 0; i < count; i++) {
                acc += work.applyAsDouble(i);
            }
            done += count;
            elapsed = System.nanoTime() - start;
        } while (elapsed < trialNs);
        sink += acc;
        return done / (elapsed * 1e-9);
    }
}
