package eluvia.report.document;

/** Horizontal alignment of a table column. Numbers are right-aligned so that their digits line up. */
public enum Alignment {
    LEFT, CENTRE, RIGHT
}
