package org.strandbook.app.cli;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.OptionalDouble;

import org.strandbook.scanfile.PrintableName;
import org.strandbook.site.ScanRecord;

/** Scan listings as an aligned text table (units in the headers) or as JSON (RFC 8259). */
final class ScanListing {

    private static final String[] HEADERS = {"id", "point", "kind", "taken at (UTC)", "points", "min (nm)", "max (nm)",
        "values in", "source file", "SHA-256 (start)"};
    private static final boolean[] RIGHT = {true, false, false, false, true, true, true, false, false, false};
    private static final int SHA_SHOWN = 16;

    private ScanListing() {
    }

    static String table(List<ScanRecord> scans) {
        List<String[]> rows = new ArrayList<>();
        rows.add(HEADERS);
        for (ScanRecord s : scans) {
            rows.add(new String[] {Long.toString(s.id()), s.pointTag(), s.kind().word(), s.takenAt().toString(),
                Integer.toString(s.nPoints()), nm(s.minNm()), nm(s.maxNm()),
                s.yUnit().isEmpty() ? "(not named)" : PrintableName.of(s.yUnit()), PrintableName.of(s.sourceFile()),
                s.sha256().substring(0, SHA_SHOWN)});
        }
        int[] width = new int[HEADERS.length];
        for (String[] row : rows) {
            for (int c = 0; c < row.length; c++) {
                width[c] = Math.max(width[c], row[c].length());
            }
        }
        StringBuilder sb = new StringBuilder();
        for (String[] row : rows) {
            StringBuilder line = new StringBuilder();
            for (int c = 0; c < row.length; c++) {
                if (c > 0) {
                    line.append("  ");
                }
                String pad = " ".repeat(width[c] - row[c].length());
                line.append(RIGHT[c] ? pad + row[c] : row[c] + pad);
            }
            sb.append(line.toString().stripTrailing()).append('\n');
        }
        return sb.toString();
    }

    static String json(List<ScanRecord> scans) {
        StringBuilder sb = new StringBuilder("[");
        for (int i = 0; i < scans.size(); i++) {
            ScanRecord s = scans.get(i);
            sb.append(i == 0 ? "\n  " : ",\n  ").append('{');
            sb.append("\"id\":").append(s.id());
            sb.append(",\"point\":");
            string(sb, s.pointTag());
            sb.append(",\"kind\":\"").append(s.kind().word()).append('"');
            sb.append(",\"taken_at\":\"").append(s.takenAt()).append('"');
            sb.append(",\"operator\":");
            string(sb, s.conditions().operator());
            sb.append(",\"integration_ms\":").append(s.conditions().integrationMs());
            sb.append(",\"co_added\":").append(s.conditions().coAdded());
            sb.append(",\"ambient_temperature_c\":").append(optional(s.conditions().ambientTemperatureC()));
            sb.append(",\"process_temperature_c\":").append(optional(s.conditions().processTemperatureC()));
            sb.append(",\"n_points\":").append(s.nPoints());
            sb.append(",\"min_nm\":").append(s.minNm());
            sb.append(",\"max_nm\":").append(s.maxNm());
            sb.append(",\"y_unit\":");
            string(sb, s.yUnit());
            sb.append(",\"source_file\":");
            string(sb, s.sourceFile());
            sb.append(",\"sha256\":\"").append(s.sha256()).append("\"}");
        }
        return sb.append(scans.isEmpty() ? "]\n" : "\n]\n").toString();
    }

    private static String nm(double wavelengthNm) {
        return String.format(Locale.ROOT, "%.1f", wavelengthNm);
    }

    private static String optional(OptionalDouble v) {
        return v.isPresent() ? Double.toString(v.getAsDouble()) : "null";
    }

    private static void string(StringBuilder sb, String s) {
        sb.append('"');
        for (int i = 0; i < s.length(); i++) {
            char c = s.charAt(i);
            if (c == '"' || c == '\\') {
                sb.append('\\').append(c);
            } else if (c < 0x20) {
                sb.append(String.format(Locale.ROOT, "\\u%04x", (int) c));
            } else {
                sb.append(c);
            }
        }
        sb.append('"');
    }
}
