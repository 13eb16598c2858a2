package eluvia.site.library;

import java.util.Locale;

/** The contaminant properties a library entry may carry, each in one fixed unit. */
public enum LibraryQuantity {
    /** Measured organic-carbon partition coefficient Koc, L/kg. */
    KOC_MEASURED("koc_measured", "L/kg"),
    /** Koc calculated from Kow (log Koc = 0.7919 log Kow + 0.0784, US EPA 1996 App. K), L/kg. */
    KOC_CALCULATED("koc_calculated", "L/kg"),
    /** Soil-water distribution coefficient Kd, L/kg (site-specific; metals depend on pH and loading). */
    KD("kd", "L/kg"),
    /** Solubility in water, mg/L. */
    WATER_SOLUBILITY("water_solubility", "mg/L"),
    /** Free-water (molecular) diffusion coefficient, m2/s. */
    FREE_WATER_DIFFUSION("free_water_diffusion", "m2/s"),
    /** First-order decay half-life, days. */
    HALF_LIFE("half_life", "d");

    private final String key;
    private final String unit;

    LibraryQuantity(String key, String unit) {
        this.key = key;
        this.unit = unit;
    }

    /** The word used in library files, e.g. {@code koc_measured}. */
    public String key() {
        return key;
    }

    /** The unit the value is in, as written in library files. */
    public String unit() {
        return unit;
    }

    /** The quantity for a library-file word, or null. */
    public static LibraryQuantity ofKey(String key) {
        String k = key == null ? "" : key.trim().toLowerCase(Locale.ROOT);
        for (LibraryQuantity q : values()) {
            if (q.key.equals(k)) {
                return q;
            }
        }
        return null;
    }
}
