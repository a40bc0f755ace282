package org.strandbook.scanfile;

import java.util.Locale;

/**
 * What a spectrum file's values are, read from its ordinate unit or label (JCAMP-DX
 * {@code ##YUNITS=}, a delimited file's value-column header).
 *
 * <p>A loop, reference or dark scan is the detector's own signal. An analyzer that has already
 * divided by its reference writes transmittance (T = I/I₀) or absorbance (A = −log₁₀ T, IUPAC Gold
 * Book, "absorbance"); stored as a signal, a healthy loop with T = 0.8 would read as a loop that
 * returns almost no light. Labels that name no ratio (counts, volts, arbitrary units, "a.u.",
 * intensity, none) are taken as a signal; "AU" and "A" alone are too ambiguous (arbitrary units,
 * amperes) to be read as absorbance.
 */
public enum YUnit {
    /** Detector counts, volts, arbitrary units or unnamed: a signal. */
    SIGNAL("a detector signal"),
    /** A transmittance, as a fraction or in per cent. */
    TRANSMITTANCE("a transmittance"),
    /** An absorbance or optical density (decadic). */
    ABSORBANCE("an absorbance"),
    /** A reflectance or a function of it (log 1/R, Kubelka-Munk). */
    REFLECTANCE("a reflectance");

    private final String phrase;

    YUnit(String phrase) {
        this.phrase = phrase;
    }

    /** "a transmittance", "an absorbance": for messages. */
    public String phrase() {
        return phrase;
    }

    /** The kind of value a label names; {@link #SIGNAL} when it names no ratio. */
    public static YUnit of(String label) {
        String l = label.toUpperCase(Locale.ROOT);
        StringBuilder kept = new StringBuilder(l.length());
        for (int i = 0; i < l.length(); i++) {
            char c = l.charAt(i);
            if ((c >= 'A' && c <= 'Z') || (c >= '0' && c <= '9') || c == '%' || c == '/') {
                kept.append(c);
            }
        }
        String compact = kept.toString();
        if (l.contains("ABSORBANCE") || l.contains("OPTICAL DENSITY") || compact.equals("OD")
                || l.contains("EXTINCTION")) {
            return ABSORBANCE;
        }
        if (l.contains("REFLECTANCE") || l.contains("KUBELKA") || compact.contains("LOG1/R") || compact.equals("%R")
                || compact.equals("R%")) {
            return REFLECTANCE;
        }
        if (l.contains("TRANSMITTANCE") || l.contains("TRANSMISSION") || compact.equals("%T") || compact.equals("T%")
                || compact.equals("T")) {
            return TRANSMITTANCE;
        }
        return SIGNAL;
    }
}
