/**
 * The PDF rendering of a design-package {@link eluvia.report.document.Document} with OpenPDF: A4,
 * cover page with the sign-off block, running header and footer with page numbers, tables that
 * split across pages with repeated headers, charts as vector graphics, bookmarks for the headings.
 */
package eluvia.report.pdf;
