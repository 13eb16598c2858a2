package eluvia.site.library;

import java.util.Locale;

/** How far a library value can be trusted: where it stands and whether it was checked. */
public enum Provenance {
    /** The number stands in the published source named with it. */
    PUBLISHED("published"),
    /** Recalled, not verified against the primary source: shown marked "from memory" wherever it is used. */
    FROM_MEMORY("from_memory"),
    /** Entered by the user in the user library file; the user's source note says where it comes from. */
    USER("user");

    private final String key;

    Provenance(String key) {
        this.key = key;
    }

    /** The word used in library files. */
    public String key() {
        return key;
    }

    /** The provenance for a library-file word, or null. */
    public static Provenance ofKey(String key) {
        String k = key == null ? "" : key.trim().toLowerCase(Locale.ROOT);
        for (Provenance p : values()) {
            if (p.key.equals(k)) {
                return p;
            }
        }
        return null;
    }
}
