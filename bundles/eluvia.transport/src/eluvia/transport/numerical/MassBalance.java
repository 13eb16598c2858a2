package eluvia.transport.numerical;

/**
 * Solute bookkeeping of one numerical run, all amounts in mg per m<sup>2</sup> of plan area.
 *
 * <p>The amounts are the scheme's own discrete fluxes: with the second-order backward
 * differentiation formula the amount booked in a step is the step's flux times the step length
 * combined with the previous step's amount, exactly as the scheme changes the stored mass. The
 * balance therefore closes to round-off (and the Newton tolerance for nonlinear sorption); the
 * booked amounts differ from the plain time integrals of the boundary fluxes by the time
 * discretisation error.
 *
 * @param initialStoredMilligramsPerSquareMetre solute in the profile at the start (water and solids)
 * @param inflowMilligramsPerSquareMetre solute carried in with the applied water
 * @param outflowMilligramsPerSquareMetre solute carried out at the bottom (the effluent)
 * @param decayedMilligramsPerSquareMetre solute lost to first-order decay
 * @param finalStoredMilligramsPerSquareMetre solute in the profile at the end
 */
public record MassBalance(double initialStoredMilligramsPerSquareMetre, double inflowMilligramsPerSquareMetre,
        double outflowMilligramsPerSquareMetre, double decayedMilligramsPerSquareMetre,
        double finalStoredMilligramsPerSquareMetre) {

    /** initial + in - out - decayed - final, mg/m2 (0 for a perfect balance). */
    public double discrepancyMilligramsPerSquareMetre() {
        return initialStoredMilligramsPerSquareMetre + inflowMilligramsPerSquareMetre
                - outflowMilligramsPerSquareMetre - decayedMilligramsPerSquareMetre
                - finalStoredMilligramsPerSquareMetre;
    }

    /**
     * The discrepancy over the larger of (initial + in) and (out + decayed + final), dimensionless;
     * 0 when no solute was ever present.
     */
    public double relativeError() {
        double scale = Math.max(initialStoredMilligramsPerSquareMetre + inflowMilligramsPerSquareMetre,
                outflowMilligramsPerSquareMetre + decayedMilligramsPerSquareMetre + finalStoredMilligramsPerSquareMetre);
        return scale > 0 ? discrepancyMilligramsPerSquareMetre() / scale : 0;
    }
}
