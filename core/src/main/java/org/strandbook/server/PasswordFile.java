package org.strandbook.server;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.PosixFilePermission;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.Set;

/**
 * PostgreSQL's password file, read as its documentation ("The Password File", PostgreSQL 15 manual,
 * section 34.16) describes: lines {@code hostname:port:database:username:password}, the first line
 * that matches wins, {@code *} in any of the first four fields matches anything, {@code \:} and
 * {@code \\} stand for a colon and a backslash, lines starting with {@code #} are comments. As libpq
 * does, a file that its group or others can read is ignored.
 */
public final class PasswordFile {

    private PasswordFile() {
    }

    public static Optional<String> lookup(Path file, String host, int port, String database, String user) {
        if (!Files.isRegularFile(file) || readableByOthers(file)) {
            return Optional.empty();
        }
        List<String> lines;
        try {
            lines = Files.readAllLines(file, StandardCharsets.UTF_8);
        } catch (IOException e) {
            return Optional.empty();
        }
        List<String> wanted = List.of(host, Integer.toString(port), database, user);
        for (String line : lines) {
            if (line.isEmpty() || line.startsWith("#")) {
                continue;
            }
            List<String> fields = fields(line);
            if (fields.size() != 5) {
                continue;
            }
            boolean match = true;
            for (int i = 0; i < 4 && match; i++) {
                String f = fields.get(i);
                match = f.equals("*") || f.equals(wanted.get(i));
            }
            if (match) {
                return Optional.of(fields.get(4));
            }
        }
        return Optional.empty();
    }

    /** Splits on unescaped colons, undoing {@code \:} and {@code \\}. */
    static List<String> fields(String line) {
        List<String> out = new ArrayList<>(5);
        StringBuilder cur = new StringBuilder();
        for (int i = 0; i < line.length(); i++) {
            char c = line.charAt(i);
            if (c == '\\' && i + 1 < line.length()) {
                cur.append(line.charAt(++i));
            } else if (c == ':' && out.size() < 4) {
                out.add(cur.toString());
                cur.setLength(0);
            } else {
                cur.append(c);
            }
        }
        out.add(cur.toString());
        return out;
    }

    private static boolean readableByOthers(Path file) {
        try {
            Set<PosixFilePermission> perms = Files.getPosixFilePermissions(file);
            return perms.contains(PosixFilePermission.GROUP_READ) || perms.contains(PosixFilePermission.OTHERS_READ);
        } catch (UnsupportedOperationException | IOException e) {
            // no POSIX permissions to read (a Windows file system): nothing to hold against the
            // file, as PostgreSQL's own client skips the check there too
            return false;
        }
    }
}
