package eluvia.report.document;

/**
 * One piece of content inside a {@link Section}: a paragraph, a list, a table, a figure, a caution,
 * a row of key figures, a sign-off block or a page-break hint. Every renderer handles every kind.
 */
public sealed interface Block permits Paragraph, BulletList, Table, Figure, Caution, KeyFigures, SignOffBlock, PageBreak {
}
