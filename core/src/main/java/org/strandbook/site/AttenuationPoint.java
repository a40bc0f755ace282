package org.strandbook.site;

/** One datasheet point of a fiber's spectral attenuation. */
public record AttenuationPoint(double wavelengthNm, double attenuationDbPerKm) {

    public AttenuationPoint {
        Require.positive(wavelengthNm, "datasheet wavelength (nm)");
        Require.positive(attenuationDbPerKm, "datasheet attenuation (dB/km)");
    }
}
