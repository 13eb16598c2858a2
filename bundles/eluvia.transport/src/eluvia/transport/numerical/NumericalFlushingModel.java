package eluvia.transport.numerical;

import java.util.List;

import eluvia.transport.CleanupCriterion;
import eluvia.transport.FlushingModel;
import eluvia.transport.LayerFlushingInput;
import eluvia.transport.PoreVolumeResult;
import eluvia.transport.TransportInputException;

/**
 * The numerical solver seen as an {@link FlushingModel}, so that callers written for the
 * analytical models (a {@link eluvia.transport.PoreVolumeSearch}, a chart of remaining fraction
 * against pore volumes) can use it unchanged, for layered, nonlinear and two-region columns the
 * analytical models cannot describe.
 *
 * <p>The first call runs the solver once from the start up to the pore volumes asked for (at
 * least {@value #MINIMUM_RUN_PORE_VOLUMES}) and keeps the histories of the three criteria; a
 * later call beyond the stored run reruns it to twice the length or more. Between two stored
 * time steps the criterion is interpolated by a quadratic in its logarithm through three
 * neighbouring steps (linear where a value is not positive), an error of third order in the step,
 * below the scheme's own second-order error. Fractions are those of {@link FlushingRunRequest},
 * kept within [0, 1] as the interface promises (a column fed contaminated water could otherwise
 * exceed 1).
 * {@link #poreVolumesToTarget} answers directly from the solver's own crossing detection.
 *
 * <p>Thread-safe: the runs are made under this object's lock and the stored histories are never
 * changed once published.
 */
public final class NumericalFlushingModel implements FlushingModel {
    /** Shortest run made, pore volumes (dimensionless). */
    public static final double MINIMUM_RUN_PORE_VOLUMES = 10;

    private final FlushingColumn column;
    private final SolverSettings settings;
    private volatile FlushingRunResult stored;

    /**
     * @param column the column; its inflow should be clean for the fractions to mean "remaining"
     * @param settings the solver settings
     */
    public NumericalFlushingModel(FlushingColumn column, SolverSettings settings) {
        // builds the grid once to check the inputs at construction
        new NumericalFlushingSolver(column, settings);
        this.column = column;
        this.settings = settings;
    }

    /**
     * A single equilibrium layer from the screening input, initially at 1 mg/L in pore water and
     * flushed with clean water: the numerical counterpart of the finite-layer model. Decay acts on
     * dissolved and sorbed contaminant alike, as in {@link LayerFlushingInput}.
     */
    public static NumericalFlushingModel of(LayerFlushingInput input, SolverSettings settings) {
        if (input == null) {
            throw new TransportInputException("layer flushing input", null, "an input");
        }
        SoilLayer layer = SoilLayer.builder().thicknessMetres(input.thicknessMetres()).waterContent(input.waterContent())
                .porosity(input.porosity()).bulkDensityKilogramsPerCubicMetre(input.bulkDensityKgPerCubicMetre())
                .isotherm(SorptionIsotherm.linear(input.kdLitresPerKg())).dispersivityMetres(input.dispersivityMetres())
                .freeWaterDiffusionSquareMetresPerSecond(input.diffusionSquareMetresPerSecond())
                .decayInWaterPerDay(input.decayPerDay()).decayOnSolidsPerDay(input.decayPerDay()).build();
        return new NumericalFlushingModel(new FlushingColumn(List.of(layer), input.darcyFluxMetresPerDay(), 0,
                InitialCondition.poreWaterPerLayer(1)), settings);
    }

    /** The column. */
    public FlushingColumn column() {
        return column;
    }

    @Override
    public String name() {
        return "numerical";
    }

    @Override
    public String description() {
        return "numerical finite-volume solution (cell-centred, implicit BDF2 in time, " + column.layers().size()
                + " layer(s), " + settings.advectionScheme().name().toLowerCase(java.util.Locale.ROOT)
                + " advection, flux inlet, zero-gradient outlet)";
    }

    @Override
    public double remainingFraction(CleanupCriterion criterion, double poreVolumes) {
        if (criterion == null) {
            throw new TransportInputException("cleanup criterion", null, "one of effluent, mean, max");
        }
        TransportInputException.requireNonNegative("pore volumes (dimensionless)", poreVolumes);
        FlushingRunResult r = covering(poreVolumes);
        double[] pv = r.poreVolumes();
        double[] v = values(r, criterion);
        return Math.min(1, Math.max(0, interpolate(pv, v, poreVolumes)));
    }

    @Override
    public double poreVolumeGuess(CleanupCriterion criterion, double targetFraction) {
        FlushingRunResult r = stored;
        if (r != null) {
            double[] pv = r.poreVolumes();
            double[] v = values(r, criterion);
            for (int i = v.length - 1; i > 0; i--) {
                if (v[i - 1] > targetFraction && v[i] <= targetFraction) {
                    return pv[i];
                }
            }
        }
        return 1;
    }

    /**
     * Pore volumes to target from one run with the solver's own crossing detection; the
     * result's evaluation count is the number of accepted time steps.
     *
     * @param targetFraction target fraction (dimensionless), between 0 and 1, both excluded
     * @param maxPoreVolumes run length, pore volumes (dimensionless)
     */
    public PoreVolumeResult poreVolumesToTarget(CleanupCriterion criterion, double targetFraction, double maxPoreVolumes) {
        FlushingRunResult r = new NumericalFlushingSolver(column, settings)
                .run(FlushingRunRequest.upToPoreVolumes(maxPoreVolumes).target(criterion, targetFraction).build());
        TargetOutcome o = r.outcome(criterion);
        return new PoreVolumeResult(criterion, targetFraction, o.reached(), o.poreVolumes(),
                o.reached() ? targetFraction : o.finalFraction(), maxPoreVolumes, r.acceptedSteps());
    }

    private FlushingRunResult covering(double poreVolumes) {
        FlushingRunResult r = stored;
        if (r != null && r.finalPoreVolumes() >= poreVolumes * (1 - 1e-12)) {
            return r;
        }
        synchronized (this) {
            r = stored;
            if (r != null && r.finalPoreVolumes() >= poreVolumes * (1 - 1e-12)) {
                return r;
            }
            double length = Math.max(MINIMUM_RUN_PORE_VOLUMES, poreVolumes);
            if (r != null) {
                length = Math.max(length, 2 * r.finalPoreVolumes());
            }
            length = Math.min(length, FlushingRunRequest.MAXIMUM_PORE_VOLUMES);
            if (length < poreVolumes) {
                throw new TransportInputException("pore volumes (dimensionless)", poreVolumes,
                        "at most " + FlushingRunRequest.MAXIMUM_PORE_VOLUMES + " for the numerical model");
            }
            r = new NumericalFlushingSolver(column, settings).run(FlushingRunRequest.upToPoreVolumes(length).build());
            stored = r;
            return r;
        }
    }

    private static double[] values(FlushingRunResult r, CleanupCriterion criterion) {
        switch (criterion) {
            case EFFLUENT: {
                double[] eff = r.effluentMilligramsPerLitre();
                double ref = r.initialPoreWaterMilligramsPerLitre();
                double scale = ref > 0 ? 1 / ref : 1;
                for (int i = 0; i < eff.length; i++) {
                    eff[i] *= scale;
                }
                return eff;
            }
            case MEAN_RESIDUAL:
                return r.meanResidualFraction();
            default:
                return r.maxResidualFraction();
        }
    }

    /** Value at x from samples (xs ascending): quadratic in log through three points, else linear. */
    static double interpolate(double[] xs, double[] ys, double x) {
        int n = xs.length;
        if (x <= xs[0]) {
            return ys[0];
        }
        if (x >= xs[n - 1]) {
            return ys[n - 1];
        }
        int lo = 0;
        int hi = n - 1;
        while (hi - lo > 1) {
            int mid = (lo + hi) >>> 1;
            if (xs[mid] <= x) {
                lo = mid;
            } else {
                hi = mid;
            }
        }
        if (n >= 3) {
            int a = lo == 0 ? 0 : lo - 1;
            if (a + 2 >= n) {
                a = n - 3;
            }
            double y0 = ys[a];
            double y1 = ys[a + 1];
            double y2 = ys[a + 2];
            if (y0 > 0 && y1 > 0 && y2 > 0) {
                double x0 = xs[a];
                double x1 = xs[a + 1];
                double x2 = xs[a + 2];
                double l = Math.log(y0) * (x - x1) * (x - x2) / ((x0 - x1) * (x0 - x2))
                        + Math.log(y1) * (x - x0) * (x - x2) / ((x1 - x0) * (x1 - x2))
                        + Math.log(y2) * (x - x0) * (x - x1) / ((x2 - x0) * (x2 - x1));
                return Math.exp(l);
            }
        }
        double w = (x - xs[lo]) / (xs[hi] - xs[lo]);
        return ys[lo] + w * (ys[hi] - ys[lo]);
    }
}
