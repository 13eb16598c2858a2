package eluvia.report.chart;

/**
 * An axis of a chart: what it measures and in which unit. The unit is printed in brackets after
 * the label ("Depth below ground (m)") and heads the matching CSV column.
 *
 * @param label what the axis measures
 * @param unit  its unit; {@link #DIMENSIONLESS} ("-") for a dimensionless quantity
 */
public record Axis(String label, String unit) {

    /** The unit text of a dimensionless quantity. */
    public static final String DIMENSIONLESS = "-";

    public Axis {
        ChartDataException.requireText("axis label", label);
        ChartDataException.requireText("unit of axis \"" + label + "\"", unit);
    }

    /** An axis of a dimensionless quantity (pore volumes, a fraction, a count). */
    public static Axis dimensionless(String label) {
        return new Axis(label, DIMENSIONLESS);
    }

    /** The label with its unit, e.g. "Pore volumes (-)". */
    public String title() {
        return label + " (" + unit + ")";
    }
}
