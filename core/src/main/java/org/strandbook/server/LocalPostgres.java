package org.strandbook.server;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.net.InetAddress;
import java.net.ServerSocket;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.Paths;
import java.sql.Connection;
import java.sql.DriverManager;
import java.sql.SQLException;
import java.sql.Statement;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.atomic.AtomicInteger;
import java.util.stream.Stream;

/**
 * A throwaway PostgreSQL server for tests and for {@code strandbook bench sync}, never for a
 * plant's data: the operating system's binaries ({@code initdb}, {@code pg_ctl}),
 * a data folder of its own in the temporary folder, loopback only, on a free port, with trust
 * authentication (nothing listens beyond 127.0.0.1), durability off (fsync, full-page writes: a
 * scratch server needs none). Never a mock: the server refuses what a plant's server refuses.
 *
 * <p>{@code initdb} refuses to run as root, so as root the server runs as the {@code postgres}
 * account the OS package creates. {@code STRANDBOOK_PG_BIN} names another binary folder.
 * One server per test JVM ({@link #shared()}), stopped by a shutdown hook; each test takes a fresh
 * database from {@link #newDatabase()}.
 */
public final class LocalPostgres implements AutoCloseable {

    /** The server's superuser, as initdb names it after the account that runs it. */
    public static final String SUPERUSER = "postgres";

    private static final AtomicInteger DATABASES = new AtomicInteger();
    private static LocalPostgres shared;

    private final Path bin;
    private final Path dataDir;
    private final int port;
    private final boolean asPostgresAccount;
    private String plantTemplate;

    private LocalPostgres(Path bin, Path dataDir, int port, boolean asPostgresAccount) {
        this.bin = bin;
        this.dataDir = dataDir;
        this.port = port;
        this.asPostgresAccount = asPostgresAccount;
    }

    /** The server of this test JVM, started on first use. */
    public static synchronized LocalPostgres shared() {
        if (shared == null) {
            shared = start();
            LocalPostgres server = shared;
            Runtime.getRuntime().addShutdownHook(new Thread(server::close, "stop-test-postgres"));
        }
        return shared;
    }

    /** Starts a new server; the caller stops it. */
    public static LocalPostgres start() {
        Path bin = binaries();
        boolean root = "root".equals(System.getProperty("user.name"));
        try {
            Path dataDir = Files.createTempDirectory("strandbook-pg-");
            if (root) {
                run(List.of("chown", "postgres:postgres", dataDir.toString()));
            }
            LocalPostgres server = new LocalPostgres(bin, dataDir, freePort(), root);
            server.pg(List.of(bin.resolve("initdb").toString(), "-D", dataDir.resolve("data").toString(),
                    "-A", "trust", "-U", SUPERUSER, "-E", "UTF8", "--no-locale", "--no-sync"));
            server.startServer();
            return server;
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    void startServer() {
        pg(List.of(bin.resolve("pg_ctl").toString(), "-D", dataDir.resolve("data").toString(), "-w", "-s",
                "-l", dataDir.resolve("server.log").toString(),
                "-o", "-p " + port + " -k " + dataDir + " -c listen_addresses=127.0.0.1 -c fsync=off"
                        + " -c synchronous_commit=off -c full_page_writes=off -c max_connections=60",
                "start"));
    }

    /** Stops the server at once, as a power cut or an operator's kill would. */
    public void stopNow() {
        pg(List.of(bin.resolve("pg_ctl").toString(), "-D", dataDir.resolve("data").toString(), "-w", "-s",
                "-m", "immediate", "stop"));
    }

    /** Starts a server stopped by {@link #stopNow()} again, with its data. */
    public void restart() {
        startServer();
    }

    public int port() {
        return port;
    }

    /** The JDBC URL of a database on this server. */
    public String url(String database) {
        return "jdbc:postgresql://127.0.0.1:" + port + "/" + database;
    }

    /** A new, empty database owned by the superuser; its URL. */
    public String newDatabase() {
        String name = "sb" + ProcessHandle.current().pid() + "_" + DATABASES.incrementAndGet();
        try (Connection c = DriverManager.getConnection(url("postgres"), SUPERUSER, "");
             Statement st = c.createStatement()) {
            st.execute("CREATE DATABASE " + name);
        } catch (SQLException e) {
            throw new IllegalStateException("cannot create a test database: " + e.getMessage(), e);
        }
        return url(name);
    }

    /**
     * A plant server on a new database, migrated by its administrator (the superuser), with
     * technician login roles (no password: the test server trusts loopback) that may work on it.
     */
    public String newPlantServer(String... technicians) {
        String url;
        synchronized (this) {
            if (plantTemplate == null) {
                // Flyway runs once per server; each test's database is a copy of the migrated one
                String template = newDatabase();
                new PlantServer(new ServerLogin(template, SUPERUSER, null)).migrate();
                plantTemplate = template.substring(template.lastIndexOf('/') + 1);
            }
            String name = "sb" + ProcessHandle.current().pid() + "_" + DATABASES.incrementAndGet();
            try (Connection c = DriverManager.getConnection(url("postgres"), SUPERUSER, "");
                 Statement st = c.createStatement()) {
                st.execute("CREATE DATABASE " + name + " TEMPLATE " + plantTemplate);
            } catch (SQLException e) {
                throw new IllegalStateException("cannot create a test database: " + e.getMessage(), e);
            }
            url = url(name);
        }
        try (Connection c = superuser(url); Statement st = c.createStatement()) {
            for (String tech : technicians) {
                st.execute("DO $$ BEGIN IF NOT EXISTS (SELECT 1 FROM pg_roles WHERE rolname = '" + tech + "') THEN"
                        + " CREATE ROLE " + tech + " LOGIN IN ROLE strandbook_technician; END IF; END $$");
            }
        } catch (SQLException e) {
            throw new IllegalStateException("cannot add technicians: " + e.getMessage(), e);
        }
        return url;
    }

    /** A connection as the superuser. */
    public Connection superuser(String url) throws SQLException {
        return DriverManager.getConnection(url, SUPERUSER, "");
    }

    @Override
    public synchronized void close() {
        try {
            stopNow();
        } catch (RuntimeException e) {
            // already stopped
        }
        try (Stream<Path> files = Files.walk(dataDir)) {
            files.sorted(Comparator.reverseOrder()).forEach(p -> p.toFile().delete());
        } catch (IOException e) {
            // a temp folder left behind is harmless
        }
    }

    private void pg(List<String> command) {
        List<String> full = new ArrayList<>();
        if (asPostgresAccount) {
            full.addAll(List.of("runuser", "-u", SUPERUSER, "--"));
        }
        full.addAll(command);
        run(full);
    }

    private static void run(List<String> command) {
        try {
            Process p = new ProcessBuilder(command).redirectErrorStream(true).start();
            byte[] out = p.getInputStream().readAllBytes();
            if (!p.waitFor(120, TimeUnit.SECONDS) || p.exitValue() != 0) {
                throw new IllegalStateException(String.join(" ", command) + " failed: "
                        + new String(out, StandardCharsets.UTF_8).strip());
            }
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new IllegalStateException("interrupted while running " + command.get(0), e);
        }
    }

    private static Path binaries() {
        String env = System.getenv("STRANDBOOK_PG_BIN");
        if (env != null && !env.isBlank()) {
            return Paths.get(env);
        }
        Path lib = Paths.get("/usr/lib/postgresql");
        if (Files.isDirectory(lib)) {
            try (Stream<Path> versions = Files.list(lib)) {
                return versions.map(v -> v.resolve("bin")).filter(b -> Files.isExecutable(b.resolve("initdb")))
                        .max(Comparator.comparingInt(LocalPostgres::majorVersion))
                        .orElseThrow(LocalPostgres::missing);
            } catch (IOException e) {
                throw new UncheckedIOException(e);
            }
        }
        throw missing();
    }

    private static int majorVersion(Path bin) {
        try {
            return Integer.parseInt(bin.getParent().getFileName().toString().toLowerCase(Locale.ROOT));
        } catch (NumberFormatException e) {
            return 0;
        }
    }

    private static IllegalStateException missing() {
        return new IllegalStateException("no PostgreSQL server binaries: install the OS package"
                + " (apt-get install -y postgresql) or set STRANDBOOK_PG_BIN to the folder holding initdb");
    }

    private static int freePort() throws IOException {
        try (ServerSocket s = new ServerSocket(0, 1, InetAddress.getLoopbackAddress())) {
            return s.getLocalPort();
        }
    }
}
