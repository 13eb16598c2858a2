package eluvia.design;

import java.util.List;
import java.util.Map;
import java.util.Optional;

import eluvia.transport.CleanupCriterion;
import eluvia.transport.FlushingEstimate;
import eluvia.transport.PoreVolumeResult;

/**
 * Flushing results of one contaminant in one design: pore volumes, duration and water volume for
 * each of the three cleanup criteria by the equilibrium finite-layer solution ({@link #estimates}),
 * and the pore volumes by every other solution the pipeline ran ({@link #methods}), with the one
 * the design's solution method chose ({@link #governingMethod}).
 *
 * @param contaminantName the contaminant
 * @param initialSoilMilligramsPerKg representative initial soil concentration in the zone, mg/kg
 * @param cleanupLevelMilligramsPerKg soil cleanup level, mg/kg
 * @param targetFraction cleanup level over initial concentration (dimensionless)
 * @param kdLitresPerKg the distribution coefficient used, L/kg (of the combined layer)
 * @param kdBasis where Kd came from ("entered" or "Koc x foc = ...")
 * @param decayPerDay first-order decay rate used, 1/d (0 = none)
 * @param estimates equilibrium finite-layer estimate per criterion (with the well-mixed and plug-flow figures)
 * @param governingMethod the solution that sets the design's pore volumes for this contaminant
 * @param methods every solution computed (equilibrium, well-mixed, two-region, numerical), available or not
 * @param twoRegion the two-region parameters and rebound, or null when the contaminant has none
 * @param numerical what the numerical run did, or null when it did not run
 */
public record ContaminantFlushing(String contaminantName, double initialSoilMilligramsPerKg,
        double cleanupLevelMilligramsPerKg, double targetFraction, double kdLitresPerKg, String kdBasis,
        double decayPerDay, Map<CleanupCriterion, FlushingEstimate> estimates, FlushingMethod governingMethod,
        List<MethodEstimate> methods, TwoRegionDetail twoRegion, NumericalDetail numerical) {

    /** Copies the collections. */
    public ContaminantFlushing {
        estimates = Map.copyOf(estimates);
        methods = List.copyOf(methods);
    }

    /** The equilibrium finite-layer estimate for one criterion. */
    public FlushingEstimate estimate(CleanupCriterion criterion) {
        return estimates.get(criterion);
    }

    /** The result of one solution, when it was computed (available or not). */
    public Optional<MethodEstimate> method(FlushingMethod method) {
        return methods.stream().filter(m -> m.method() == method).findFirst();
    }

    /** The governing solution's result. */
    public MethodEstimate governing() {
        return method(governingMethod).orElseThrow();
    }

    /**
     * The governing solution's pore-volume search for one criterion, or null when that solution is
     * not available for this contaminant.
     */
    public PoreVolumeResult governingResult(CleanupCriterion criterion) {
        return governing().result(criterion);
    }
}
