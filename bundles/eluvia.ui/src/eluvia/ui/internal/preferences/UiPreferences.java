package eluvia.ui.internal.preferences;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

import org.eclipse.jface.preference.IPreferenceStore;
import org.eclipse.jface.preference.PreferenceStore;

import eluvia.site.model.UnitSystem;

/**
 * The workbench's preferences, kept per user in {@code ~/.eluvia/workbench.properties}: the unit
 * system numbers are shown and entered in (storage is always SI), the autosave interval and the
 * recently opened project files.
 */
public final class UiPreferences {

    /** Key of the unit system shown: the name of a {@link UnitSystem} literal. */
    public static final String UNIT_SYSTEM = "unitSystem";
    /** Key of the autosave interval in seconds (0 turns autosave off). */
    public static final String AUTOSAVE_SECONDS = "autosaveSeconds";
    /** Key of the recent files, one absolute path a line, newest first. */
    public static final String RECENT_FILES = "recentFiles";

    /** Default autosave interval, seconds. */
    public static final int DEFAULT_AUTOSAVE_SECONDS = 60;
    /** Longest allowed autosave interval, seconds (one hour). */
    public static final int MAX_AUTOSAVE_SECONDS = 3600;
    /** How many recent files the File menu lists. */
    public static final int RECENT_FILE_COUNT = 8;

    private static PreferenceStore store;

    private UiPreferences() {
    }

    /** The store, read from the user's file on first use. */
    public static synchronized IPreferenceStore store() {
        if (store == null) {
            Path file = file();
            store = new PreferenceStore(file.toString());
            store.setDefault(UNIT_SYSTEM, UnitSystem.SI.getName());
            store.setDefault(AUTOSAVE_SECONDS, DEFAULT_AUTOSAVE_SECONDS);
            store.setDefault(RECENT_FILES, "");
            if (Files.isRegularFile(file)) {
                try {
                    store.load();
                } catch (IOException e) {
                    // an unreadable preferences file: start from the defaults, it is rewritten on the next change
                }
            }
        }
        return store;
    }

    /** Forgets the store so that the next {@link #store()} reads the file again (tests change user.home). */
    public static synchronized void reset() {
        store = null;
    }

    /** The preferences file. */
    public static Path file() {
        return Path.of(System.getProperty("user.home"), ".eluvia", "workbench.properties");
    }

    /** Writes the store to its file; failures are ignored (preferences are a convenience). */
    public static synchronized void save() {
        if (store == null || !store.needsSaving()) {
            return;
        }
        try {
            Files.createDirectories(file().getParent());
            store.save();
        } catch (IOException e) {
            // the preferences stay in memory for this session
        }
    }

    /** The unit system numbers are shown and entered in. */
    public static UnitSystem unitSystem() {
        UnitSystem s = UnitSystem.getByName(store().getString(UNIT_SYSTEM));
        return s == null ? UnitSystem.SI : s;
    }

    public static void setUnitSystem(UnitSystem system) {
        store().setValue(UNIT_SYSTEM, system.getName());
        save();
    }

    /** The autosave interval in seconds, 0 for off. */
    public static int autosaveSeconds() {
        int s = store().getInt(AUTOSAVE_SECONDS);
        return s < 0 ? 0 : Math.min(s, MAX_AUTOSAVE_SECONDS);
    }

    /** The recent project files, newest first. */
    public static List<Path> recentFiles() {
        List<Path> out = new ArrayList<>();
        for (String line : store().getString(RECENT_FILES).split("\n")) {
            if (!line.isBlank()) {
                out.add(Path.of(line.trim()));
            }
        }
        return out;
    }

    /** Puts a file at the top of the recent files. */
    public static void addRecentFile(Path file) {
        Path abs = file.toAbsolutePath().normalize();
        List<Path> files = recentFiles();
        files.remove(abs);
        files.add(0, abs);
        while (files.size() > RECENT_FILE_COUNT) {
            files.remove(files.size() - 1);
        }
        StringBuilder b = new StringBuilder();
        for (Path p : files) {
            b.append(p).append('\n');
        }
        store().setValue(RECENT_FILES, b.toString());
        save();
    }
}
