package org.strandbook.store;

import java.nio.charset.StandardCharsets;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.Arrays;
import java.util.HexFormat;
import java.util.Locale;
import java.util.regex.Pattern;

/** SHA-256 (FIPS 180-4) as the workbook writes it: 64 lowercase hex digits. */
final class Sha256 {

    /** The previous hash of the first audit row. */
    static final String GENESIS = "0".repeat(64);

    private static final Pattern HEX_64 = Pattern.compile("[0-9a-f]{64}");
    private static final HexFormat HEX = HexFormat.of();

    private Sha256() {
    }

    /** A fresh digest is a copy of this one: several are made per scan stored, and a provider lookup each time costs more. */
    private static final MessageDigest PROTOTYPE = lookUp();

    static MessageDigest newDigest() {
        try {
            return (MessageDigest) PROTOTYPE.clone();
        } catch (CloneNotSupportedException e) {
            return lookUp();
        }
    }

    private static MessageDigest lookUp() {
        try {
            return MessageDigest.getInstance("SHA-256");
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException("every Java runtime provides SHA-256", e);
        }
    }

    static String hex(byte[] data) {
        return HEX.formatHex(newDigest().digest(data));
    }

    static String hex(String text) {
        return hex(text.getBytes(StandardCharsets.UTF_8));
    }

    static String toHex(byte[] digest) {
        return HEX.formatHex(digest);
    }

    /**
     * Fields gathered for one digest, each as {@code <UTF-8 byte length> ":" <bytes>}, or {@code -}
     * for null: length-prefixed so that no two different sequences of fields feed the same bytes.
     * Gathered into one buffer and digested in one call: an audit row digests some fifty short
     * fields, and one call per field costs more than the hashing.
     */
    static final class Fields {

        private byte[] bytes = new byte[512];
        private int length;

        Fields add(String value) {
            if (value == null) {
                put((byte) '-');
                return this;
            }
            byte[] utf8 = value.getBytes(StandardCharsets.UTF_8);
            String count = Integer.toString(utf8.length);
            for (int i = 0; i < count.length(); i++) {
                put((byte) count.charAt(i));
            }
            put((byte) ':');
            room(utf8.length);
            System.arraycopy(utf8, 0, bytes, length, utf8.length);
            length += utf8.length;
            return this;
        }

        /** SHA-256 of the fields added, 64 lower-case hex digits. */
        String hex() {
            MessageDigest md = newDigest();
            md.update(bytes, 0, length);
            return toHex(md.digest());
        }

        private void put(byte b) {
            room(1);
            bytes[length++] = b;
        }

        private void room(int more) {
            if (length + more > bytes.length) {
                bytes = Arrays.copyOf(bytes, Math.max(2 * bytes.length, length + more));
            }
        }
    }

    /** The given hash in stored form, or an error naming what is wrong with it. */
    static String normalized(String sha256, String what) {
        String s = sha256 == null ? "" : sha256.strip().toLowerCase(Locale.ROOT);
        if (!HEX_64.matcher(s).matches()) {
            throw new IllegalArgumentException(what + ": SHA-256 must be 64 hex digits, was '" + sha256 + "'");
        }
        return s;
    }
}
