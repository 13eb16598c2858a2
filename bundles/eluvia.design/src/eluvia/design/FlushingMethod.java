package eluvia.design;

/**
 * The flushing solutions the pipeline reports for a contaminant. The design's solution method
 * (site model {@code FlushingDesign.solutionMethod}) picks the one that sets pore volumes,
 * duration and water; the others are given beside it for comparison.
 */
public enum FlushingMethod {
    /**
     * Analytical equilibrium solution for the combined layer: flux inlet, zero-gradient outlet
     * (Brenner 1962, Chem. Eng. Sci. 17:229; initial-value form after van Genuchten and Alves 1982).
     */
    EQUILIBRIUM("equilibrium finite layer", "Brenner (1962); van Genuchten and Alves (1982)"),
    /**
     * Two-region / two-site nonequilibrium for the combined layer, exact in the Laplace domain
     * (van Genuchten and Wierenga 1976; Nkedi-Kizza et al. 1984; de Hoog, Knight and Stokes 1982).
     */
    TWO_REGION("two-region nonequilibrium", "van Genuchten and Wierenga (1976); Nkedi-Kizza et al. (1984)"),
    /**
     * Cell-centred finite volumes over the real layered profile of the zone, implicit in time, with
     * the contaminant's isotherm (eluvia.transport.numerical); its mass-balance error is reported.
     */
    NUMERICAL("numerical layered profile", "finite volumes (Patankar 1980), BDF2 time stepping"),
    /** Well-mixed ("batch flush") estimate T = -R ln(C/C0) (US EPA pump-and-treat guidance). */
    WELL_MIXED("well-mixed estimate", "US EPA pump-and-treat guidance; Zheng, Bennett and Andrews (1991)");

    private final String label;
    private final String source;

    FlushingMethod(String label, String source) {
        this.label = label;
        this.source = source;
    }

    /** Plain words for results. */
    public String label() {
        return label;
    }

    /** The published source, for results. */
    public String source() {
        return source;
    }

    /** A stable machine word for results files: equilibrium, two-region, numerical, well-mixed. */
    public String word() {
        return name().toLowerCase(java.util.Locale.ROOT).replace('_', '-');
    }
}
