/**
 * Charts of the design package from plain data records: line charts (residual fraction against
 * pore volumes, optionally on a logarithmic axis, with marker lines), depth profiles (depth
 * downward), histograms with percentile markers, tornado charts, stacked or grouped bar charts, plan
 * views to scale and vertical sections with a stated vertical exaggeration. Each record says its
 * axes with units and gives the numbers it shows as a {@link eluvia.report.chart.DataTable} for a
 * CSV file. {@link eluvia.report.chart.Charts} draws them with JFreeChart, off screen, in the
 * colours of {@link eluvia.report.chart.Palette}.
 */
package eluvia.report.chart;
