package org.strandbook.scanfile;

import java.nio.ByteBuffer;
import java.nio.CharBuffer;
import java.nio.charset.Charset;
import java.nio.charset.CharsetDecoder;
import java.nio.charset.CoderResult;
import java.nio.charset.CodingErrorAction;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/**
 * Turns a spectrum file's bytes into text, or says why they are not text.
 *
 * <p>Accepted: UTF-8 with or without a byte-order mark, UTF-16 (LE or BE) with a byte-order mark.
 * Tolerated, and said in {@link Decoded#tolerated()}: a DOS end-of-file byte (0x1A) at the very end
 * (after the last line), and comment or metadata lines (first non-blank characters {@code #} or
 * {@code $$}: JCAMP-DX labelled records and comments, a delimited file's {@code #} lines) that are
 * not UTF-8, which are read as ISO-8859-1, the 8-bit code older analyzer software writes. Everything
 * else is refused with the line where it goes wrong: a NUL byte (binary data, or UTF-16 saved
 * without a byte-order mark), data or header lines that are not UTF-8 (a wrong "µm" column header
 * must not be guessed at), and control characters other than tab, carriage return and line feed.
 */
final class SpectrumText {

    /** DOS and CP/M mark the end of a text file with this byte (SUB, Ctrl-Z). */
    private static final int DOS_END_OF_FILE = 0x1A;

    /** The text and what was tolerated on the way. */
    record Decoded(String text, List<String> tolerated) {
        Decoded {
            tolerated = List.copyOf(tolerated);
        }
    }

    private SpectrumText() {
    }

    static Decoded decode(String fileName, byte[] bytes) throws SpectrumFileException {
        if (bytes.length == 0) {
            throw new SpectrumFileException(fileName, 0, "the file is empty");
        }
        List<String> tolerated = new ArrayList<>(1);
        int length = lengthBeforeDosEndOfFile(bytes);
        if (length < bytes.length) {
            tolerated.add("a DOS end-of-file byte (0x1A) after the last line was ignored");
            bytes = java.util.Arrays.copyOf(bytes, length);
            if (length == 0) {
                throw new SpectrumFileException(fileName, 0, "the file is empty");
            }
        }
        Charset charset = StandardCharsets.UTF_8;
        int offset = 0;
        if (startsWith(bytes, 0xEF, 0xBB, 0xBF)) {
            offset = 3;
        } else if (startsWith(bytes, 0xFF, 0xFE)) {
            charset = StandardCharsets.UTF_16LE;
            offset = 2;
        } else if (startsWith(bytes, 0xFE, 0xFF)) {
            charset = StandardCharsets.UTF_16BE;
            offset = 2;
        }
        String text;
        if (charset == StandardCharsets.UTF_8 && isPlainAsciiText(bytes, offset)) {
            // the common case, and the one the import benchmark measures: one pass, one copy
            text = new String(bytes, offset, bytes.length - offset, StandardCharsets.ISO_8859_1);
        } else {
            if (charset == StandardCharsets.UTF_8) {
                requireNoNulByte(fileName, bytes);
                text = utf8WithLatin1Metadata(fileName, bytes, offset, tolerated);
            } else {
                text = strictDecode(fileName, bytes, offset, charset);
            }
            requireNoControlCharacters(fileName, text);
        }
        if (text.isBlank()) {
            throw new SpectrumFileException(fileName, 0, "the file holds only blank space");
        }
        return new Decoded(text, tolerated);
    }

    /** The length without a trailing run of 0x1A bytes and the line breaks and blanks around them. */
    private static int lengthBeforeDosEndOfFile(byte[] bytes) {
        int end = bytes.length;
        int cut = end;
        while (end > 0) {
            int b = bytes[end - 1];
            if (b == DOS_END_OF_FILE) {
                cut = end - 1;
            } else if (b != '\n' && b != '\r' && b != ' ' && b != '\t') {
                break;
            }
            end--;
        }
        return cut;
    }

    /**
     * Strict UTF-8, except that a comment or metadata line that is not UTF-8 is read as ISO-8859-1;
     * the lines so read are named in {@code tolerated}.
     */
    private static String utf8WithLatin1Metadata(String fileName, byte[] bytes, int offset, List<String> tolerated)
            throws SpectrumFileException {
        try {
            return strictDecode(fileName, bytes, offset, StandardCharsets.UTF_8);
        } catch (SpectrumFileException notUtf8) {
            StringBuilder text = new StringBuilder(bytes.length);
            List<Integer> latin1Lines = new ArrayList<>();
            int line = 1;
            int start = offset;
            while (start < bytes.length) {
                int end = start;
                while (end < bytes.length && bytes[end] != '\n' && bytes[end] != '\r') {
                    end++;
                }
                int next = end;
                if (next < bytes.length) {
                    next += bytes[next] == '\r' && next + 1 < bytes.length && bytes[next + 1] == '\n' ? 2 : 1;
                }
                byte[] lineBytes = java.util.Arrays.copyOfRange(bytes, start, end);
                try {
                    text.append(strictDecode(fileName, lineBytes, 0, StandardCharsets.UTF_8));
                } catch (SpectrumFileException e) {
                    if (!isCommentOrRecord(lineBytes)) {
                        throw new SpectrumFileException(fileName, line, e.problem()
                                .replaceFirst("at byte offset \\d+", "at byte offset " + (start + firstBadByte(lineBytes))));
                    }
                    text.append(new String(lineBytes, StandardCharsets.ISO_8859_1));
                    latin1Lines.add(line);
                }
                text.append(new String(bytes, end, next - end, StandardCharsets.ISO_8859_1));
                start = next;
                line++;
            }
            tolerated.add("line" + (latin1Lines.size() == 1 ? " " : "s ") + shortList(latin1Lines)
                    + " not UTF-8: read as ISO-8859-1 (comment or metadata only; data must be UTF-8)");
            return text.toString();
        }
    }

    private static boolean isCommentOrRecord(byte[] line) {
        int i = 0;
        while (i < line.length && (line[i] == ' ' || line[i] == '\t')) {
            i++;
        }
        return i < line.length && (line[i] == '#' || (line[i] == '$' && i + 1 < line.length && line[i + 1] == '$'));
    }

    private static int firstBadByte(byte[] line) {
        for (int i = 0; i < line.length; i++) {
            if (line[i] < 0) {
                return i;
            }
        }
        return 0;
    }

    private static String shortList(List<Integer> lines) {
        if (lines.size() <= 5) {
            return lines.toString().replace("[", "").replace("]", "");
        }
        return lines.subList(0, 5).toString().replace("[", "").replace("]", "") + " and " + (lines.size() - 5)
                + " more";
    }

    /** The text split at CR LF, CR or LF; index {@code i} is line {@code i + 1}. */
    static String[] lines(String text) {
        List<String> lines = new ArrayList<>();
        int n = text.length();
        if (text.indexOf('\r') < 0) {
            // LF only: indexOf scans far faster than a char-by-char loop
            int start = 0;
            while (start < n) {
                int end = text.indexOf('\n', start);
                if (end < 0) {
                    end = n;
                }
                lines.add(text.substring(start, end));
                start = end + 1;
            }
            return lines.toArray(new String[0]);
        }
        int start = 0;
        for (int i = 0; i < n; i++) {
            char c = text.charAt(i);
            if (c == '\n' || c == '\r') {
                lines.add(text.substring(start, i));
                if (c == '\r' && i + 1 < n && text.charAt(i + 1) == '\n') {
                    i++;
                }
                start = i + 1;
            }
        }
        if (start < n) {
            lines.add(text.substring(start));
        }
        return lines.toArray(new String[0]);
    }

    /** True if every byte is printable ASCII, a tab, CR or LF: then Latin-1 decoding equals UTF-8. */
    private static boolean isPlainAsciiText(byte[] bytes, int offset) {
        for (int i = offset; i < bytes.length; i++) {
            int b = bytes[i];
            if (b < 0x20 ? (b != '\n' && b != '\r' && b != '\t') : b == 0x7F) {
                return false;
            }
        }
        return true;
    }

    private static boolean startsWith(byte[] bytes, int... prefix) {
        if (bytes.length < prefix.length) {
            return false;
        }
        for (int i = 0; i < prefix.length; i++) {
            if ((bytes[i] & 0xFF) != prefix[i]) {
                return false;
            }
        }
        return true;
    }

    private static void requireNoNulByte(String fileName, byte[] bytes) throws SpectrumFileException {
        int line = 1;
        for (int i = 0; i < bytes.length; i++) {
            if (bytes[i] == '\n') {
                line++;
            } else if (bytes[i] == 0) {
                throw new SpectrumFileException(fileName, line, "NUL byte at byte offset " + i
                        + ": binary data, or UTF-16 text without a byte-order mark; save the spectrum as UTF-8 text");
            }
        }
    }

    private static String strictDecode(String fileName, byte[] bytes, int offset, Charset charset)
            throws SpectrumFileException {
        CharsetDecoder decoder = charset.newDecoder()
                .onMalformedInput(CodingErrorAction.REPORT)
                .onUnmappableCharacter(CodingErrorAction.REPORT);
        ByteBuffer in = ByteBuffer.wrap(bytes, offset, bytes.length - offset);
        CharBuffer out = CharBuffer.allocate(bytes.length - offset + 1);
        CoderResult result = decoder.decode(in, out, true);
        if (!result.isError()) {
            result = decoder.flush(out);
        }
        if (result.isError()) {
            int bad = in.position();
            int line = 1 + countLineBreaks(out.duplicate().flip());
            String what = charset == StandardCharsets.UTF_8
                    ? String.format(Locale.ROOT, "byte 0x%02X at byte offset %d is not UTF-8 text (only comment "
                            + "and ##record lines may be in another 8-bit code: save the spectrum as UTF-8)", bytes[bad] & 0xFF, bad)
                    : "the " + charset.name() + " text breaks off at byte offset " + bad + " (cut short or not UTF-16)";
            throw new SpectrumFileException(fileName, line, what);
        }
        out.flip();
        return out.toString();
    }

    private static int countLineBreaks(CharSequence decoded) {
        int count = 0;
        for (int i = 0; i < decoded.length(); i++) {
            if (isLineBreak(decoded, i)) {
                count++;
            }
        }
        return count;
    }

    // CR LF counts once (at the LF), a lone CR or a lone LF once each, as in lines().
    private static boolean isLineBreak(CharSequence text, int i) {
        char c = text.charAt(i);
        return c == '\n' || (c == '\r' && (i + 1 >= text.length() || text.charAt(i + 1) != '\n'));
    }

    private static void requireNoControlCharacters(String fileName, String text) throws SpectrumFileException {
        int line = 1;
        for (int i = 0; i < text.length(); i++) {
            char c = text.charAt(i);
            if (isLineBreak(text, i)) {
                line++;
            } else if (c != '\t' && c != '\r' && c != '\n' && Character.isISOControl(c)) {
                throw new SpectrumFileException(fileName, line, String.format(Locale.ROOT,
                        "control character U+%04X: this is not a text spectrum file", (int) c));
            }
        }
    }
}
