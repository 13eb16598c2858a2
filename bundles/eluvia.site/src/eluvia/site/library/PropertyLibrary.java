package eluvia.site.library;

import java.io.IOException;
import java.io.InputStream;
import java.io.InputStreamReader;
import java.io.Reader;
import java.io.StringWriter;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Objects;
import java.util.Optional;
import java.util.StringJoiner;

import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVParser;
import org.apache.commons.csv.CSVPrinter;
import org.apache.commons.csv.CSVRecord;

import eluvia.site.internal.files.AtomicFileWriter;
import eluvia.site.model.Contaminant;

/**
 * Contaminant properties shipped with the product, plus the user's own entries.
 *
 * <p>The shipped library ({@code library/contaminant-properties.csv} in this bundle) holds about
 * ten common soil contaminants. Every value names its source and is flagged {@link Provenance#PUBLISHED}
 * (the number stands in the source: the Koc values of US EPA 1996, EPA/540/R-95/128, App. K,
 * Table K-1) or {@link Provenance#FROM_MEMORY} (recalled, not verified against the primary source;
 * marked so wherever it is used). No half-lives are shipped: they depend on the site.
 *
 * <p>Library files are CSV (RFC 4180, UTF-8) with the header
 * {@code name,cas_number,quantity,value,unit,provenance,source}, one value per row; rows of one
 * entry share name and CAS number; lines starting with {@code #} are comments. Quantities and
 * units are those of {@link LibraryQuantity}; provenance is {@code published}, {@code from_memory}
 * or {@code user}. The user library file uses the same format.
 */
public final class PropertyLibrary {

    /** Resource path of the shipped library inside this bundle. */
    public static final String SHIPPED_RESOURCE = "/library/contaminant-properties.csv";

    static final String[] HEADER = {"name", "cas_number", "quantity", "value", "unit", "provenance", "source"};

    private static final CSVFormat FORMAT = CSVFormat.RFC4180.builder().setHeader().setSkipHeaderRecord(true)
            .setCommentMarker('#').setIgnoreEmptyLines(true).setTrim(true).get();

    private final List<LibraryEntry> entries;

    private PropertyLibrary(List<LibraryEntry> entries) {
        this.entries = List.copyOf(entries);
    }

    /** An empty library. */
    public static PropertyLibrary empty() {
        return new PropertyLibrary(List.of());
    }

    /** The library shipped with the product. */
    public static PropertyLibrary shipped() {
        try (InputStream in = PropertyLibrary.class.getResourceAsStream(SHIPPED_RESOURCE)) {
            if (in == null) {
                throw new IllegalStateException("the shipped property library " + SHIPPED_RESOURCE
                        + " is missing from bundle eluvia.site");
            }
            return read(new InputStreamReader(in, StandardCharsets.UTF_8), "contaminant-properties.csv", false);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        } catch (LibraryFileException e) {
            throw new IllegalStateException("the shipped property library is damaged: " + e.getMessage(), e);
        }
    }

    /**
     * Reads a library file.
     *
     * @param userEntries true for the user's file (its entries are marked as user entries)
     * @throws LibraryFileException naming the line of the first row that cannot be read
     */
    public static PropertyLibrary read(Reader reader, String nameForMessages, boolean userEntries)
            throws LibraryFileException, IOException {
        Map<String, List<LibraryValue>> values = new LinkedHashMap<>();
        Map<String, String[]> names = new LinkedHashMap<>();
        try (CSVParser parser = FORMAT.parse(reader)) {
            checkHeader(parser, nameForMessages);
            for (CSVRecord row : parser) {
                int line = (int) parser.getCurrentLineNumber();
                if (row.size() != HEADER.length) {
                    throw new LibraryFileException(nameForMessages, line, "expected " + HEADER.length + " columns ("
                            + String.join(",", HEADER) + "), found " + row.size(), null);
                }
                String name = row.get(0);
                String cas = row.get(1);
                LibraryQuantity quantity = LibraryQuantity.ofKey(row.get(2));
                if (quantity == null) {
                    throw new LibraryFileException(nameForMessages, line, "quantity = '" + row.get(2) + "': allowed "
                            + keys(), null);
                }
                double value;
                try {
                    value = Double.parseDouble(row.get(3));
                } catch (NumberFormatException e) {
                    throw new LibraryFileException(nameForMessages, line, "value = '" + row.get(3)
                            + "' is not a number (use a point as decimal separator, e.g. 61.7)", e);
                }
                if (!quantity.unit().equals(row.get(4))) {
                    throw new LibraryFileException(nameForMessages, line, "unit = '" + row.get(4) + "' for " + quantity.key()
                            + ": allowed " + quantity.unit() + " (convert the value)", null);
                }
                Provenance provenance = Provenance.ofKey(row.get(5));
                if (provenance == null) {
                    throw new LibraryFileException(nameForMessages, line, "provenance = '" + row.get(5)
                            + "': allowed published, from_memory or user", null);
                }
                String key = name.toLowerCase(Locale.ROOT) + "|" + cas;
                try {
                    values.computeIfAbsent(key, k -> new ArrayList<>()).add(new LibraryValue(quantity, value, provenance, row.get(6)));
                    names.putIfAbsent(key, new String[] {name, cas});
                    new LibraryEntry(name, cas, values.get(key), userEntries);
                } catch (IllegalArgumentException e) {
                    throw new LibraryFileException(nameForMessages, line, e.getMessage(), e);
                }
            }
        } catch (UncheckedIOException e) {
            throw new LibraryFileException(nameForMessages, 0, "the file is not valid CSV (" + e.getMessage() + ")", e);
        }
        List<LibraryEntry> entries = new ArrayList<>();
        for (Map.Entry<String, List<LibraryValue>> e : values.entrySet()) {
            String[] nameAndCas = names.get(e.getKey());
            entries.add(new LibraryEntry(nameAndCas[0], nameAndCas[1], e.getValue(), userEntries));
        }
        return new PropertyLibrary(entries);
    }

    private static void checkHeader(CSVParser parser, String name) throws LibraryFileException {
        List<String> header = parser.getHeaderNames();
        if (!List.of(HEADER).equals(header)) {
            throw new LibraryFileException(name, 1, "the header must be " + String.join(",", HEADER) + ", found "
                    + String.join(",", header), null);
        }
    }

    private static String keys() {
        StringJoiner joiner = new StringJoiner(", ");
        for (LibraryQuantity q : LibraryQuantity.values()) {
            joiner.add(q.key());
        }
        return joiner.toString();
    }

    /**
     * Reads the user library file; a file that does not exist is an empty library.
     *
     * @throws LibraryFileException naming the line of the first row that cannot be read
     */
    public static PropertyLibrary readUserFile(Path file) throws LibraryFileException {
        try (Reader reader = Files.newBufferedReader(file, StandardCharsets.UTF_8)) {
            return read(reader, file.getFileName().toString(), true);
        } catch (NoSuchFileException e) {
            return empty();
        } catch (IOException e) {
            throw new LibraryFileException(file.getFileName().toString(), 0, "the file could not be read (" + e.getMessage() + ")", e);
        }
    }

    /** Writes this library's user entries to the user library file (atomically, keeping a .bak). */
    public void writeUserFile(Path file) throws IOException {
        StringWriter out = new StringWriter();
        try (CSVPrinter printer = new CSVPrinter(out, CSVFormat.RFC4180.builder().setHeader(HEADER).get())) {
            for (LibraryEntry entry : entries) {
                if (!entry.userEntry()) {
                    continue;
                }
                for (LibraryValue v : entry.values()) {
                    printer.printRecord(entry.name(), entry.casNumber(), v.quantity().key(), Double.toString(v.value()),
                            v.quantity().unit(), v.provenance().key(), v.source());
                }
            }
        }
        AtomicFileWriter.write(file, out.toString().getBytes(StandardCharsets.UTF_8), ".bak");
    }

    /** All entries: user entries first, then shipped ones. */
    public List<LibraryEntry> entries() {
        return entries;
    }

    /**
     * This library with the other's entries added in front; an entry of the other with the same
     * CAS number (or, without one, the same name) replaces this library's.
     */
    public PropertyLibrary withEntriesOf(PropertyLibrary other) {
        List<LibraryEntry> merged = new ArrayList<>(other.entries);
        for (LibraryEntry mine : entries) {
            boolean replaced = other.entries.stream().anyMatch(theirs -> sameSubstance(mine, theirs));
            if (!replaced) {
                merged.add(mine);
            }
        }
        return new PropertyLibrary(merged);
    }

    /** This library with one more user entry (replacing one of the same substance). */
    public PropertyLibrary withUserEntry(LibraryEntry entry) {
        Objects.requireNonNull(entry, "entry");
        LibraryEntry user = entry.userEntry() ? entry : new LibraryEntry(entry.name(), entry.casNumber(), entry.values(), true);
        return withEntriesOf(new PropertyLibrary(List.of(user)));
    }

    private static boolean sameSubstance(LibraryEntry a, LibraryEntry b) {
        if (!a.casNumber().isEmpty() && !b.casNumber().isEmpty()) {
            return a.casNumber().equals(b.casNumber());
        }
        return a.name().trim().equalsIgnoreCase(b.name().trim());
    }

    /** The first entry whose name (ignoring case) or CAS number matches. */
    public Optional<LibraryEntry> find(String nameOrCasNumber) {
        if (nameOrCasNumber == null) {
            return Optional.empty();
        }
        String key = nameOrCasNumber.trim();
        return entries.stream().filter(e -> e.casNumber().equals(key) || e.name().equalsIgnoreCase(key)).findFirst();
    }

    /**
     * Copies an entry's values into a contaminant: name and CAS number, Koc (measured, else
     * calculated), Kd (when the entry has one, also setting kdEntered), water solubility, free-water
     * diffusion and half-life where the entry has them; and writes {@code propertySource} listing
     * every value used with its source and provenance ("FROM MEMORY" where so).
     */
    public static void applyTo(LibraryEntry entry, Contaminant contaminant) {
        Objects.requireNonNull(entry, "entry");
        Objects.requireNonNull(contaminant, "contaminant");
        StringJoiner source = new StringJoiner("; ", "Property library" + (entry.userEntry() ? " (user entry) " : " ")
                + "'" + entry.name() + "': ", "");
        contaminant.setName(entry.name());
        contaminant.setCasNumber(entry.casNumber());
        entry.koc().ifPresent(v -> {
            contaminant.setKocLitresPerKg(v.value());
            source.add("Koc " + v.describe());
        });
        entry.value(LibraryQuantity.KD).ifPresent(v -> {
            contaminant.setKdLitresPerKg(v.value());
            contaminant.setKdEntered(true);
            source.add("Kd " + v.describe());
        });
        entry.value(LibraryQuantity.WATER_SOLUBILITY).ifPresent(v -> {
            contaminant.setWaterSolubilityMilligramsPerLitre(v.value());
            source.add("solubility " + v.describe());
        });
        entry.value(LibraryQuantity.FREE_WATER_DIFFUSION).ifPresent(v -> {
            contaminant.setDiffusionSquareMetresPerSecond(v.value());
            source.add("free-water diffusion " + v.describe());
        });
        entry.value(LibraryQuantity.HALF_LIFE).ifPresent(v -> {
            contaminant.setHalfLifeDays(v.value());
            source.add("half-life " + v.describe());
        });
        contaminant.setPropertySource(source.toString());
    }
}
