package org.strandbook.optics.attenuation;

/**
 * Molecular hydrogen dissolved in the glass: a reversible loss linear in the H₂ partial pressure,
 * with bands near 1240 nm and 2420 nm (shape in {@link AttenuationShapes#hydrogenBandShape}).
 *
 * <p>The magnitude is a parameter the user supplies: Strandbook claims no absolute dB/km per atm.
 *
 * @param partialPressureAtm H₂ partial pressure (atm), ≥ 0
 * @param peakDbPerKmPerAtm attenuation at the 1240 nm peak per atm H₂ (dB/km/atm), ≥ 0
 * @param relativePeak2420 height of the 2420 nm band relative to the 1240 nm band, ≥ 0
 */
public record HydrogenLoading(double partialPressureAtm, double peakDbPerKmPerAtm, double relativePeak2420) {

    /** No hydrogen. */
    public static final HydrogenLoading NONE = new HydrogenLoading(0, 0, 0);

    public HydrogenLoading {
        if (!(partialPressureAtm >= 0) || !(peakDbPerKmPerAtm >= 0) || !(relativePeak2420 >= 0)
                || !Double.isFinite(partialPressureAtm) || !Double.isFinite(peakDbPerKmPerAtm)
                || !Double.isFinite(relativePeak2420)) {
            throw new IllegalArgumentException("hydrogen pressure, peak and band ratio must be finite numbers ≥ 0");
        }
    }

    /** Hydrogen-induced attenuation in dB/km at a wavelength. */
    public double attenuationDbPerKm(double wavelengthNm) {
        if (partialPressureAtm == 0 || peakDbPerKmPerAtm == 0) {
            return 0;
        }
        return partialPressureAtm * peakDbPerKmPerAtm
                * AttenuationShapes.hydrogenBandShape(wavelengthNm, relativePeak2420);
    }
}
