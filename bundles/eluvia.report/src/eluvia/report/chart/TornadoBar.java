package eluvia.report.chart;

/**
 * One uncertain input of a {@link Tornado}: the result when the input is at its low and at its high
 * value, the others at base. Results are in the unit of the tornado's result axis.
 *
 * @param input          the input, e.g. "Retardation factor"
 * @param lowInputLabel  the low value of the input as text with its unit, e.g. "1.4"
 * @param highInputLabel the high value as text, e.g. "2.6"
 * @param resultAtLow    the result with the input low
 * @param resultAtHigh   the result with the input high
 */
public record TornadoBar(String input, String lowInputLabel, String highInputLabel, double resultAtLow,
        double resultAtHigh) {

    public TornadoBar {
        ChartDataException.requireText("tornado input", input);
        ChartDataException.requireText("low value of tornado input \"" + input + "\"", lowInputLabel);
        ChartDataException.requireText("high value of tornado input \"" + input + "\"", highInputLabel);
        ChartDataException.finite("result at low \"" + input + "\"", resultAtLow);
        ChartDataException.finite("result at high \"" + input + "\"", resultAtHigh);
    }

    /** |result at high - result at low|, in the unit of the result. */
    public double swing() {
        return Math.abs(resultAtHigh - resultAtLow);
    }
}
