package org.strandbook.optics.path;

import java.util.ArrayList;
import java.util.List;

import org.strandbook.optics.WavelengthGrid;

/**
 * How far and where a light path can go within an allowed loss: the longest fiber at each
 * wavelength, and the usable spectral windows.
 */
public final class Reach {

    private Reach() {
    }

    /**
     * The longest length (m) of a fiber with the given attenuation (dB/km) at each wavelength so that
     * it plus {@code otherLossDb} (everything else on the path, dB) stays within
     * {@code allowedLossDb}: (allowed − other)/(α/1000). Zero where the rest already uses the
     * allowance.
     */
    public static double[] maxLengthM(double[] attenuationDbPerKm, double allowedLossDb, double[] otherLossDb) {
        if (attenuationDbPerKm.length != otherLossDb.length) {
            throw new IllegalArgumentException("attenuation and other-loss spectra differ in length");
        }
        requireAllowance(allowedLossDb);
        double[] out = new double[attenuationDbPerKm.length];
        for (int i = 0; i < out.length; i++) {
            double room = allowedLossDb - otherLossDb[i];
            out[i] = room <= 0 ? 0 : room / (attenuationDbPerKm[i] * 1e-3);
        }
        return out;
    }

    /** {@link #maxLengthM(double[], double, double[])} for a fiber type on the cache's grid. */
    public static double[] maxLengthM(FiberSpec fiber, OpticsCache cache, double allowedLossDb, double[] otherLossDb) {
        cache.grid().requireSameLength(otherLossDb);
        return maxLengthM(cache.attenuationShared(fiber.attenuation()), allowedLossDb, otherLossDb);
    }

    /**
     * The contiguous wavelength ranges where {@code lossDb} ≤ {@code allowedLossDb}. Window edges
     * between grid points are placed where the loss, linearly interpolated, crosses the allowance;
     * windows touching the grid's ends stop there (the grid's ends say nothing beyond).
     */
    public static List<SpectralWindow> usableWindows(WavelengthGrid grid, double[] lossDb, double allowedLossDb) {
        grid.requireSameLength(lossDb);
        requireAllowance(allowedLossDb);
        List<SpectralWindow> windows = new ArrayList<>();
        int n = lossDb.length;
        int i = 0;
        while (i < n) {
            if (!(lossDb[i] <= allowedLossDb)) {
                i++;
                continue;
            }
            int start = i;
            while (i + 1 < n && lossDb[i + 1] <= allowedLossDb) {
                i++;
            }
            int end = i;
            double startNm = start == 0 ? grid.wavelengthNm(0) : crossing(grid, lossDb, start - 1, start, allowedLossDb);
            double endNm = end == n - 1 ? grid.wavelengthNm(n - 1) : crossing(grid, lossDb, end, end + 1, allowedLossDb);
            windows.add(new SpectralWindow(startNm, endNm));
            i++;
        }
        return List.copyOf(windows);
    }

    /** Usable windows of a budget's total loss. */
    public static List<SpectralWindow> usableWindows(LossBudget budget, double allowedLossDb) {
        return usableWindows(budget.grid(), budget.totalLossDb(), allowedLossDb);
    }

    private static double crossing(WavelengthGrid grid, double[] loss, int a, int b, double level) {
        double la = loss[a];
        double lb = loss[b];
        double wa = grid.wavelengthNm(a);
        double wb = grid.wavelengthNm(b);
        if (!Double.isFinite(la) || !Double.isFinite(lb) || la == lb) {
            return loss[a] <= level ? wa : wb;
        }
        return wa + (level - la) / (lb - la) * (wb - wa);
    }

    private static void requireAllowance(double allowedLossDb) {
        if (!(allowedLossDb >= 0) || !Double.isFinite(allowedLossDb)) {
            throw new IllegalArgumentException("allowed loss must be a finite number ≥ 0 dB, was " + allowedLossDb);
        }
    }
}
