/**
 * The design package as a document model: plain records that say what a document contains
 * ({@link eluvia.report.document.Document} of {@link eluvia.report.document.Section}s of
 * {@link eluvia.report.document.Block}s), independent of how it is printed. The HTML writer
 * ({@code eluvia.report.html}) and the PDF writer ({@code eluvia.report.pdf}) render the same
 * document. Text is plain with simple emphasis; numbers in tables and key figures arrive formatted,
 * with their units in the column headers or beside the value. Bad content throws
 * {@link eluvia.report.document.ReportContentException} naming the item, the value and what is allowed.
 */
package eluvia.report.document;
