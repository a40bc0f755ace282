package org.strandbook.dossier;

import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.OutputStream;
import java.io.OutputStreamWriter;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.util.HashMap;
import java.util.Map;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

import org.apache.commons.compress.archivers.zip.ZipArchiveEntry;
import org.apache.commons.compress.archivers.zip.ZipArchiveOutputStream;

/**
 * The zip stream the streaming workbook writes its parts through: every part passes unchanged,
 * except chart parts, whose empty series caches ({@code <c:numCache/>} after a range formula) are
 * filled with the range's values from {@link ChartCaches}, one chart at a time and straight into
 * the zip, so no chart's values are ever held as text. The same technique as the streaming
 * workbook's own, which injects sheet rows into the sheet parts as it copies them.
 *
 * <p>Why caches at all: a chart's series refer to cells, and programs that redraw from the cells
 * (spreadsheet programs) need nothing more; viewers that only show a file draw from the cache.
 */
final class ChartCacheStream extends ZipArchiveOutputStream {

    private static final double DECIMALS_SCALE = 1e4;
    private static final Pattern CHART_PART = Pattern.compile("xl/charts/chart\\d+\\.xml");
    private static final Pattern EMPTY_CACHE = Pattern.compile("<c:f>([^<]*)</c:f><c:numCache/>");

    private final ZipArchiveOutputStream inner;
    private final ChartCaches caches;
    private ByteArrayOutputStream chart;
    private long points;

    ChartCacheStream(ZipArchiveOutputStream inner, ChartCaches caches) {
        super(OutputStream.nullOutputStream());
        this.inner = inner;
        this.caches = caches;
    }

    /** Values written into chart caches so far. */
    long cachedPoints() {
        return points;
    }

    @Override
    public void putArchiveEntry(ZipArchiveEntry entry) throws IOException {
        if (CHART_PART.matcher(entry.getName()).matches()) {
            // the filled part is longer than the template's: its size is left for the stream to count
            ZipArchiveEntry grown = new ZipArchiveEntry(entry.getName());
            grown.setTime(entry.getTime());
            inner.putArchiveEntry(grown);
            chart = new ByteArrayOutputStream();
        } else {
            inner.putArchiveEntry(entry);
        }
    }

    @Override
    public void write(byte[] b, int off, int len) throws IOException {
        if (chart != null) {
            chart.write(b, off, len);
        } else {
            inner.write(b, off, len);
        }
    }

    @Override
    public void write(int b) throws IOException {
        write(new byte[] {(byte) b}, 0, 1);
    }

    @Override
    public void write(byte[] b) throws IOException {
        write(b, 0, b.length);
    }

    @Override
    public void closeArchiveEntry() throws IOException {
        if (chart != null) {
            String xml = chart.toString(StandardCharsets.UTF_8);
            chart = null;
            Writer out = new OutputStreamWriter(new OutputStream() {
                @Override
                public void write(int b) throws IOException {
                    inner.write(b);
                }

                @Override
                public void write(byte[] b, int off, int len) throws IOException {
                    inner.write(b, off, len);
                }
            }, StandardCharsets.UTF_8);
            fill(xml, new java.io.BufferedWriter(out, 1 << 16));
        }
        inner.closeArchiveEntry();
    }

    private void fill(String xml, Writer out) throws IOException {
        Matcher m = EMPTY_CACHE.matcher(xml);
        // a chart's series share their x values: their cache is made once per chart
        Map<String, Cache> made = new HashMap<>();
        int from = 0;
        while (m.find()) {
            String range = m.group(1);
            Cache cache = made.get(range);
            if (cache == null) {
                double[] values = caches.values(range);
                if (values == null) {
                    continue;
                }
                cache = cache(values);
                made.put(range, cache);
            }
            points += cache.points();
            out.write(xml, from, m.start() - from);
            out.write("<c:f>");
            out.write(range);
            out.write("</c:f>");
            out.write(cache.xml());
            from = m.end();
        }
        out.write(xml, from, xml.length() - from);
        out.flush();
    }

    /** A series cache as XML, and how many values it holds. */
    private record Cache(String xml, int points) {
    }

    private static Cache cache(double[] values) {
        int count = 0;
        StringBuilder b = new StringBuilder(64 + values.length * 36);
        b.append("<c:numCache><c:formatCode>General</c:formatCode><c:ptCount val=\"").append(values.length)
                .append("\"/>");
        for (int i = 0; i < values.length; i++) {
            if (Double.isFinite(values[i])) {
                b.append("<c:pt idx=\"").append(i).append("\"><c:v>");
                appendNumber(b, values[i]);
                b.append("</c:v></c:pt>");
                count++;
            }
        }
        return new Cache(b.append("</c:numCache>").toString(), count);
    }

    /**
     * Appends a value as a decimal. Losses and wavelengths arrive rounded to four decimals; those
     * are written from their scaled integer, which is exact and several times faster than the
     * general shortest-repr conversion that any other value still gets.
     */
    static void appendNumber(StringBuilder b, double v) {
        double scaled = v * DECIMALS_SCALE;
        if (Math.abs(scaled) < 1e15 && Math.rint(scaled) / DECIMALS_SCALE == v) {
            long units = (long) Math.rint(scaled);
            if (units < 0) {
                b.append('-');
                units = -units;
            }
            long whole = units / (long) DECIMALS_SCALE;
            long fraction = units % (long) DECIMALS_SCALE;
            b.append(whole);
            if (fraction != 0) {
                char[] digits = {(char) ('0' + fraction / 1000), (char) ('0' + fraction / 100 % 10),
                    (char) ('0' + fraction / 10 % 10), (char) ('0' + fraction % 10)};
                int length = digits.length;
                while (digits[length - 1] == '0') {
                    length--;
                }
                b.append('.').append(digits, 0, length);
            }
            return;
        }
        b.append(v);
    }

    @Override
    public void flush() throws IOException {
        inner.flush();
    }

    @Override
    public void finish() throws IOException {
        inner.finish();
    }

    @Override
    public void close() throws IOException {
        try {
            inner.close();
        } finally {
            super.close();
        }
    }
}
