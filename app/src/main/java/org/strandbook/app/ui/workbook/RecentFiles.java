package org.strandbook.app.ui.workbook;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.prefs.Preferences;

/** The workbooks opened or saved last, newest first, kept in the user's preferences. */
public final class RecentFiles {

    static final int LIMIT = 6;
    private static final String KEY = "recent.";

    private final Preferences preferences;

    public RecentFiles(Preferences preferences) {
        this.preferences = preferences;
    }

    public List<Path> list() {
        List<Path> out = new ArrayList<>();
        for (int i = 0; i < LIMIT; i++) {
            String p = preferences.get(KEY + i, null);
            if (p != null && !p.isBlank()) {
                out.add(Path.of(p));
            }
        }
        return out;
    }

    public void add(Path file) {
        Path normal = file.toAbsolutePath().normalize();
        List<Path> next = new ArrayList<>();
        next.add(normal);
        list().stream().filter(p -> !p.equals(normal)).forEach(next::add);
        for (int i = 0; i < LIMIT; i++) {
            if (i < next.size()) {
                preferences.put(KEY + i, next.get(i).toString());
            } else {
                preferences.remove(KEY + i);
            }
        }
    }
}
