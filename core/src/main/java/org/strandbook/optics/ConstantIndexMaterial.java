package org.strandbook.optics;

/**
 * A medium taken with one refractive index at every wavelength: air, an index-matching gel, a
 * process liquid entered by the user. Valid at all wavelengths.
 *
 * @param name for messages
 * @param index refractive index, at least 1
 */
public record ConstantIndexMaterial(String name, double index) implements OpticalMaterial {

    /**
     * Air, taken as 1.0: air's 1.0003 at room conditions changes a silica face's reflectance by
     * well under 0.1 % of its value.
     */
    public static final ConstantIndexMaterial AIR = new ConstantIndexMaterial("air", 1.0);

    public ConstantIndexMaterial {
        if (name == null || name.isBlank()) {
            throw new IllegalArgumentException("a material needs a name");
        }
        if (!(index >= 1.0) || !Double.isFinite(index)) {
            throw new IllegalArgumentException("refractive index of " + name + " must be a number ≥ 1, was " + index);
        }
    }

    /** An index-matching gel or oil of the given index (near the core index removes the Fresnel loss). */
    public static ConstantIndexMaterial indexMatchingGel(double index) {
        return new ConstantIndexMaterial("index-matching gel n=" + index, index);
    }

    @Override
    public WavelengthRange validRange() {
        return WavelengthRange.ALL;
    }

    @Override
    public double refractiveIndex(double wavelengthNm) {
        return index;
    }

    @Override
    public String toString() {
        return name;
    }
}
