package org.strandbook.optics;

/**
 * A transparent medium light passes or meets at a face: fiber core glass, a window crystal, air,
 * an index-matching gel. Implementations are immutable values with proper {@code equals}.
 */
public interface OpticalMaterial {

    /** Short name for messages and reports, e.g. "fused silica". */
    String name();

    /** The wavelengths for which {@link #refractiveIndex(double)} is valid. */
    WavelengthRange validRange();

    /**
     * Refractive index (dimensionless) at a vacuum wavelength in nm.
     *
     * @throws IllegalArgumentException outside {@link #validRange()}
     */
    double refractiveIndex(double wavelengthNm);

    /** Refractive index at every grid point; throws if the grid leaves {@link #validRange()}. */
    default double[] refractiveIndex(WavelengthGrid grid) {
        validRange().require(grid, name());
        double[] n = new double[grid.size()];
        for (int i = 0; i < n.length; i++) {
            n[i] = refractiveIndex(grid.wavelengthNm(i));
        }
        return n;
    }
}
