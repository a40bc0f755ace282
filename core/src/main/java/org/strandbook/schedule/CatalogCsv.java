package org.strandbook.schedule;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.InputStreamReader;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.EnumMap;
import java.util.List;
import java.util.Map;
import java.util.function.Function;

import org.strandbook.site.ConnectorType;
import org.strandbook.site.FiberType;
import org.strandbook.site.OhGrade;
import org.strandbook.site.ProbeKind;
import org.strandbook.site.ProbeType;
import org.strandbook.site.SpreadInput;
import org.strandbook.site.StatedSpread;
import org.strandbook.site.StatedSpreads;
import org.strandbook.templates.Templates;

/**
 * Reads the shipped catalog files. Their format is deliberately tiny: UTF-8 lines, '#' comments,
 * a header equal to the matching schedule sheet's headers plus a final "Basis" column, and fields
 * split on commas with no quoting (no shipped field holds a comma; the templates test checks that).
 * A fault here is a defect of the build, so it throws rather than reporting to a user.
 */
final class CatalogCsv {

    static final String BASIS_HEADER = "Basis";

    private CatalogCsv() {
    }

    static ComponentCatalog readShipped() {
        return new ComponentCatalog(
                read(Templates.FIBER_TYPES, ScheduleSheet.FIBER_TYPES, CatalogCsv::fiberType),
                read(Templates.CONNECTOR_TYPES, ScheduleSheet.CONNECTOR_TYPES, CatalogCsv::connectorType),
                read(Templates.PROBE_TYPES, ScheduleSheet.PROBE_TYPES, CatalogCsv::probeType));
    }

    private static FiberType fiberType(String[] f) {
        return new FiberType(f[0], f[1], num(f[2]), num(f[3]), num(f[4]), num(f[5]), f[6], OhGrade.valueOf(f[7]),
                num(f[8]), List.of(), spreads(f, 9, SpreadInput.OH_CONTENT, SpreadInput.ATTENUATION));
    }

    private static ConnectorType connectorType(String[] f) {
        return new ConnectorType(f[0], f[1], f[2], num(f[3]), yes(f[4]), spreads(f, 5, SpreadInput.CONNECTOR_LOSS));
    }

    private static ProbeType probeType(String[] f) {
        return new ProbeType(f[0], f[1], ProbeKind.valueOf(f[2]), f[3], Integer.parseInt(f[4]), num(f[5]), num(f[6]),
                spreads(f, 7, SpreadInput.PROBE_FIXED_LOSS));
    }

    /** The spread fields from {@code first} on, one per input, then the spread basis; blank is "not stated". */
    private static StatedSpreads spreads(String[] f, int first, SpreadInput... inputs) {
        Map<SpreadInput, StatedSpread> stated = new EnumMap<>(SpreadInput.class);
        for (int i = 0; i < inputs.length; i++) {
            if (!f[first + i].isEmpty()) {
                stated.put(inputs[i], StatedSpread.parse(f[first + i], inputs[i]));
            }
        }
        return new StatedSpreads(stated, f[first + inputs.length]);
    }

    private static <T> List<T> read(String resource, ScheduleSheet sheet, Function<String[], T> rowReader) {
        List<String> expected = new ArrayList<>(sheet.columns().stream().map(ScheduleColumn::header).toList());
        expected.add(BASIS_HEADER);
        List<T> items = new ArrayList<>();
        try (BufferedReader in = new BufferedReader(new InputStreamReader(Templates.open(resource), StandardCharsets.UTF_8))) {
            boolean headerSeen = false;
            int lineNumber = 0;
            for (String line = in.readLine(); line != null; line = in.readLine()) {
                lineNumber++;
                if (line.isBlank() || line.startsWith("#")) {
                    continue;
                }
                String[] fields = line.split(",", -1);
                for (int i = 0; i < fields.length; i++) {
                    fields[i] = fields[i].strip();
                }
                if (!headerSeen) {
                    if (!List.of(fields).equals(expected)) {
                        throw new IllegalStateException(resource + " line " + lineNumber + ": header must be " + expected);
                    }
                    headerSeen = true;
                    continue;
                }
                if (fields.length != expected.size()) {
                    throw new IllegalStateException(resource + " line " + lineNumber + ": expected "
                            + expected.size() + " fields, found " + fields.length);
                }
                try {
                    items.add(rowReader.apply(fields));
                } catch (IllegalArgumentException e) {
                    throw new IllegalStateException(resource + " line " + lineNumber + ": " + e.getMessage(), e);
                }
            }
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        return items;
    }

    private static double num(String s) {
        return Double.parseDouble(s);
    }

    private static boolean yes(String s) {
        return switch (s) {
            case "YES" -> true;
            case "NO" -> false;
            default -> throw new IllegalArgumentException("expected YES or NO, was '" + s + "'");
        };
    }
}
