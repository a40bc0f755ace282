package org.strandbook.scanfile;

import java.util.Arrays;
import java.util.Locale;
import java.util.Set;
import java.util.regex.Pattern;
import java.util.stream.Collectors;

/**
 * Whether a JCAMP-DX {@code ##DATA TYPE=} describes what a fiber loop carries: an absorption,
 * transmission, reflection or emission spectrum of light on an absolute axis (wavelength or
 * wavenumber). McDonald &amp; Wilks (Appl. Spectrosc. 42, 151 (1988)) name INFRARED SPECTRUM; later
 * versions add UV/VIS, RAMAN, NMR and MASS SPECTRUM, and other communities write their own. A
 * Raman spectrum's 1/CM axis is a shift from the laser line and a neutron or electron
 * energy-loss spectrum's an energy transfer: stored as absolute wavenumbers they would put every
 * point at a wrong wavelength. So types naming such a relative axis or another kind of data are
 * refused, types naming light are accepted, and anything else is refused rather than guessed.
 */
final class LightDataType {

    /** Words that name a spectrum of light on an absolute axis. */
    private static final Set<String> LIGHT = Set.of("INFRARED", "IR", "NIR", "MIR", "FTIR", "NEARINFRARED",
            "UV", "VIS", "UVVIS", "VISIBLE", "ULTRAVIOLET", "OPTICAL", "ABSORPTION", "ABSORBANCE", "EMISSION",
            "TRANSMISSION", "TRANSMITTANCE", "REFLECTANCE", "REFLECTION", "LIGHT", "FLUORESCENCE",
            "LUMINESCENCE", "PHOTOLUMINESCENCE");

    /** Words that name a relative axis (a shift or transfer) or data that is not a light spectrum. */
    private static final Set<String> NOT_LIGHT = Set.of("RAMAN", "SHIFT", "NEUTRON", "INELASTIC", "TRANSFER",
            "ENERGYLOSS", "EELS", "NMR", "MASS", "MS", "CHROMATOGRAM", "EPR", "ESR", "ELECTRON", "ION", "MOBILITY",
            "CIRCULAR", "DICHROISM", "CD", "XRAY", "DIFFRACTION");

    private static final Pattern NOT_A_LETTER = Pattern.compile("[^A-Z]+");

    private LightDataType() {
    }

    /** Null when the data type is a light spectrum Strandbook reads; otherwise why not. */
    static String refusal(String dataType) {
        String t = dataType.toUpperCase(Locale.ROOT).replace("X-RAY", "XRAY").replace("X RAY", "XRAY")
                .replace("ENERGY LOSS", "ENERGYLOSS").replace("ENERGY-LOSS", "ENERGYLOSS")
                .replace("UV/VIS", "UVVIS").replace("UV-VIS", "UVVIS").replace("NEAR INFRARED", "NEARINFRARED")
                .replace("NEAR-INFRARED", "NEARINFRARED");
        Set<String> words = Arrays.stream(NOT_A_LETTER.split(t)).filter(w -> !w.isEmpty()).collect(Collectors.toSet());
        for (String w : words) {
            if (NOT_LIGHT.contains(w)) {
                return "not an absorption or emission spectrum of light on an absolute axis (" + w.toLowerCase(Locale.ROOT)
                        + " data: its axis would be stored as wrong wavelengths); Strandbook reads infrared, "
                        + "near-infrared, UV/VIS and other optical spectra";
            }
        }
        for (String w : words) {
            if (LIGHT.contains(w)) {
                return null;
            }
        }
        return "not known as an optical spectrum; Strandbook reads infrared, near-infrared, UV/VIS, absorption, "
                + "transmission, reflectance and emission spectra";
    }
}
