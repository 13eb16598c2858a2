package eluvia.report.document;

import eluvia.report.chart.Axis;
import eluvia.report.chart.LineChart;
import eluvia.report.chart.XySeries;

/** A small chart for figures in model tests (invented numbers). */
final class TestCharts {

    private TestCharts() {
    }

    static LineChart line() {
        return LineChart.of(Axis.dimensionless("Pore volumes"), Axis.dimensionless("Residual fraction"), false,
                new XySeries("invented", new double[] { 0, 1, 2 }, new double[] { 1, 0.5, 0.25 }));
    }
}
