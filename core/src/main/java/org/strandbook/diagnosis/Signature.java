package org.strandbook.diagnosis;

/**
 * The spectral shapes a deviation (measured − predicted loss) is fitted with. Each column is scaled
 * to 1 dB at its reference wavelength, so a fitted coefficient reads directly as dB there.
 */
public enum Signature {
    /** Wavelength-flat excess: a connector, an air gap, or, for large cores, a bend (Gloge). */
    FLAT_EXCESS,
    /** The silica OH band comb (945, 1240, 1383, 2210 nm...): high-OH fiber or OH growth. */
    OH_BANDS,
    /** Molecular hydrogen bands (1240, 2420 nm): reversible hydrogen darkening. */
    HYDROGEN,
    /** Loss rising toward short wavelengths: radiation-induced or solarization darkening. */
    DARKENING,
    /**
     * The lamp's colour temperature changed between reference and loop scan: Planck's law makes it
     * nearly linear in 1/λ over the NIR, signed; the amount is its tilt across the range.
     */
    REFERENCE_DRIFT,
    /** Periodic fringes left in the residual: not a fitted column but a search over periods. */
    FRINGES
}
