package eluvia.site.validation;

/** How serious a validation problem is. */
public enum Severity {
    /** The project cannot be computed until this is corrected. */
    ERROR,
    /** Unusual but possible; the engineer should check it. */
    WARNING
}
