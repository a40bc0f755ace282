package org.strandbook.optics.attenuation;

/**
 * One OH absorption band of silica: a Gaussian in wavenumber with the given peak per ppm (by
 * weight) of OH and full width at half maximum.
 *
 * @param centerNm band centre (nm)
 * @param peakDbPerKmPerPpm peak attenuation per ppm OH (dB/km/ppm), ≥ 0
 * @param fwhmCm full width at half maximum in wavenumber (cm⁻¹), positive
 */
public record OhBand(double centerNm, double peakDbPerKmPerPpm, double fwhmCm) {

    public OhBand {
        if (!(centerNm > 0) || !(peakDbPerKmPerPpm >= 0) || !(fwhmCm > 0)
                || !Double.isFinite(peakDbPerKmPerPpm) || !Double.isFinite(fwhmCm)) {
            throw new IllegalArgumentException("invalid OH band " + centerNm + " nm, "
                    + peakDbPerKmPerPpm + " dB/km/ppm, FWHM " + fwhmCm + " cm⁻¹");
        }
    }

    /** Attenuation of this band per ppm OH at a wavelength (dB/km/ppm). */
    public double dbPerKmPerPpm(double wavelengthNm) {
        return peakDbPerKmPerPpm * AttenuationShapes.gaussianInWavenumber(wavelengthNm, centerNm, fwhmCm);
    }
}
