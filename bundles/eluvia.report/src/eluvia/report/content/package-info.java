/**
 * The content of a design package built from a design run: the inputs exactly as used
 * ({@link eluvia.report.content.InputTables}), the methods with their published sources
 * ({@link eluvia.report.content.Methods}) and the chart data of the results
 * ({@link eluvia.report.content.ResultFigures}).
 */
package eluvia.report.content;
