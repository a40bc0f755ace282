package org.strandbook.app.ui.sheet;

import java.util.Arrays;
import java.util.Collection;
import java.util.Locale;
import java.util.OptionalDouble;
import java.util.function.Supplier;
import java.util.regex.Pattern;
import java.util.stream.Collectors;

/** The parsers the workbook's columns share. */
public final class CellParsers {

    private static final Pattern WHOLE = Pattern.compile("[+-]?\\d+");

    private CellParsers() {
    }

    /** Required text, stripped; {@code what} names it in the reason ("a cable ID"). */
    public static CellParser<String> text(String what) {
        return t -> t == null || t.isBlank() ? ParseResult.rejected("enter " + what) : ParseResult.accepted(t.strip());
    }

    /** Any text, stripped; blank is allowed. */
    public static CellParser<String> freeText() {
        return t -> ParseResult.accepted(t == null ? "" : t.strip());
    }

    /** Blank means "none", anything else goes to {@code number}. */
    public static CellParser<OptionalDouble> optional(CellParser<Double> number) {
        return t -> t == null || t.isBlank() ? ParseResult.accepted(OptionalDouble.empty())
                : number.parse(t).map(OptionalDouble::of);
    }

    public static CellParser<Integer> wholeNumber(int min, int max) {
        return t -> {
            String s = t == null ? "" : t.strip();
            if (!WHOLE.matcher(s).matches()) {
                return ParseResult.rejected(s.isEmpty() ? "enter a whole number" : "'" + s + "' is not a whole number");
            }
            long v = Long.parseLong(s);
            if (v < min || v > max) {
                return ParseResult.rejected("must lie between " + min + " and " + max + ", was " + v);
            }
            return ParseResult.accepted((int) v);
        };
    }

    /** One of an enum's constants, written as {@link CellFormats#choice(Enum)} shows it, any case. */
    public static <E extends Enum<E>> CellParser<E> choice(Class<E> type) {
        return t -> {
            String s = t == null ? "" : t.strip().replace('-', ' ').replace('_', ' ').replaceAll("\\s+", " ");
            for (E e : type.getEnumConstants()) {
                if (CellFormats.choice(e).equalsIgnoreCase(s)) {
                    return ParseResult.accepted(e);
                }
            }
            return ParseResult.rejected("'" + (t == null ? "" : t.strip()) + "' is not one of: "
                    + Arrays.stream(type.getEnumConstants()).map(CellFormats::choice).collect(Collectors.joining(", ")));
        };
    }

    /** yes/no (also y/n, true/false, 1/0), any case. */
    public static CellParser<Boolean> yesNo() {
        return t -> switch (t == null ? "" : t.strip().toLowerCase(Locale.ROOT)) {
            case "yes", "y", "true", "1" -> ParseResult.accepted(true);
            case "no", "n", "false", "0" -> ParseResult.accepted(false);
            default -> ParseResult.rejected("'" + (t == null ? "" : t.strip()) + "': enter yes or no");
        };
    }

    /**
     * A code that must exist in a catalog, matched ignoring case and stored as the catalog writes
     * it. The supplier is read at each parse so a catalog edit takes effect at once.
     */
    public static CellParser<String> catalogCode(String catalogName, Supplier<? extends Collection<String>> codes) {
        return t -> {
            String s = t == null ? "" : t.strip();
            if (s.isEmpty()) {
                return ParseResult.rejected("enter a code from the " + catalogName);
            }
            for (String code : codes.get()) {
                if (code.equalsIgnoreCase(s)) {
                    return ParseResult.accepted(code);
                }
            }
            return ParseResult.rejected("'" + s + "' is not in the " + catalogName + " (" + String.join(", ", codes.get()) + ")");
        };
    }
}
