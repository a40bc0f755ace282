package org.strandbook.optics.attenuation;

import org.strandbook.optics.WavelengthGrid;
import org.strandbook.optics.WavelengthRange;

/**
 * Spectral attenuation coefficient of a fiber in dB/km. Implementations are immutable values with
 * proper {@code equals}/{@code hashCode} (the loss-budget cache keys on them).
 */
public interface AttenuationModel {

    /** Wavelengths where the model may be evaluated; outside it every call throws. */
    WavelengthRange validRange();

    /**
     * Attenuation in dB/km at a vacuum wavelength in nm.
     *
     * @throws IllegalArgumentException outside {@link #validRange()}
     */
    double attenuationDbPerKm(double wavelengthNm);

    /** Attenuation in dB/km at every grid point; throws if the grid leaves {@link #validRange()}. */
    default double[] attenuationDbPerKm(WavelengthGrid grid) {
        validRange().require(grid, describe());
        double[] a = new double[grid.size()];
        for (int i = 0; i < a.length; i++) {
            a[i] = attenuationDbPerKm(grid.wavelengthNm(i));
        }
        return a;
    }

    /** One line naming the model for messages, e.g. "silica attenuation model (low-OH, 5 ppm OH)". */
    String describe();
}
