package eluvia.design;

import eluvia.transport.ReboundEstimate;

/**
 * The two-region (or two-site) parameters used for a contaminant and the rebound if flushing
 * stops as soon as the effluent first meets the target (eluvia.transport.ReboundEstimate).
 *
 * @param beta fraction of the retardation in equilibrium with the flowing water (dimensionless, (0, 1])
 * @param omega dimensionless mass-transfer coefficient (0 or more)
 * @param basis how beta and omega were obtained (entered, or from physical or chemical inputs, with the formula)
 * @param rebound the rebound estimate
 */
public record TwoRegionDetail(double beta, double omega, String basis, ReboundEstimate rebound) {
}
