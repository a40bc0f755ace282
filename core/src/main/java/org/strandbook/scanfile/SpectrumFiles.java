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

    /** The block number that asks for the file's one spectrum rather than a numbered block. */
    public static final int WHOLE_FILE = 0;

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
        return read(file, WHOLE_FILE);
    }

    /**
     * Reads the spectrum in {@code file}, taking block {@code block} (1-based, in file order) of a
     * multi-block JCAMP-DX file, or the file's one optical spectrum when {@code block} is
     * {@link #WHOLE_FILE}.
     *
     * @throws SpectrumFileException as {@link #read(Path)}; also when the file is not a regular file
     *                               (a FIFO, a device, a folder), which is refused before it is opened
     */
    public static SpectrumFile read(Path file, int block) throws SpectrumFileException {
        Path name = file.getFileName();
        String fileName = name == null ? file.toString() : name.toString();
        byte[] content;
        try {
            // a FIFO would block the read until a writer comes, a device may never end: look before opening
            java.nio.file.attribute.BasicFileAttributes attributes = Files.readAttributes(file,
                    java.nio.file.attribute.BasicFileAttributes.class);
            if (!attributes.isRegularFile()) {
                throw new SpectrumFileException(fileName, 0, attributes.isDirectory() ? "is a folder, not a file"
                        : "is not a regular file (a pipe, a device or a socket): Strandbook reads spectrum files only");
            }
            long size = attributes.size();
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
        return read(fileName, content, block);
    }

    /**
     * Reads a spectrum from a file's bytes.
     *
     * @param fileName the name shown in messages and kept in {@link SpectrumFile#sourceName()}
     * @param content  the whole file; not modified
     * @throws SpectrumFileException if the bytes are not a spectrum Strandbook accepts
     */
    public static SpectrumFile read(String fileName, byte[] content) throws SpectrumFileException {
        return read(fileName, content, WHOLE_FILE);
    }

    /** As {@link #read(String, byte[])}, taking one block of a multi-block file; see {@link #read(Path, int)}. */
    public static SpectrumFile read(String fileName, byte[] content, int block) throws SpectrumFileException {
        if (content.length > MAX_FILE_BYTES) {
            throw tooLarge(fileName, content.length);
        }
        if (block < 0) {
            throw new IllegalArgumentException("block number must be 1 or more, was " + block);
        }
        String sha256 = sha256Hex(content);
        SpectrumText.Decoded decoded = SpectrumText.decode(fileName, content);
        String text = decoded.text();
        requireFewEnoughLines(fileName, text);
        if (looksLikeJcampDx(text)) {
            return new JcampDxReader(fileName, sha256).read(text, block).withTolerated(decoded.tolerated());
        }
        if (block > 1) {
            throw new SpectrumFileException(fileName, 0, "block " + block + " was asked for, but delimited text "
                    + "holds one spectrum");
        }
        return new DelimitedSpectrumReader(fileName, sha256).read(text).withTolerated(decoded.tolerated());
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

    /**
     * The most lines a spectrum file may have: one point a line at {@link JcampDxReader#MAX_POINTS},
     * plus room for a long header. Counted before the text is split, so that a file of millions
     * of short lines is refused before it fills memory.
     */
    static final int MAX_LINES = JcampDxReader.MAX_POINTS + 100_000;

    private static void requireFewEnoughLines(String fileName, String text) throws SpectrumFileException {
        int breaks = 0;
        int at = text.indexOf('\n');
        while (at >= 0) {
            if (++breaks > MAX_LINES) {
                throw new SpectrumFileException(fileName, MAX_LINES + 1, "more than " + MAX_LINES + " lines: a "
                        + "spectrum file holds at most " + JcampDxReader.MAX_POINTS + " points (one a line) and its header");
            }
            at = text.indexOf('\n', at + 1);
        }
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
