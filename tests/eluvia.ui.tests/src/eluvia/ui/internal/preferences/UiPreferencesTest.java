package eluvia.ui.internal.preferences;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import eluvia.site.model.UnitSystem;

/** The workbench preferences: unit system, autosave interval and recent files, kept per user. */
final class UiPreferencesTest {

    @TempDir
    Path dir;

    private String home;

    @BeforeEach
    void privateHome() {
        home = System.getProperty("user.home");
        System.setProperty("user.home", dir.toString());
        UiPreferences.reset();
    }

    @AfterEach
    void restoreHome() {
        System.setProperty("user.home", home);
        UiPreferences.reset();
    }

    @Test
    void choicesAreKeptInTheUsersFileAndReadBack() {
        assertEquals(UnitSystem.SI, UiPreferences.unitSystem(), "SI by default");
        assertEquals(UiPreferences.DEFAULT_AUTOSAVE_SECONDS, UiPreferences.autosaveSeconds());
        UiPreferences.setUnitSystem(UnitSystem.US_CUSTOMARY);
        assertTrue(Files.isRegularFile(dir.resolve(".eluvia").resolve("workbench.properties")));
        UiPreferences.reset();
        assertEquals(UnitSystem.US_CUSTOMARY, UiPreferences.unitSystem(), "read back from the file");
    }

    @Test
    void recentFilesAreNewestFirstWithoutRepeatsAndCapped() {
        for (int i = 0; i < UiPreferences.RECENT_FILE_COUNT + 3; i++) {
            UiPreferences.addRecentFile(dir.resolve("p" + i + ".eluvia"));
        }
        UiPreferences.addRecentFile(dir.resolve("p5.eluvia"));
        List<Path> recent = UiPreferences.recentFiles();
        assertEquals(UiPreferences.RECENT_FILE_COUNT, recent.size());
        assertEquals(dir.resolve("p5.eluvia").toAbsolutePath().normalize(), recent.get(0));
        assertEquals(1, recent.stream().filter(p -> p.getFileName().toString().equals("p5.eluvia")).count());
        assertEquals(dir.resolve("p" + (UiPreferences.RECENT_FILE_COUNT + 2) + ".eluvia").toAbsolutePath().normalize(),
                recent.get(1));
    }

    @Test
    void anOutOfRangeAutosaveIntervalIsClamped() {
        UiPreferences.store().setValue(UiPreferences.AUTOSAVE_SECONDS, -5);
        assertEquals(0, UiPreferences.autosaveSeconds());
        UiPreferences.store().setValue(UiPreferences.AUTOSAVE_SECONDS, 100_000);
        assertEquals(UiPreferences.MAX_AUTOSAVE_SECONDS, UiPreferences.autosaveSeconds());
    }
}
