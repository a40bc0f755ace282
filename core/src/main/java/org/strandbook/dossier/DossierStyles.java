package org.strandbook.dossier;

import java.util.HashMap;
import java.util.Map;

import org.apache.poi.ss.usermodel.CellStyle;
import org.apache.poi.ss.usermodel.Font;
import org.apache.poi.ss.usermodel.Workbook;

import org.strandbook.spreadsheet.FormulaText;

/**
 * The styles the writer derives from the template's: each made once per workbook and cached by
 * purpose and base style, so a dossier of any length holds a fixed handful of styles.
 */
final class DossierStyles {

    /** What a derived style is for. */
    enum Look {
        /** The template's style as it is. */
        PLAIN,
        /** Bold: totals, captions, block titles. */
        EMPHASIS,
        /** Wrapping text: notes under captions. */
        WRAPPED
    }

    /** Letters of ordinary text per digit width: most letters are narrower than a digit. */
    private static final double PROPORTIONAL_CHARS_PER_DIGIT = 1.15;
    /** Bold letters are wider. */
    private static final double BOLD_CHARS_PER_DIGIT = 1.0;
    /** Letters of a fixed-pitch font per digit width of the default font, size for size. */
    private static final double FIXED_PITCH_CHARS_PER_DIGIT = 1.1;

    private record Key(short base, Look look, boolean quoted) {
    }

    private final Workbook workbook;
    private final Map<Key, CellStyle> styles = new HashMap<>();
    private final Map<Integer, Font> boldFonts = new HashMap<>();

    DossierStyles(Workbook workbook) {
        this.workbook = workbook;
    }

    /** The style for {@code text} in a cell whose template style is {@code base}. */
    CellStyle forText(CellStyle base, Look look, String text) {
        return style(base, look, FormulaText.startsLikeFormula(text));
    }

    CellStyle style(CellStyle base, Look look, boolean quoted) {
        if (look == Look.PLAIN && !quoted) {
            return base;
        }
        return styles.computeIfAbsent(new Key(base.getIndex(), look, quoted), k -> {
            CellStyle s = workbook.createCellStyle();
            s.cloneStyleFrom(base);
            if (look == Look.EMPHASIS) {
                s.setFont(bold(workbook.getFontAt(base.getFontIndex())));
            }
            if (look == Look.WRAPPED) {
                s.setWrapText(true);
            }
            s.setQuotePrefixed(quoted);
            return s;
        });
    }

    private Font bold(Font base) {
        if (base.getBold()) {
            return base;
        }
        return boldFonts.computeIfAbsent(base.getIndex(), k -> {
            Font f = workbook.createFont();
            f.setFontName(base.getFontName());
            f.setFontHeightInPoints(base.getFontHeightInPoints());
            f.setColor(base.getColor());
            f.setItalic(base.getItalic());
            f.setBold(true);
            return f;
        });
    }

    /** How text lays out in a style: read from the style once, then cached, as cells are written by the million. */
    private record Metrics(boolean wraps, float lineHeightPoints, double charsPerDigit) {
    }

    private final Map<Short, Metrics> metrics = new HashMap<>();

    private Metrics metrics(CellStyle style) {
        return metrics.computeIfAbsent(style.getIndex(), k -> {
            Font f = workbook.getFontAt(style.getFontIndex());
            double scale = 11.0 / Math.max(6, f.getFontHeightInPoints());
            boolean fixedPitch = f.getFontName() != null
                    && f.getFontName().toLowerCase(java.util.Locale.ROOT).contains("courier");
            double perDigit = fixedPitch ? FIXED_PITCH_CHARS_PER_DIGIT
                    : f.getBold() ? BOLD_CHARS_PER_DIGIT : PROPORTIONAL_CHARS_PER_DIGIT;
            return new Metrics(style.getWrapText(), 1.3f * f.getFontHeightInPoints() + 1f, scale * perDigit);
        });
    }

    /** True when text wraps in {@code style}. */
    boolean wraps(CellStyle style) {
        return metrics(style).wraps();
    }

    /** Height in points of a line of text in {@code style}'s font. */
    float lineHeightPoints(CellStyle style) {
        return metrics(style).lineHeightPoints();
    }

    /**
     * Characters of ordinary text that fit a line of a column {@code widthChars} wide (widths count
     * the digit width of the default 11 pt font) in {@code style}'s font.
     */
    double charsPerLine(CellStyle style, double widthChars) {
        return widthChars * metrics(style).charsPerDigit();
    }

    /** Number of styles derived so far (the benchmark shows it does not grow with the site). */
    int derivedCount() {
        return styles.size() + boldFonts.size();
    }
}
