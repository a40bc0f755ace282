package org.strandbook.server;

import java.nio.file.Path;
import java.util.Map;
import java.util.Optional;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * Where and as whom to reach a plant server. The password never comes from the command line (it
 * would show in the process list and the shell's history): only from {@code PGPASSWORD} or the
 * password file PostgreSQL's own tools read ({@link PasswordFile}); the JDBC driver reads neither.
 * TLS is the driver's {@code sslmode} in the URL ({@code ?sslmode=verify-full}).
 *
 * @param url      {@code jdbc:postgresql://host[:port]/database[?...]}
 * @param user     the login role
 * @param password null when none is found (trust or peer authentication, or a certificate)
 */
public record ServerLogin(String url, String user, String password) {

    private static final Pattern URL = Pattern.compile(
            "jdbc:postgresql://(\\[[^]]+]|[^/:?]+)(?::(\\d+))?/([^?]+)(\\?.*)?");

    public ServerLogin {
        if (url == null || !URL.matcher(url).matches()) {
            throw new IllegalArgumentException("server " + url + " is not a PostgreSQL address: write"
                    + " jdbc:postgresql://HOST:PORT/DATABASE");
        }
        if (user == null || user.isBlank()) {
            throw new IllegalArgumentException("no server user: give --server-user or set PGUSER");
        }
    }

    /**
     * The login for {@code url}: the user from {@code userOption}, else {@code PGUSER}; the password
     * from {@code PGPASSWORD}, else the password file ({@code PGPASSFILE}, else
     * {@code ~/.pgpass}).
     */
    public static ServerLogin resolve(String url, String userOption, Map<String, String> env, Path home) {
        String user = userOption != null ? userOption : env.get("PGUSER");
        ServerLogin bare = new ServerLogin(url, user, null);
        String password = env.get("PGPASSWORD");
        if (password == null) {
            Path file = env.containsKey("PGPASSFILE") ? Path.of(env.get("PGPASSFILE")) : home.resolve(".pgpass");
            password = PasswordFile.lookup(file, bare.host(), bare.port(), bare.database(), user).orElse(null);
        }
        return new ServerLogin(url, user, password);
    }

    public String host() {
        String h = parts().group(1);
        return h.startsWith("[") ? h.substring(1, h.length() - 1) : h;
    }

    public int port() {
        return Optional.ofNullable(parts().group(2)).map(Integer::parseInt).orElse(5432);
    }

    public String database() {
        return parts().group(3);
    }

    /** The URL without its parameters, which may carry secrets. */
    public String displayUrl() {
        int q = url.indexOf('?');
        return q < 0 ? url : url.substring(0, q);
    }

    private Matcher parts() {
        Matcher m = URL.matcher(url);
        if (!m.matches()) {
            throw new IllegalStateException(url);
        }
        return m;
    }

    @Override
    public String toString() {
        return "ServerLogin[" + displayUrl() + " as " + user + (password == null ? "" : ", password set") + "]";
    }
}
