package eluvia.design;

import eluvia.transport.numerical.MassBalance;

/**
 * What the numerical run over the layered profile did: grid, steps, and its solute bookkeeping.
 *
 * @param layerCount soil layers of the profile (the site's layers clipped to the zone's depth interval)
 * @param cellCount cells of the grid
 * @param acceptedSteps accepted time steps
 * @param rejectedSteps rejected and retried time steps
 * @param stepTolerance local error tolerance per step (dimensionless; the design's numerical relative tolerance)
 * @param maximumCellSizeMetres largest cell allowed, m (zone thickness over the design's cell count)
 * @param massBalance solute bookkeeping, mg per m2 of plan area
 * @param isotherm the isotherm used, in words
 * @param nonequilibrium how nonequilibrium entered the layers, in words
 * @param spectralCheck the independent spectral-element solution of the same profile, or why there is none
 */
public record NumericalDetail(int layerCount, int cellCount, int acceptedSteps, int rejectedSteps, double stepTolerance,
        double maximumCellSizeMetres, MassBalance massBalance, String isotherm, String nonequilibrium,
        SpectralCheck spectralCheck) {

    /** The mass-balance error: discrepancy over the larger side of the balance (dimensionless). */
    public double massBalanceRelativeError() {
        return massBalance.relativeError();
    }
}
