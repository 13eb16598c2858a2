/**
 * The HTML rendering of a design-package {@link eluvia.report.document.Document}: one
 * self-contained page with its own style sheet, figures as PNG files beside it and the data of
 * every figure as a CSV file with units in the header.
 */
package eluvia.report.html;
