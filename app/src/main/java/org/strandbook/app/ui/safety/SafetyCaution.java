package org.strandbook.app.ui.safety;

/**
 * The caution shown before a light-source step or a measurement on a point in a hazardous area,
 * once per session (after that it is still one click away in the Help menu). The wording names
 * the standards a site's own rules rest on and defers to them.
 */
public final class SafetyCaution {

    public static final String TITLE = "Safety cautions";

    public static final String TEXT = String.join("\n",
            "\u2022 Never look into a live fiber end or connector, nor through a magnifier or inspection scope at one. "
                    + "Switch the source off or blank the channel before opening a joint.",
            "\u2022 Laser and fiber-system light: IEC 60825-1 and IEC 60825-2. Lamps and LEDs: IEC 62471.",
            "\u2022 Optical power in explosive atmospheres: IEC 60079-28. In a classified area work only under the "
                    + "site's hazardous-area rules and a valid permit to work.",
            "\u2022 Do not open pressurised process connections or probe mountings unless the line is isolated and "
                    + "released under the permit.",
            "\u2022 Cleaved or broken fiber leaves glass shards: wear safety glasses, use tweezers and a sharps container.",
            "",
            "Local codes, the site's permit-to-work and licensed practice take precedence over this reminder.");

    private boolean acknowledged;

    /** True when the caution has not yet been acknowledged in this session. */
    public boolean needed() {
        return !acknowledged;
    }

    public void acknowledge() {
        acknowledged = true;
    }

    /** Why the caution is shown now, e.g. for a hazardous-area point. */
    public static String reasonForHazardousPoint(String pointTag) {
        return "Point " + pointTag + " lies in a classified hazardous area.";
    }

    public static final String REASON_LIGHT_SOURCE = "The light source is about to be switched on.";
}
