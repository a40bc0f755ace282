package org.strandbook.app.cli;

import java.nio.file.Path;

import org.strandbook.server.PlantServer;
import org.strandbook.server.ServerLogin;

import picocli.CommandLine.Option;

/**
 * {@code --server URL} and {@code --server-user U} of every command that reaches a plant server; the
 * password never comes from an option (it would show in the process list): only from
 * {@code PGPASSWORD} or the password file ({@code ~/.pgpass}, {@code PGPASSFILE}).
 */
public final class ServerOptions {

    // checked in connect(), not by picocli: `fleet export` takes it before or after the word export
    @Option(names = "--server", paramLabel = "URL",
            description = "The plant server: jdbc:postgresql://HOST:PORT/DATABASE (TLS: add ?sslmode=verify-full).")
    String url;

    @Option(names = "--server-user", paramLabel = "U",
            description = "Login role on the server (default: PGUSER). The password comes from PGPASSWORD or ~/.pgpass.")
    String user;

    /** Whether {@code --server} was given. */
    public boolean given() {
        return url != null;
    }

    /** The server, its schema brought up to date (a no-op read when it already is). */
    public PlantServer connect() {
        return connect(null);
    }

    /** As {@link #connect()}, taking the address and user from {@code outer} where these options lack them. */
    public PlantServer connect(ServerOptions outer) {
        String url = this.url != null || outer == null ? this.url : outer.url;
        String user = this.user != null || outer == null ? this.user : outer.user;
        if (url == null) {
            throw new UsageProblem("give the plant server: --server jdbc:postgresql://HOST:PORT/DATABASE");
        }
        ServerLogin login;
        try {
            login = ServerLogin.resolve(url, user, System.getenv(), Path.of(System.getProperty("user.home")));
        } catch (IllegalArgumentException e) {
            throw new UsageProblem(e.getMessage());
        }
        PlantServer server = new PlantServer(login);
        server.migrate();
        return server;
    }
}
