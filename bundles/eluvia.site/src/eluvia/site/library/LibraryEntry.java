package eluvia.site.library;

import java.util.List;
import java.util.Objects;
import java.util.Optional;

/**
 * One contaminant in the property library.
 *
 * @param name the contaminant's name
 * @param casNumber its CAS registry number (with a correct check digit), or empty
 * @param values its property values, at most one per quantity
 * @param userEntry true for an entry from the user library file
 */
public record LibraryEntry(String name, String casNumber, List<LibraryValue> values, boolean userEntry) {

    public LibraryEntry {
        if (name == null || name.isBlank()) {
            throw new IllegalArgumentException("library entry name = '" + name + "': allowed a non-blank name");
        }
        casNumber = casNumber == null ? "" : casNumber.trim();
        if (!casNumber.isEmpty() && !CasNumbers.isValid(casNumber)) {
            throw new IllegalArgumentException("library entry '" + name + "' CAS number = '" + casNumber
                    + "': allowed empty or a CAS number with a correct check digit, e.g. 71-43-2");
        }
        values = List.copyOf(Objects.requireNonNull(values, "values"));
        for (int i = 0; i < values.size(); i++) {
            for (int j = i + 1; j < values.size(); j++) {
                if (values.get(i).quantity() == values.get(j).quantity()) {
                    throw new IllegalArgumentException("library entry '" + name + "' has " + values.get(i).quantity().key()
                            + " twice: allowed one value per quantity");
                }
            }
        }
    }

    /** The entry's value of a quantity, if it has one. */
    public Optional<LibraryValue> value(LibraryQuantity quantity) {
        return values.stream().filter(v -> v.quantity() == quantity).findFirst();
    }

    /** The Koc to use: the measured one when there is one, else the calculated one. */
    public Optional<LibraryValue> koc() {
        Optional<LibraryValue> measured = value(LibraryQuantity.KOC_MEASURED);
        return measured.isPresent() ? measured : value(LibraryQuantity.KOC_CALCULATED);
    }
}
