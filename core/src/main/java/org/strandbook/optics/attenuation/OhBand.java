package org.strandbook.optics.attenuation;

import org.strandbook.optics.Wavenumber;

/**
 * One OH absorption band of silica, on a wavenumber axis: a Gaussian core with the given full width
 * at half maximum, plus a Lorentzian wing carrying {@code wingFraction} of the peak that fades
 * exponentially beyond {@code wingReachCm} from the centre. The value at the centre is the peak.
 *
 * <p>Why a wing: a Gaussian alone dies within a few widths, but the OH bands of wet silica are not
 * alone: hydrogen-bonded OH on the red side of the 3670 cm⁻¹ stretch and a row of OH combination
 * bands between about 3750 and 4510 cm⁻¹ on its blue side (A. M. Efimov and V. G. Pogareva, Chem.
 * Geol. 229, 198 (2006)) fill the span between the 2.21 µm and 2.72 µm bands, and high-OH fiber is
 * unusable there. The fade keeps a wing from reaching bands thousands of cm⁻¹ away.
 *
 * @param centerNm band centre (nm)
 * @param peakDbPerKmPerPpm peak attenuation per ppm OH by weight (dB/km/ppm), ≥ 0
 * @param fwhmCm full width at half maximum of the core in wavenumber (cm⁻¹), positive
 * @param wingFraction share of the peak carried by the Lorentzian wing, 0–1 (0: a plain Gaussian)
 * @param wingReachCm distance in wavenumber (cm⁻¹) over which the wing fades by 1/e, positive
 */
public record OhBand(double centerNm, double peakDbPerKmPerPpm, double fwhmCm, double wingFraction,
        double wingReachCm) {

    public OhBand {
        if (!(centerNm > 0) || !(peakDbPerKmPerPpm >= 0) || !(fwhmCm > 0)
                || !Double.isFinite(peakDbPerKmPerPpm) || !Double.isFinite(fwhmCm)
                || !(wingFraction >= 0 && wingFraction <= 1) || !(wingReachCm > 0)) {
            throw new IllegalArgumentException("invalid OH band " + centerNm + " nm, "
                    + peakDbPerKmPerPpm + " dB/km/ppm, FWHM " + fwhmCm + " cm⁻¹, wing " + wingFraction
                    + " fading over " + wingReachCm + " cm⁻¹");
        }
    }

    /** A band without a wing: a plain Gaussian in wavenumber. */
    public OhBand(double centerNm, double peakDbPerKmPerPpm, double fwhmCm) {
        this(centerNm, peakDbPerKmPerPpm, fwhmCm, 0, fwhmCm);
    }

    /** Attenuation of this band per ppm OH at a wavelength (dB/km/ppm). */
    public double dbPerKmPerPpm(double wavelengthNm) {
        double core = AttenuationShapes.gaussianInWavenumber(wavelengthNm, centerNm, fwhmCm);
        if (wingFraction == 0) {
            return peakDbPerKmPerPpm * core;
        }
        double offsetCm = Wavenumber.wavenumberCmFromNm(wavelengthNm) - Wavenumber.wavenumberCmFromNm(centerNm);
        double x = offsetCm / fwhmCm;
        double wing = Math.exp(-Math.abs(offsetCm) / wingReachCm) / (1 + 4 * x * x);
        return peakDbPerKmPerPpm * ((1 - wingFraction) * core + wingFraction * wing);
    }
}
