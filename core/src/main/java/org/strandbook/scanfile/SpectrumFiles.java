package org.strandbook.scanfile;

import java.io.IOException;
import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.HexFormat;

/**
 * The one way in for analyzer spectrum files: reads the bytes, fingerprints them, decides the format
 * from the content and hands the text to the matching reader.
 *
 * <p>Format by content, not by file name: text whose first non-blank line starts with {@code ##}
 * (or a {@code $$} comment), or that has a {@code ##TITLE=} record within its first 50 lines, is
 * JCAMP-DX ({@link JcampDxReader}); anything else is read as delimited text
 * ({@link DelimitedSpectrumReader}). Encodings: see {@link SpectrumText}.
 *
 * <p>Files larger than {@link #MAX_FILE_BYTES} (64 MiB) are refused without being read: a 2,000-point
 * spectrum takes a few kB to a few hundred kB in any of these formats, so anything that large is a
 * wrong file (a log, an image, a disk dump) and reading it would only fill memory.
 *
 * <p>Pure: no state, no caching, safe from any thread.
 */
public final class SpectrumFiles {

    /** The largest file accepted: 64 MiB. */
    public static final long MAX_FILE_BYTES = 64L * 1024 * 1024;

    private static final int TITLE_SEARCH_LINES = 50;

    private SpectrumFiles() {
    }

    /**
     * Reads the spectrum in {@code file}.
     *
     * @throws SpectrumFileException if the file cannot be read, is larger than {@link #MAX_FILE_BYTES},
     *                               or is not a spectrum Strandbook accepts; the message names the file
     *                               (by its file name) and line
     */
    public static SpectrumFile read(Path file) throws SpectrumFileException {
        Path name = file.getFileName();
        String fileName = name == null ? file.toString() : name.toString();
        byte[] content;
        try {
            long size = Files.size(file);
            if (size > MAX_FILE_BYTES) {
                throw tooLarge(fileName, size);
            }
            try (InputStream in = Files.newInputStream(file)) {
                // the size may change between the look and the read: never take more than the limit
                content = in.readNBytes((int) MAX_FILE_BYTES + 1);
            }
        } catch (IOException e) {
            throw new SpectrumFileException(fileName, 0, "cannot read the file: " + describe(e), e);
        }
        return read(fileName, content);
    }

    /**
     * Reads a spectrum from a file's bytes.
     *
     * @param fileName the name shown in messages and kept in {@link SpectrumFile#sourceName()}
     * @param content  the whole file; not modified
     * @throws SpectrumFileException if the bytes are not a spectrum Strandbook accepts
     */
    public static SpectrumFile read(String fileName, byte[] content) throws SpectrumFileException {
        if (content.length > MAX_FILE_BYTES) {
            throw tooLarge(fileName, content.length);
        }
        String sha256 = sha256Hex(content);
        String text = SpectrumText.decode(fileName, content);
        if (looksLikeJcampDx(text)) {
            return new JcampDxReader(fileName, sha256).read(text);
        }
        return new DelimitedSpectrumReader(fileName, sha256).read(text);
    }

    /** SHA-256 of the bytes as 64 lower-case hex digits (FIPS 180-4). */
    public static String sha256Hex(byte[] content) {
        return HexFormat.of().formatHex(newSha256().digest(content));
    }

    /** Copying a digest is cheaper than looking one up from the providers, which a batch import does per file. */
    private static final MessageDigest SHA256_PROTOTYPE = lookUpSha256();

    private static MessageDigest newSha256() {
        try {
            return (MessageDigest) SHA256_PROTOTYPE.clone();
        } catch (CloneNotSupportedException e) {
            return lookUpSha256();
        }
    }

    private static MessageDigest lookUpSha256() {
        try {
            return MessageDigest.getInstance("SHA-256");
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException("every Java runtime provides SHA-256", e);
        }
    }

    private static boolean looksLikeJcampDx(String text) {
        int i = 0;
        while (i < text.length() && Character.isWhitespace(text.charAt(i))) {
            i++;
        }
        if (text.startsWith("##", i) || text.startsWith("$$", i)) {
            return true;
        }
        // a JCAMP-DX file with a stray line in front still deserves the JCAMP-DX reader's message
        String[] lines = SpectrumText.lines(text.length() > 8192 ? text.substring(0, 8192) : text);
        for (int k = 0; k < Math.min(lines.length, TITLE_SEARCH_LINES); k++) {
            String line = lines[k].strip();
            int eq = line.indexOf('=');
            if (line.startsWith("##") && eq > 2 && JcampDxReader.normalizeLabel(line.substring(2, eq)).equals("TITLE")) {
                return true;
            }
        }
        return false;
    }

    private static SpectrumFileException tooLarge(String fileName, long size) {
        return new SpectrumFileException(fileName, 0, "the file has " + size + " bytes, more than the "
                + MAX_FILE_BYTES + " bytes (64 MiB) a spectrum file may have");
    }

    private static String describe(IOException e) {
        String message = e.getMessage();
        String kind = e.getClass().getSimpleName();
        return message == null ? kind : kind + " " + message;
    }
}
