package org.strandbook.app.ui.workbook;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Objects;
import java.util.Optional;
import java.util.function.Consumer;

import javafx.beans.property.ReadOnlyIntegerProperty;
import javafx.beans.property.ReadOnlyIntegerWrapper;
import javafx.beans.property.ReadOnlyObjectProperty;
import javafx.beans.property.ReadOnlyObjectWrapper;
import javafx.beans.property.ReadOnlyStringProperty;
import javafx.beans.property.ReadOnlyStringWrapper;

import org.strandbook.app.ui.task.TaskExecutor;
import org.strandbook.server.ServerLogin;
import org.strandbook.server.SiteSync;
import org.strandbook.store.SyncLedger;

/**
 * The window's side of a plant server: opening a site from it (a clone), syncing the open
 * workbook with it, and the conflicts that wait for a person's choice. Every reach to the server
 * and every read of the workbook runs as a job of the {@link TaskExecutor}.
 *
 * <p>The password is never asked for and never kept: as on the command line it comes from
 * {@code PGPASSWORD} or the password file ({@code ~/.pgpass}, {@code PGPASSFILE}), read inside the
 * job. The user defaults to {@code PGUSER}, else the login name.
 */
public final class PlantServerViewModel {

    /** What the dialogs show about where the password comes from. */
    public static final String PASSWORD_SOURCE = "Password: from PGPASSWORD or ~/.pgpass (PGPASSFILE), as the "
            + "command line reads it. Strandbook never asks for it and never stores it.";

    private final WorkbookService service;
    private final TaskExecutor tasks;
    private final Map<String, String> env;
    private final Path home;
    private final Consumer<LoadedSite> loaded;
    private final Consumer<String> notice;

    private final ReadOnlyObjectWrapper<List<String>> sites = new ReadOnlyObjectWrapper<>(this, "sites", List.of());
    private final ReadOnlyStringWrapper sitesMessage = new ReadOnlyStringWrapper(this, "sitesMessage", "");
    private final ReadOnlyObjectWrapper<List<ConflictRow>> conflicts = new ReadOnlyObjectWrapper<>(this, "conflicts",
            List.of());
    private final ReadOnlyIntegerWrapper openConflicts = new ReadOnlyIntegerWrapper(this, "openConflicts", 0);
    private final ReadOnlyStringWrapper server = new ReadOnlyStringWrapper(this, "server", "");
    private final ReadOnlyStringWrapper lastSync = new ReadOnlyStringWrapper(this, "lastSync", "");
    private final ReadOnlyStringWrapper cloneProblem = new ReadOnlyStringWrapper(this, "cloneProblem", "");
    private final ReadOnlyObjectWrapper<Path> cloned = new ReadOnlyObjectWrapper<>(this, "cloned");
    /** The last address used, with its parameters (sslmode...), which the workbook does not keep. */
    private String lastUrl = "";
    private String lastUser;
    private Path shownFile;

    /**
     * @param env    the environment the password and the default user come from
     * @param home   where {@code ~/.pgpass} is looked for and new workbooks are suggested
     * @param loaded takes a workbook read after a clone, sync or choice, as opening one does
     * @param notice takes a line for the status bar
     */
    public PlantServerViewModel(WorkbookService service, TaskExecutor tasks, Map<String, String> env, Path home,
                                Consumer<LoadedSite> loaded, Consumer<String> notice) {
        this.service = service;
        this.tasks = tasks;
        this.env = Map.copyOf(env);
        this.home = home;
        this.loaded = loaded;
        this.notice = notice;
        this.lastUser = defaultUser();
    }

    /** The sites the last listing found, by name. */
    public ReadOnlyObjectProperty<List<String>> sitesProperty() {
        return sites.getReadOnlyProperty();
    }

    /** How the last listing went, in one line (how many sites, or why none could be read). */
    public ReadOnlyStringProperty sitesMessageProperty() {
        return sitesMessage.getReadOnlyProperty();
    }

    /** The open workbook's conflicts that wait for a choice. */
    public ReadOnlyObjectProperty<List<ConflictRow>> conflictsProperty() {
        return conflicts.getReadOnlyProperty();
    }

    public ReadOnlyIntegerProperty openConflictsProperty() {
        return openConflicts.getReadOnlyProperty();
    }

    /** The server the open workbook syncs with; empty when it never synced. */
    public ReadOnlyStringProperty serverProperty() {
        return server.getReadOnlyProperty();
    }

    /** What the last sync from this window did, or why it was refused; kept after the status line moves on. */
    public ReadOnlyStringProperty lastSyncProperty() {
        return lastSync.getReadOnlyProperty();
    }

    /** Why the last clone failed, in one line; empty while none has failed. */
    public ReadOnlyStringProperty cloneProblemProperty() {
        return cloneProblem.getReadOnlyProperty();
    }

    /** The workbook the last clone wrote and opened. */
    public ReadOnlyObjectProperty<Path> clonedProperty() {
        return cloned.getReadOnlyProperty();
    }

    /** The address to offer: the open workbook's server, else the last one used. */
    public String suggestedUrl() {
        return server.get().isEmpty() ? lastUrl : urlFor(server.get());
    }

    /** {@code PGUSER}, else the login name: what {@code psql} would log in as. */
    public String defaultUser() {
        return Optional.ofNullable(env.get("PGUSER")).filter(u -> !u.isBlank())
                .orElseGet(() -> Objects.requireNonNullElse(System.getProperty("user.name"), ""));
    }

    /** The user to offer: the last one used, else the default. */
    public String suggestedUser() {
        return lastUser;
    }

    /** A new workbook's file for a site: in the home folder, named after the site. */
    public Path suggestedTarget(String siteName) {
        String name = siteName.strip().toLowerCase(Locale.ROOT).replaceAll("[^a-z0-9]+", "-").replaceAll("^-|-$", "");
        return home.resolve((name.isEmpty() ? "site" : name) + ".strandbook");
    }

    /** What is wrong with a server address and user before anything is reached, if anything. */
    public Optional<String> checkServer(String url, String user) {
        try {
            new ServerLogin(url == null ? null : url.strip(), user == null || user.isBlank() ? null : user.strip(), null);
            return Optional.empty();
        } catch (IllegalArgumentException e) {
            return Optional.of(e.getMessage().replace("give --server-user or set PGUSER", "give a user or set PGUSER"));
        }
    }

    /** What is wrong with a clone's request before the server is reached, if anything. */
    public Optional<String> checkClone(String url, String user, String siteName, Path target) {
        Optional<String> bad = checkServer(url, user);
        if (bad.isPresent()) {
            return bad;
        }
        if (siteName == null || siteName.isBlank()) {
            return Optional.of("name the site to open (List sites shows those the server lets you open)");
        }
        if (target == null) {
            return Optional.of("choose the new workbook's file");
        }
        if (Files.exists(target)) {
            return Optional.of(target + " exists; a clone never overwrites a file: choose a new name");
        }
        return Optional.empty();
    }

    /** Forgets the last listing: a dialog opened now starts without another server's sites. */
    public void forgetSites() {
        sites.set(List.of());
        sitesMessage.set("");
    }

    /** Lists the sites the server lets {@code user} open; the answer lands in {@link #sitesProperty()}. */
    public void listSites(String url, String user) {
        Optional<String> bad = checkServer(url, user);
        if (bad.isPresent()) {
            sitesMessage.set(bad.get());
            return;
        }
        // emptied first, so that the same sites listed again reach a dialog opened since
        sites.set(List.of());
        sitesMessage.set("asking the server\u2026");
        tasks.submit("Listing the sites on the plant server", p -> service.serverSites(login(url, user)), names -> {
            sites.set(List.copyOf(names));
            sitesMessage.set(names.isEmpty() ? "the server holds no site that " + user.strip() + " may open"
                    : names.size() + " site(s) " + user.strip() + " may open");
        }, e -> sitesMessage.set(message(e)));
    }

    /**
     * Starts a new workbook from a site on the server and opens it. The clone runs in the
     * background; Cancel (or a lost server) leaves no file behind.
     */
    public void cloneSite(String url, String user, String siteName, Path target) {
        Optional<String> bad = checkClone(url, user, siteName, target);
        if (bad.isPresent()) {
            refuseClone(bad.get());
            return;
        }
        cloneProblem.set("");
        String site = siteName.strip();
        tasks.submit("Opening site " + site + " from the plant server",
                p -> service.cloneFromServer(login(url, user), site, target, p), opened -> {
                    remember(url, user);
                    loaded.accept(opened);
                    cloned.set(target);
                    notice.accept("Site " + site + " opened from " + displayUrl(url) + " into " + target
                            + "; work offline and sync with Site \u25B8 Sync with plant server");
                }, e -> refuseClone(message(e)));
    }

    private void refuseClone(String why) {
        cloneProblem.set(why);
        notice.accept("Not opened from the plant server: " + why);
    }

    /** Syncs the open workbook with the server it last synced with, as the last user given. */
    public void sync() {
        if (server.get().isEmpty()) {
            notice.accept("This workbook has never synced: give its plant server (Site \u25B8 Sync with plant server as\u2026)");
            return;
        }
        sync(urlFor(server.get()), lastUser);
    }

    /** Syncs the open workbook with a site on the server at {@code url}, logging in as {@code user}. */
    public void sync(String url, String user) {
        Optional<String> bad = checkServer(url, user);
        if (bad.isPresent()) {
            notice.accept("Not synced: " + bad.get());
            return;
        }
        tasks.submit("Syncing with " + displayUrl(url), p -> service.sync(login(url, user), p), synced -> {
            remember(url, user);
            loaded.accept(synced.loaded());
            SiteSync.Outcome o = synced.outcome();
            lastSync.set(String.format(Locale.ROOT, "Synced with %s: %d record(s) sent, %d received, %d changed on the"
                            + " server, %d changed here%s", displayUrl(url), o.pushed(), o.pulled(), o.changedThere(),
                    o.changedHere(), o.openConflicts().isEmpty() ? ""
                            : "; " + o.openConflicts().size() + " edit(s) to settle"));
            notice.accept(lastSync.get());
        }, e -> {
            lastSync.set("Not synced: " + message(e));
            notice.accept(lastSync.get());
        });
    }

    /**
     * Settles one conflict: keeping mine leaves the workbook as it is and the next sync sends it;
     * keeping theirs takes the server's value into the workbook now. Either way an audited change.
     */
    public void settle(ConflictRow row, boolean keepMine) {
        tasks.submit((keepMine ? "Keeping this workbook's value" : "Taking the server's value") + " for "
                + row.record() + " " + row.field(), p -> service.settleConflict(row.id(), keepMine, p), site -> {
                    loaded.accept(site);
                    notice.accept(row.record() + " " + row.field() + ": " + (keepMine
                            ? "kept " + row.mine() + "; the next sync sends it to the server"
                            : "took the server's " + row.theirs()));
                }, e -> {
                    notice.accept("Not settled: " + message(e));
                    // the row may have been settled meanwhile (by `sync --resolve`): show what is open now
                    refreshConflicts();
                });
    }

    /** Reads the open workbook's server and conflicts again; the window calls it after each load. */
    void workbookLoaded(Path file) {
        if (!file.equals(shownFile)) {
            // what the last sync did belongs to the workbook it was done in
            lastSync.set("");
            shownFile = file;
        }
        refreshConflicts();
    }

    private void refreshConflicts() {
        tasks.submit("Reading the sync state", p -> {
            List<SyncLedger.Conflict> open = service.openConflicts();
            return new SyncStanding(service.syncedServer().orElse(""),
                    open.stream().map(c -> ConflictRow.of(c, open)).toList());
        }, standing -> {
                    server.set(standing.server());
                    conflicts.set(standing.conflicts());
                    openConflicts.set(standing.conflicts().size());
                }, e -> notice.accept(message(e)));
    }

    void workbookClosed() {
        server.set("");
        lastSync.set("");
        shownFile = null;
        conflicts.set(List.of());
        openConflicts.set(0);
    }

    private record SyncStanding(String server, List<ConflictRow> conflicts) {
    }

    /** The login, the password looked up in the job (the password file is a file read). */
    private ServerLogin login(String url, String user) {
        return ServerLogin.resolve(url.strip(), user.strip(), env, home);
    }

    private void remember(String url, String user) {
        lastUrl = url.strip();
        lastUser = user.strip();
    }

    /** The last address used when it is this one, for its parameters; else the address as the workbook keeps it. */
    private String urlFor(String displayUrl) {
        return displayUrl(lastUrl).equals(displayUrl) ? lastUrl : displayUrl;
    }

    private static String displayUrl(String url) {
        String u = url.strip();
        int q = u.indexOf('?');
        return q < 0 ? u : u.substring(0, q);
    }

    private static String message(Exception e) {
        return Objects.requireNonNullElse(e.getMessage(), e.getClass().getSimpleName());
    }
}
