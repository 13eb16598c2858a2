package eluvia.site.sampling;

import java.util.List;

import eluvia.site.model.SamplingLocation;

/**
 * The result of reading a sample file: the locations with their samples, and every row that could
 * not be read with the reason.
 *
 * @param fileName the file's name as given
 * @param locations the sampling locations read, in the order first seen, not yet part of any site
 * @param rowsRead how many data rows the file had
 * @param rejected the rows not imported, in file order
 */
public record ImportReport(String fileName, List<SamplingLocation> locations, int rowsRead, List<RejectedRow> rejected) {

    public ImportReport {
        locations = List.copyOf(locations);
        rejected = List.copyOf(rejected);
    }

    /** Number of samples imported. */
    public int samplesImported() {
        return locations.stream().mapToInt(l -> l.getSamples().size()).sum();
    }

    /** A plain summary, then one line per rejected row. */
    public String summary() {
        StringBuilder b = new StringBuilder();
        b.append(fileName).append(": ").append(samplesImported()).append(" samples at ").append(locations.size())
                .append(" locations imported from ").append(rowsRead).append(" rows");
        if (!rejected.isEmpty()) {
            b.append("; ").append(rejected.size()).append(" rows not imported:");
            for (RejectedRow row : rejected) {
                b.append(System.lineSeparator()).append("  ").append(row.message());
            }
        }
        return b.toString();
    }
}
