package org.strandbook.store;

import java.util.LinkedHashMap;
import java.util.Map;
import java.util.TreeMap;

/**
 * A record's portable fields as one flat JSON object (RFC 8259): text, whole numbers (a workbook
 * INTEGER), numbers with a fraction or exponent (a REAL, written as Java's shortest round-trip
 * decimal so it comes back to the same double) and null. The plant server keeps the same object as
 * {@code jsonb}; this reads its rendering back too.
 */
public final class PortableFields {

    private PortableFields() {
    }

    public static String json(Map<String, Object> fields) {
        StringBuilder sb = new StringBuilder(32 * fields.size() + 2).append('{');
        boolean first = true;
        for (Map.Entry<String, Object> e : fields.entrySet()) {
            if (!first) {
                sb.append(',');
            }
            first = false;
            JsonText.string(sb, e.getKey()).append(':');
            value(sb, e.getValue());
        }
        return sb.append('}').toString();
    }

    private static void value(StringBuilder sb, Object v) {
        if (v == null) {
            sb.append("null");
        } else if (v instanceof String s) {
            JsonText.string(sb, s);
        } else if (v instanceof Double d) {
            if (d.isNaN() || d.isInfinite()) {
                throw new IllegalArgumentException("a field holds " + d + ", which JSON cannot carry");
            }
            String s = Double.toString(d);
            sb.append(s.contains(".") || s.contains("E") ? s : s + ".0");
        } else if (v instanceof Long || v instanceof Integer) {
            sb.append(v);
        } else {
            throw new IllegalArgumentException("a field holds a " + v.getClass().getSimpleName());
        }
    }

    /** One value as JSON. */
    public static String value(Object v) {
        StringBuilder sb = new StringBuilder();
        value(sb, v);
        return sb.toString();
    }

    /** Reads one value written by {@link #value(Object)}. */
    public static Object parseValue(String json) {
        return parse("{\"v\":" + json + "}").get("v");
    }

    /** The SHA-256 of the fields that are not null, in name order: a record's identity by content. */
    public static String sha256(Map<String, Object> fields) {
        Map<String, Object> sorted = new TreeMap<>();
        fields.forEach((k, v) -> {
            if (v != null) {
                sorted.put(k, v);
            }
        });
        return Sha256.hex(json(sorted));
    }

    /** Reads a flat JSON object of text, numbers and nulls; whitespace as PostgreSQL renders it. */
    public static Map<String, Object> parse(String json) {
        return new Parser(json).object();
    }

    private static final class Parser {
        private final String s;
        private int i;

        Parser(String s) {
            this.s = s;
        }

        Map<String, Object> object() {
            Map<String, Object> out = new LinkedHashMap<>();
            expect('{');
            skip();
            if (peek() == '}') {
                i++;
                return out;
            }
            while (true) {
                skip();
                String name = string();
                skip();
                expect(':');
                skip();
                out.put(name, value());
                skip();
                char c = s.charAt(i++);
                if (c == '}') {
                    return out;
                }
                if (c != ',') {
                    throw bad();
                }
            }
        }

        private Object value() {
            char c = peek();
            if (c == '"') {
                return string();
            }
            if (s.startsWith("null", i)) {
                i += 4;
                return null;
            }
            if (s.startsWith("true", i) || s.startsWith("false", i)) {
                boolean t = s.startsWith("true", i);
                i += t ? 4 : 5;
                return t ? 1L : 0L;
            }
            int start = i;
            while (i < s.length() && "+-0123456789.eE".indexOf(s.charAt(i)) >= 0) {
                i++;
            }
            String n = s.substring(start, i);
            if (n.isEmpty()) {
                throw bad();
            }
            if (n.contains(".") || n.contains("e") || n.contains("E")) {
                return Double.parseDouble(n);
            }
            try {
                return Long.parseLong(n);
            } catch (NumberFormatException e) {
                return Double.parseDouble(n);
            }
        }

        private String string() {
            expect('"');
            StringBuilder sb = new StringBuilder();
            while (true) {
                char c = s.charAt(i++);
                if (c == '"') {
                    return sb.toString();
                }
                if (c != '\\') {
                    sb.append(c);
                    continue;
                }
                char e = s.charAt(i++);
                switch (e) {
                    case 'n' -> sb.append('\n');
                    case 'r' -> sb.append('\r');
                    case 't' -> sb.append('\t');
                    case 'b' -> sb.append('\b');
                    case 'f' -> sb.append('\f');
                    case 'u' -> {
                        sb.append((char) Integer.parseInt(s.substring(i, i + 4), 16));
                        i += 4;
                    }
                    default -> sb.append(e);
                }
            }
        }

        private void skip() {
            while (i < s.length() && Character.isWhitespace(s.charAt(i))) {
                i++;
            }
        }

        private char peek() {
            if (i >= s.length()) {
                throw bad();
            }
            return s.charAt(i);
        }

        private void expect(char c) {
            if (peek() != c) {
                throw bad();
            }
            i++;
        }

        private IllegalArgumentException bad() {
            return new IllegalArgumentException("not a flat JSON object at character " + i + ": " + s);
        }
    }
}
