package eluvia.site.sampling;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.Reader;
import java.io.UncheckedIOException;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Objects;

import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVParser;
import org.apache.commons.csv.CSVRecord;

import eluvia.site.model.Contaminant;
import eluvia.site.model.Project;
import eluvia.site.model.Sample;
import eluvia.site.model.SamplingLocation;
import eluvia.site.model.Site;
import eluvia.site.model.SiteFactory;

/**
 * Reads soil sample results from a CSV file (RFC 4180, UTF-8, comma or semicolon separated, a
 * header row, {@code #} comment lines) with these columns, in any order, names as written
 * (case ignored):
 * <pre>
 * location, easting_m, northing_m, ground_elevation_m, top_depth_m, bottom_depth_m,
 * contaminant, concentration_mg_per_kg, non_detect, detection_limit_mg_per_kg
 * </pre>
 * Units are in the names: metres, mg/kg of dry soil. {@code ground_elevation_m}, {@code non_detect}
 * and {@code detection_limit_mg_per_kg} may be empty. A non-detect is {@code non_detect} = true/yes/1/ND,
 * or a concentration written {@code <0.05} (taken as not detected at 0.05 mg/kg). The contaminant is
 * matched to the project's by name (case ignored) or CAS number.
 *
 * <p>Every row that cannot be read is reported with its line and the reason; the others are imported.
 */
public final class SampleCsvImport {

    /** The columns, in the order a template file has them. */
    public static final List<String> COLUMNS = List.of("location", "easting_m", "northing_m", "ground_elevation_m",
            "top_depth_m", "bottom_depth_m", "contaminant", "concentration_mg_per_kg", "non_detect",
            "detection_limit_mg_per_kg");

    private static final List<String> OPTIONAL = List.of("ground_elevation_m", "non_detect", "detection_limit_mg_per_kg");

    /** Two readings of one location's coordinates further apart than this (m) are a conflict. */
    static final double COORDINATE_TOLERANCE_METRES = 0.01;

    private SampleCsvImport() {
    }

    /**
     * Reads a sample file.
     *
     * @param reader the file's text (read to its end, closed)
     * @param fileName the name to show in the report
     * @param project the project whose contaminants the rows name
     * @return the locations read and the rows rejected
     * @throws IOException when the reader fails
     */
    public static ImportReport read(Reader reader, String fileName, Project project) throws IOException {
        Objects.requireNonNull(reader, "reader");
        Objects.requireNonNull(project, "project");
        BufferedReader buffered = new BufferedReader(reader);
        buffered.mark(1 << 16);
        char delimiter = guessDelimiter(buffered);
        buffered.reset();
        CSVFormat format = CSVFormat.RFC4180.builder().setDelimiter(delimiter).setHeader().setSkipHeaderRecord(true)
                .setCommentMarker('#').setIgnoreEmptyLines(true).setTrim(true).setIgnoreHeaderCase(true)
                .setAllowMissingColumnNames(true).get();
        List<RejectedRow> rejected = new ArrayList<>();
        Map<String, SamplingLocation> locations = new LinkedHashMap<>();
        Map<String, Long> firstLine = new HashMap<>();
        int rows = 0;
        try (CSVParser parser = format.parse(buffered)) {
            Map<String, Integer> header = new HashMap<>();
            parser.getHeaderMap().forEach((k, v) -> header.put(k == null ? "" : k.trim().toLowerCase(Locale.ROOT), v));
            List<String> missing = new ArrayList<>();
            for (String column : COLUMNS) {
                if (!header.containsKey(column) && !OPTIONAL.contains(column)) {
                    missing.add(column);
                }
            }
            if (!missing.isEmpty()) {
                rejected.add(new RejectedRow(1, "the header lacks the column(s) " + String.join(", ", missing)
                        + "; expected " + String.join(",", COLUMNS) + "; nothing was imported"));
                return new ImportReport(fileName, List.of(), 0, rejected);
            }
            try {
                for (CSVRecord record : parser) {
                    rows++;
                    long line = parser.getCurrentLineNumber();
                    try {
                        readRow(record, header, project, locations, firstLine, line);
                    } catch (RowException e) {
                        rejected.add(new RejectedRow(line, e.getMessage()));
                    }
                }
            } catch (UncheckedIOException e) {
                rejected.add(new RejectedRow(parser.getCurrentLineNumber(), "the file is not valid CSV from here on ("
                        + e.getCause().getMessage() + "); the rest of the file was not read"));
            }
        } catch (IllegalArgumentException e) {
            rejected.add(new RejectedRow(1, "the header cannot be read (" + e.getMessage() + "); nothing was imported"));
            return new ImportReport(fileName, List.of(), 0, rejected);
        }
        return new ImportReport(fileName, new ArrayList<>(locations.values()), rows, rejected);
    }

    /**
     * Adds imported locations to a site: samples of a location whose name the site already has are
     * added to it, other locations are added whole.
     */
    public static void addTo(Site site, ImportReport report) {
        for (SamplingLocation imported : report.locations()) {
            SamplingLocation existing = site.getSamplingLocations().stream()
                    .filter(l -> imported.getName().equalsIgnoreCase(l.getName())).findFirst().orElse(null);
            if (existing == null) {
                site.getSamplingLocations().add(imported);
            } else {
                existing.getSamples().addAll(new ArrayList<>(imported.getSamples()));
            }
        }
    }

    private static char guessDelimiter(BufferedReader reader) throws IOException {
        String line;
        while ((line = reader.readLine()) != null) {
            if (!line.isBlank() && !line.startsWith("#")) {
                return line.indexOf(';') >= 0 && line.indexOf(',') < 0 ? ';' : ',';
            }
        }
        return ',';
    }

    private static final class RowException extends Exception {
        private static final long serialVersionUID = 1L;

        RowException(String message) {
            super(message);
        }
    }

    private static void readRow(CSVRecord record, Map<String, Integer> header, Project project,
            Map<String, SamplingLocation> locations, Map<String, Long> firstLine, long line) throws RowException {
        String name = text(record, header, "location");
        if (name.isEmpty()) {
            throw new RowException("location is empty; give the boring or test pit name");
        }
        double easting = number(record, header, "easting_m", false);
        double northing = number(record, header, "northing_m", false);
        String elevationText = text(record, header, "ground_elevation_m");
        double elevation = elevationText.isEmpty() && project.getSite() != null
                ? project.getSite().getGroundSurfaceElevationMetres()
                : number(record, header, "ground_elevation_m", false);
        double top = number(record, header, "top_depth_m", false);
        double bottom = number(record, header, "bottom_depth_m", false);
        if (top < 0) {
            throw new RowException("top_depth_m = " + top + ": allowed 0 or more (depth below ground, positive downwards)");
        }
        if (bottom < top) {
            throw new RowException("bottom_depth_m = " + bottom + ": allowed at least top_depth_m = " + top);
        }
        String contaminantText = text(record, header, "contaminant");
        Contaminant contaminant = findContaminant(project, contaminantText);
        if (contaminant == null) {
            throw new RowException("contaminant = '" + contaminantText + "' is not a contaminant of the project; allowed "
                    + project.getContaminants().stream().map(Contaminant::getName).toList()
                    + " (by name or CAS number); add it to the project first");
        }
        String concentrationText = text(record, header, "concentration_mg_per_kg");
        boolean lessThan = concentrationText.startsWith("<");
        double concentration = lessThan ? parse(concentrationText.substring(1).trim(), "concentration_mg_per_kg")
                : number(record, header, "concentration_mg_per_kg", false);
        if (concentration < 0) {
            throw new RowException("concentration_mg_per_kg = " + concentration + ": allowed 0 or more mg/kg");
        }
        boolean nonDetect = lessThan || flag(text(record, header, "non_detect"));
        String limitText = text(record, header, "detection_limit_mg_per_kg");
        double limit = limitText.isEmpty() ? (lessThan ? concentration : 0.0) : number(record, header, "detection_limit_mg_per_kg", false);
        if (nonDetect && !(limit > 0)) {
            throw new RowException("detection_limit_mg_per_kg = '" + limitText + "' for a non-detect: allowed a number above 0 mg/kg; "
                    + "give the laboratory's reporting limit");
        }
        if (limit < 0) {
            throw new RowException("detection_limit_mg_per_kg = " + limit + ": allowed 0 or more mg/kg");
        }
        String key = name.toLowerCase(Locale.ROOT);
        SamplingLocation location = locations.get(key);
        if (location == null) {
            location = SiteFactory.eINSTANCE.createSamplingLocation();
            location.setName(name);
            location.setEastingMetres(easting);
            location.setNorthingMetres(northing);
            location.setGroundElevationMetres(elevation);
            locations.put(key, location);
            firstLine.put(key, line);
        } else if (Math.hypot(location.getEastingMetres() - easting, location.getNorthingMetres() - northing) > COORDINATE_TOLERANCE_METRES) {
            throw new RowException("location '" + name + "' is at (" + easting + ", " + northing + ") here but at ("
                    + location.getEastingMetres() + ", " + location.getNorthingMetres() + ") on line " + firstLine.get(key)
                    + "; correct the coordinates or rename one of the locations");
        }
        Sample sample = SiteFactory.eINSTANCE.createSample();
        sample.setTopDepthMetres(top);
        sample.setBottomDepthMetres(bottom);
        sample.setContaminant(contaminant);
        sample.setConcentrationMilligramsPerKg(concentration);
        sample.setNonDetect(nonDetect);
        sample.setDetectionLimitMilligramsPerKg(limit);
        location.getSamples().add(sample);
    }

    private static Contaminant findContaminant(Project project, String text) {
        for (Contaminant c : project.getContaminants()) {
            if (text.equalsIgnoreCase(c.getName()) || (c.getCasNumber() != null && !c.getCasNumber().isBlank()
                    && text.equals(c.getCasNumber().trim()))) {
                return c;
            }
        }
        return null;
    }

    private static String text(CSVRecord record, Map<String, Integer> header, String column) throws RowException {
        Integer index = header.get(column);
        if (index == null) {
            return "";
        }
        if (index >= record.size()) {
            throw new RowException("the row has " + record.size() + " columns, the header " + header.size()
                    + "; column " + column + " is missing");
        }
        return record.get(index).trim();
    }

    private static double number(CSVRecord record, Map<String, Integer> header, String column, boolean optional)
            throws RowException {
        String text = text(record, header, column);
        if (text.isEmpty()) {
            if (optional) {
                return 0.0;
            }
            throw new RowException(column + " is empty; a number is needed");
        }
        return parse(text, column);
    }

    private static double parse(String text, String column) throws RowException {
        double value;
        try {
            value = Double.parseDouble(text);
        } catch (NumberFormatException e) {
            String hint = text.matches("-?\\d+,\\d+") ? " (use a point as decimal separator: " + text.replace(',', '.') + ")" : "";
            throw new RowException(column + " = '" + text + "' is not a number" + hint);
        }
        if (!Double.isFinite(value)) {
            throw new RowException(column + " = '" + text + "': allowed a finite number");
        }
        return value;
    }

    private static boolean flag(String text) throws RowException {
        switch (text.toLowerCase(Locale.ROOT)) {
            case "", "false", "no", "n", "0":
                return false;
            case "true", "yes", "y", "1", "nd":
                return true;
            default:
                throw new RowException("non_detect = '" + text + "': allowed true/false, yes/no, 1/0, ND or empty");
        }
    }
}
