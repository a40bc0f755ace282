package org.strandbook.app.ui.sheet;

import java.math.BigDecimal;
import java.util.Locale;
import java.util.OptionalDouble;
import java.util.function.Function;

/**
 * How columns write values, always with {@link Locale#ROOT} so that a copied block reads back the
 * same on any machine.
 */
public final class CellFormats {

    private CellFormats() {
    }

    /** Fixed decimals: {@code decimal(2)} writes 1.5 as "1.50". */
    public static Function<Double, String> decimal(int places) {
        String pattern = "%." + places + "f";
        return v -> String.format(Locale.ROOT, pattern, v);
    }

    /** Fixed decimals; an empty value writes as an empty cell. */
    public static Function<OptionalDouble, String> optionalDecimal(int places) {
        Function<Double, String> f = decimal(places);
        return v -> v.isPresent() ? f.apply(v.getAsDouble()) : "";
    }

    /** The shortest plain form: 250.0 as "250", 0.125 as "0.125", never an exponent. */
    public static String plain(double v) {
        if (!Double.isFinite(v)) {
            return Double.toString(v);
        }
        return BigDecimal.valueOf(v).stripTrailingZeros().toPlainString();
    }

    /** An enum constant as a technician reads it: NOT_INSPECTED as "not inspected". */
    public static String choice(Enum<?> e) {
        return e.name().toLowerCase(Locale.ROOT).replace('_', ' ');
    }

    public static String yesNo(boolean b) {
        return b ? "yes" : "no";
    }
}
