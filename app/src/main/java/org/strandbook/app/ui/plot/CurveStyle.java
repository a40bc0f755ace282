package org.strandbook.app.ui.plot;

/**
 * How a curve is drawn: colour, line width and dash, or markers only. Plain data, so view models
 * choose styles without touching the scene graph. Colours are from the Okabe–Ito palette (Okabe &
 * Ito, "Color Universal Design", 2008), which stays distinct for the common colour-vision
 * deficiencies; dashes and legend words carry the meaning as well, never colour alone.
 *
 * @param colour  CSS colour, e.g. "#0072B2"
 * @param widthPx line width, px
 * @param dashed  drawn dashed
 * @param markers drawn as markers at each point, without a line
 */
public record CurveStyle(String colour, double widthPx, boolean dashed, boolean markers) {

    public static final String BLACK = "#000000";
    public static final String ORANGE = "#E69F00";
    public static final String SKY_BLUE = "#56B4E9";
    public static final String BLUISH_GREEN = "#009E73";
    public static final String BLUE = "#0072B2";
    public static final String VERMILLION = "#D55E00";
    public static final String REDDISH_PURPLE = "#CC79A7";
    public static final String GREY = "#6E6E6E";

    /** The palette without black, in an order where neighbours differ most. */
    public static final String[] SERIES = {BLUE, ORANGE, BLUISH_GREEN, REDDISH_PURPLE, SKY_BLUE, VERMILLION, GREY};

    public static CurveStyle line(String colour, double widthPx) {
        return new CurveStyle(colour, widthPx, false, false);
    }

    public static CurveStyle dashed(String colour, double widthPx) {
        return new CurveStyle(colour, widthPx, true, false);
    }

    public static CurveStyle markers(String colour) {
        return new CurveStyle(colour, 1, false, true);
    }

    /** The {@code i}-th series colour, cycling. */
    public static String series(int i) {
        return SERIES[Math.floorMod(i, SERIES.length)];
    }
}
