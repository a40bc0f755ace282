package org.strandbook.optics.path;

import java.util.Objects;

import org.strandbook.optics.OpticalMaterial;
import org.strandbook.optics.SellmeierMaterial;
import org.strandbook.optics.attenuation.AttenuationModel;

/**
 * A multimode step-index fiber type as a catalog lists it.
 *
 * @param coreUm core diameter (µm), positive
 * @param claddingUm cladding diameter (µm), larger than the core
 * @param na numerical aperture, 0 &lt; NA &lt; 1
 * @param coreMaterial core glass (its index drives Fresnel and bend loss)
 * @param attenuation spectral attenuation model of the fiber
 */
public record FiberSpec(double coreUm, double claddingUm, double na, OpticalMaterial coreMaterial,
        AttenuationModel attenuation) {

    public FiberSpec {
        if (!(coreUm > 0) || !Double.isFinite(coreUm)) {
            throw new IllegalArgumentException("core diameter must be a positive number, was " + coreUm + " µm");
        }
        if (!(claddingUm > coreUm) || !Double.isFinite(claddingUm)) {
            throw new IllegalArgumentException("cladding diameter " + claddingUm + " µm must exceed the core diameter "
                    + coreUm + " µm");
        }
        if (!(na > 0 && na < 1)) {
            throw new IllegalArgumentException("NA must lie between 0 and 1 exclusive, was " + na);
        }
        Objects.requireNonNull(coreMaterial, "coreMaterial");
        Objects.requireNonNull(attenuation, "attenuation");
    }

    /** A pure-silica-core fiber (Malitson fused silica core). */
    public static FiberSpec silicaCore(double coreUm, double claddingUm, double na, AttenuationModel attenuation) {
        return new FiberSpec(coreUm, claddingUm, na, SellmeierMaterial.FUSED_SILICA, attenuation);
    }
}
