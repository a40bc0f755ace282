package org.strandbook.optics.path;

import java.util.Locale;

/**
 * A contiguous wavelength range (nm) in which a light path stays within an allowed loss.
 *
 * @param startNm shortest wavelength of the window (nm)
 * @param endNm longest wavelength of the window (nm)
 */
public record SpectralWindow(double startNm, double endNm) {

    public SpectralWindow {
        if (!(endNm >= startNm)) {
            throw new IllegalArgumentException("window end " + endNm + " nm lies before its start " + startNm + " nm");
        }
    }

    public double widthNm() {
        return endNm - startNm;
    }

    @Override
    public String toString() {
        return String.format(Locale.ROOT, "%.0f–%.0f nm", startNm, endNm);
    }
}
