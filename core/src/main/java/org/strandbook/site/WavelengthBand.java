package org.strandbook.site;

/**
 * A band of interest at a measurement point: the wavelengths the analyzer's chemometric model uses.
 *
 * @param name   short label, e.g. "C-H 1st overtone"
 * @param fromNm lower edge, nm
 * @param toNm   upper edge, nm
 */
public record WavelengthBand(String name, double fromNm, double toNm) {

    public WavelengthBand {
        name = name == null || name.isBlank() ? defaultName(fromNm, toNm) : name.strip();
        Require.positive(fromNm, "band lower edge (nm)");
        Require.positive(toNm, "band upper edge (nm)");
        if (toNm <= fromNm) {
            throw new IllegalArgumentException("band " + name + ": upper edge " + toNm
                    + " nm must exceed lower edge " + fromNm + " nm");
        }
    }

    public double centreNm() {
        return 0.5 * (fromNm + toNm);
    }

    public boolean contains(double wavelengthNm) {
        return wavelengthNm >= fromNm && wavelengthNm <= toNm;
    }

    private static String defaultName(double fromNm, double toNm) {
        return String.format(java.util.Locale.ROOT, "%.0f-%.0f nm", fromNm, toNm);
    }
}
