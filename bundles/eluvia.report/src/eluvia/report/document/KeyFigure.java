package eluvia.report.document;

/**
 * One headline number as a card: "Pore volumes to target | 14.2 | - | P10 to P90: 11.0 to 19.5".
 *
 * @param label what the number is
 * @param value the number, formatted by the caller
 * @param unit  its unit ({@link Column#DIMENSIONLESS} for a dimensionless number)
 * @param note  a short line under the number (a range, the criterion met), or null for none
 */
public record KeyFigure(String label, String value, String unit, String note) {

    public KeyFigure {
        ReportContentException.requireText("key figure label", label);
        ReportContentException.requireText("value of key figure \"" + label + "\"", value);
        ReportContentException.requireText("unit of key figure \"" + label + "\"", unit);
        ReportContentException.optionalText("note of key figure \"" + label + "\"", note);
    }

    /** The unit as printed after the value: empty for a dimensionless number. */
    public String printedUnit() {
        return Column.DIMENSIONLESS.equals(unit) ? "" : unit;
    }
}
