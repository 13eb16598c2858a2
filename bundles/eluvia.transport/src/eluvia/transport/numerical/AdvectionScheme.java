package eluvia.transport.numerical;

/**
 * How the solver approximates the advective flux at a face between two cells.
 */
public enum AdvectionScheme {
    /**
     * Linear interpolation between the two cell centres: second order in space, and monotone as
     * long as the cell Peclet number q dz / (theta_m D_m) is at most 2. The grid is refined within
     * each layer until the cell Peclet number is at most {@link SolverSettings#maximumCellPeclet()}
     * (default 0.25, never above 2), up to the cell limit of the settings; any face where 2 is
     * still exceeded, for instance at a layer boundary between very different cells, falls back
     * to upwind.
     */
    CENTRAL,
    /**
     * The upstream cell's value: monotone at any cell Peclet number but first order, adding a
     * numerical dispersivity of about dz / 2 to the physical one.
     */
    UPWIND
}
