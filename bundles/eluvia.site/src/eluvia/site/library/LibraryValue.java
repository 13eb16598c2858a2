package eluvia.site.library;

import java.util.Objects;

/**
 * One property value of a library entry, with its source and provenance.
 *
 * @param quantity what it is; the value is in {@link LibraryQuantity#unit()}
 * @param value the number, finite and 0 or more
 * @param provenance published, from memory, or the user's
 * @param source where it comes from (author, year, table), never empty
 */
public record LibraryValue(LibraryQuantity quantity, double value, Provenance provenance, String source) {

    public LibraryValue {
        Objects.requireNonNull(quantity, "quantity");
        Objects.requireNonNull(provenance, "provenance");
        if (!Double.isFinite(value) || value < 0) {
            throw new IllegalArgumentException(quantity.key() + " = " + value + " " + quantity.unit()
                    + ": allowed a finite number 0 or more");
        }
        if (source == null || source.isBlank()) {
            throw new IllegalArgumentException(quantity.key() + " has no source: every library value names where it comes from");
        }
    }

    /** The value with its unit and provenance, e.g. {@code 61.7 L/kg (US EPA 1996 ..., published)}. */
    public String describe() {
        String flag = switch (provenance) {
            case PUBLISHED -> "published";
            case FROM_MEMORY -> "FROM MEMORY, not verified against the primary source";
            case USER -> "entered by the user";
        };
        return value + " " + quantity.unit() + " (" + source + "; " + flag + ")";
    }
}
