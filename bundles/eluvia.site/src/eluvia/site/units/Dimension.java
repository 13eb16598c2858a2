package eluvia.site.units;

/**
 * The kinds of quantity the user sees in more than one unit, each with the unit it is stored in
 * (the project's storage units: SI, with time in days for fluxes and flows as engineers quote them).
 */
public enum Dimension {
    /** Stored in metres. */
    LENGTH("m"),
    /** Stored in square metres. */
    AREA("m2"),
    /** Stored in cubic metres. */
    VOLUME("m3"),
    /** Stored in kilograms. */
    MASS("kg"),
    /** Stored in kilograms per cubic metre. */
    DENSITY("kg/m3"),
    /** Darcy flux, conductivity, velocity: stored in metres per day. */
    VELOCITY("m/d"),
    /** Volumetric flow rate: stored in cubic metres per day. */
    FLOW_RATE("m3/d");

    private final String storageSymbol;

    Dimension(String storageSymbol) {
        this.storageSymbol = storageSymbol;
    }

    /** Symbol of the storage unit, e.g. {@code m3}. */
    public String storageSymbol() {
        return storageSymbol;
    }
}
