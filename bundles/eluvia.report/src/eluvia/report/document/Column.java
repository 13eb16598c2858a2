package eluvia.report.document;

/**
 * One column of a {@link Table}: its heading, the unit its cells are in and how they align.
 * Renderers print the unit in the header beneath the heading, so cells hold bare numbers.
 *
 * @param heading   the heading, e.g. "Pore volumes to target"
 * @param unit      the unit of the cells, e.g. "m\u00b3" or "-" for a dimensionless number; null
 *                  for a column of words (names, criteria) that has no unit
 * @param alignment how the cells align
 */
public record Column(String heading, String unit, Alignment alignment) {

    /** The unit text meaning "dimensionless". */
    public static final String DIMENSIONLESS = "-";

    public Column {
        ReportContentException.requireText("column heading", heading);
        ReportContentException.optionalText("unit of column \"" + heading + "\"", unit);
        ReportContentException.requireNonNull("alignment of column \"" + heading + "\"", alignment);
    }

    /** A left-aligned column of words without a unit. */
    public static Column text(String heading) {
        return new Column(heading, null, Alignment.LEFT);
    }

    /** A right-aligned column of numbers in {@code unit} ({@link #DIMENSIONLESS} for none). */
    public static Column number(String heading, String unit) {
        return new Column(heading, ReportContentException.requireText("unit of column \"" + heading + "\"", unit),
                Alignment.RIGHT);
    }

    /** The heading with the unit in brackets, e.g. "Bank volume (m\u00b3)"; the heading alone if there is no unit. */
    public String headingWithUnit() {
        return unit == null ? heading : heading + " (" + unit + ")";
    }
}
