package eluvia.transport.numerical;

import java.util.Objects;

import eluvia.transport.TransportInputException;

/**
 * Numerical settings of {@link NumericalFlushingSolver}: grid, time steps and iteration
 * tolerances. Time steps are given in pore volumes (dimensionless) so that one set of settings
 * suits slow and fast flushing alike; the solver converts them to days.
 *
 * <p>Time steps are adaptive between {@link #minimumStepPoreVolumes()} and
 * {@link #maximumStepPoreVolumes()}: after every step the local error of the second-order
 * backward differentiation formula (BDF2) is estimated from the difference to a quadratic
 * extrapolation of the last three states (a Milne-type estimate, error ~ (2/11) times that
 * difference), and the step is rejected and retried when the error exceeds
 * {@link #stepTolerance()} times (|C| + the larger of the concentration floor and 1 % of the
 * highest concentration in the profile) in any cell. Setting the minimum, initial and maximum
 * step equal gives fixed steps.
 *
 * <p>Accuracy of the defaults, measured against the exact finite-layer series: pore volumes to
 * target within 2e-4 to 8e-4 (relative) for layer Peclet numbers 1 to 100 and targets 0.01 to
 * 1e-4. The tolerance bounds each step's local error; the errors of the many small early steps
 * (the inlet front) are damped by the scheme, so the accuracy at the target is mostly set by the
 * later, larger steps. For that reason fixed steps are often as accurate for fewer steps (0.01
 * pore volumes gave 5e-5 at Peclet 10), and the maximum step is worth lowering when high
 * accuracy is wanted.
 */
public final class SolverSettings {
    private final int minimumCellsPerLayer;
    private final double maximumCellSizeMetres;
    private final int maximumCellCount;
    private final AdvectionScheme advectionScheme;
    private final double maximumCellPeclet;
    private final double initialStepPoreVolumes;
    private final double minimumStepPoreVolumes;
    private final double maximumStepPoreVolumes;
    private final double stepTolerance;
    private final double concentrationFloorFraction;
    private final double newtonRelativeTolerance;
    private final int maximumNewtonIterations;

    private SolverSettings(Builder b) {
        if (b.minimumCellsPerLayer < 1 || b.minimumCellsPerLayer > 1_000_000) {
            throw new TransportInputException("minimum cells per layer", b.minimumCellsPerLayer, "1 to 1000000");
        }
        minimumCellsPerLayer = b.minimumCellsPerLayer;
        if (!(b.maximumCellSizeMetres > 0)) {
            throw new TransportInputException("maximum cell size (m)", b.maximumCellSizeMetres,
                    "greater than 0 (infinity = no limit)");
        }
        maximumCellSizeMetres = b.maximumCellSizeMetres;
        if (b.maximumCellCount < 1 || b.maximumCellCount > 10_000_000) {
            throw new TransportInputException("maximum cell count", b.maximumCellCount, "1 to 10000000");
        }
        maximumCellCount = b.maximumCellCount;
        advectionScheme = Objects.requireNonNull(b.advectionScheme, "advection scheme");
        if (!(b.maximumCellPeclet > 0 && b.maximumCellPeclet <= 2)) {
            throw new TransportInputException("maximum cell Peclet number (dimensionless)", b.maximumCellPeclet,
                    "greater than 0 and at most 2 (above 2 the central scheme oscillates)");
        }
        maximumCellPeclet = b.maximumCellPeclet;
        minimumStepPoreVolumes = TransportInputException.requirePositive("minimum time step (pore volumes)",
                b.minimumStepPoreVolumes);
        if (!(b.maximumStepPoreVolumes >= minimumStepPoreVolumes) || Double.isInfinite(b.maximumStepPoreVolumes)) {
            throw new TransportInputException("maximum time step (pore volumes)", b.maximumStepPoreVolumes,
                    "finite and at least the minimum time step " + minimumStepPoreVolumes);
        }
        maximumStepPoreVolumes = b.maximumStepPoreVolumes;
        if (!(b.initialStepPoreVolumes >= minimumStepPoreVolumes && b.initialStepPoreVolumes <= maximumStepPoreVolumes)) {
            throw new TransportInputException("initial time step (pore volumes)", b.initialStepPoreVolumes,
                    "between the minimum " + minimumStepPoreVolumes + " and the maximum " + maximumStepPoreVolumes);
        }
        initialStepPoreVolumes = b.initialStepPoreVolumes;
        stepTolerance = TransportInputException.requireOpenInterval("time-step tolerance (dimensionless)",
                b.stepTolerance, 0, 1);
        concentrationFloorFraction = TransportInputException.requireOpenInterval(
                "concentration floor (fraction of the reference concentration)", b.concentrationFloorFraction, 0, 1);
        if (!(b.newtonRelativeTolerance >= 1e-14 && b.newtonRelativeTolerance < 1e-2)) {
            throw new TransportInputException("Newton relative tolerance (dimensionless)", b.newtonRelativeTolerance,
                    "1e-14 to 1e-2");
        }
        newtonRelativeTolerance = b.newtonRelativeTolerance;
        if (b.maximumNewtonIterations < 1 || b.maximumNewtonIterations > 1000) {
            throw new TransportInputException("maximum Newton iterations per step", b.maximumNewtonIterations, "1 to 1000");
        }
        maximumNewtonIterations = b.maximumNewtonIterations;
    }

    /** The defaults (see the builder's methods for each value). */
    public static SolverSettings defaults() {
        return builder().build();
    }

    /** A builder starting from the defaults. */
    public static Builder builder() {
        return new Builder();
    }

    /** A builder starting from these settings. */
    public Builder toBuilder() {
        Builder b = new Builder();
        b.minimumCellsPerLayer = minimumCellsPerLayer;
        b.maximumCellSizeMetres = maximumCellSizeMetres;
        b.maximumCellCount = maximumCellCount;
        b.advectionScheme = advectionScheme;
        b.maximumCellPeclet = maximumCellPeclet;
        b.initialStepPoreVolumes = initialStepPoreVolumes;
        b.minimumStepPoreVolumes = minimumStepPoreVolumes;
        b.maximumStepPoreVolumes = maximumStepPoreVolumes;
        b.stepTolerance = stepTolerance;
        b.concentrationFloorFraction = concentrationFloorFraction;
        b.newtonRelativeTolerance = newtonRelativeTolerance;
        b.maximumNewtonIterations = maximumNewtonIterations;
        return b;
    }

    /** Fewest cells in any layer. */
    public int minimumCellsPerLayer() {
        return minimumCellsPerLayer;
    }

    /** Largest cell size, m (infinity = no limit). */
    public double maximumCellSizeMetres() {
        return maximumCellSizeMetres;
    }

    /** Most cells the solver may use in the whole profile. */
    public int maximumCellCount() {
        return maximumCellCount;
    }

    /** Advection scheme. */
    public AdvectionScheme advectionScheme() {
        return advectionScheme;
    }

    /**
     * Largest cell Peclet number q dz / (theta_m D_m) (dimensionless) the grid is refined to,
     * within the cell limit; the central scheme needs at most 2 to stay free of wiggles, and the
     * default 0.25 keeps the grid error of a Peclet-100 layer near 0.1 % in pore volumes to 1e-4.
     */
    public double maximumCellPeclet() {
        return maximumCellPeclet;
    }

    /** First time step, pore volumes (dimensionless). */
    public double initialStepPoreVolumes() {
        return initialStepPoreVolumes;
    }

    /** Smallest time step, pore volumes (dimensionless). */
    public double minimumStepPoreVolumes() {
        return minimumStepPoreVolumes;
    }

    /** Largest time step, pore volumes (dimensionless). */
    public double maximumStepPoreVolumes() {
        return maximumStepPoreVolumes;
    }

    /** True when the three step settings are equal: fixed steps, no error control. */
    public boolean isFixedStep() {
        return minimumStepPoreVolumes == maximumStepPoreVolumes;
    }

    /** Local error allowed per step, relative to |C| plus the floor (dimensionless). */
    public double stepTolerance() {
        return stepTolerance;
    }

    /**
     * Concentration below which errors count as absolute, as a fraction of the reference
     * concentration (dimensionless); the solver lowers it to a tenth of the smallest target.
     */
    public double concentrationFloorFraction() {
        return concentrationFloorFraction;
    }

    /**
     * Newton stops when, in every cell, the stored mass its remaining error stands for is below
     * this times the cell's stored mass (plus 1e-12 of the mass at the reference concentration).
     */
    public double newtonRelativeTolerance() {
        return newtonRelativeTolerance;
    }

    /** Newton iterations allowed per step before the step is retried smaller. */
    public int maximumNewtonIterations() {
        return maximumNewtonIterations;
    }

    @Override
    public String toString() {
        return "SolverSettings[cells/layer >= " + minimumCellsPerLayer + ", dz <= " + maximumCellSizeMetres
                + " m, cells <= " + maximumCellCount + ", " + advectionScheme + ", cell Peclet <= " + maximumCellPeclet
                + ", steps " + minimumStepPoreVolumes
                + ".." + maximumStepPoreVolumes + " PV from " + initialStepPoreVolumes + ", tolerance "
                + stepTolerance + ", Newton " + newtonRelativeTolerance + "]";
    }

    /** Builder for {@link SolverSettings}; {@link #build()} checks every value. */
    public static final class Builder {
        private int minimumCellsPerLayer = 100;
        private double maximumCellSizeMetres = Double.POSITIVE_INFINITY;
        private int maximumCellCount = 20_000;
        private AdvectionScheme advectionScheme = AdvectionScheme.CENTRAL;
        private double maximumCellPeclet = 0.25;
        private double initialStepPoreVolumes = 1e-4;
        private double minimumStepPoreVolumes = 1e-9;
        private double maximumStepPoreVolumes = 0.05;
        private double stepTolerance = 1e-5;
        private double concentrationFloorFraction = 1e-6;
        private double newtonRelativeTolerance = 1e-9;
        private int maximumNewtonIterations = 60;

        private Builder() {
        }

        /** Fewest cells in any layer (default 100). */
        public Builder minimumCellsPerLayer(int value) {
            minimumCellsPerLayer = value;
            return this;
        }

        /** Largest cell size, m (default: no limit). */
        public Builder maximumCellSizeMetres(double value) {
            maximumCellSizeMetres = value;
            return this;
        }

        /** Most cells in the profile (default 20000). */
        public Builder maximumCellCount(int value) {
            maximumCellCount = value;
            return this;
        }

        /** Advection scheme (default {@link AdvectionScheme#CENTRAL}). */
        public Builder advectionScheme(AdvectionScheme value) {
            advectionScheme = value;
            return this;
        }

        /** Largest cell Peclet number the grid is refined to, in (0, 2] (default 0.25). */
        public Builder maximumCellPeclet(double value) {
            maximumCellPeclet = value;
            return this;
        }

        /** First time step in pore volumes (default 1e-4). */
        public Builder initialStepPoreVolumes(double value) {
            initialStepPoreVolumes = value;
            return this;
        }

        /** Smallest time step in pore volumes (default 1e-9). */
        public Builder minimumStepPoreVolumes(double value) {
            minimumStepPoreVolumes = value;
            return this;
        }

        /** Largest time step in pore volumes (default 0.05). */
        public Builder maximumStepPoreVolumes(double value) {
            maximumStepPoreVolumes = value;
            return this;
        }

        /** Fixed time steps of {@code poreVolumes} each: sets minimum, initial and maximum. */
        public Builder fixedStepPoreVolumes(double poreVolumes) {
            minimumStepPoreVolumes = poreVolumes;
            initialStepPoreVolumes = poreVolumes;
            maximumStepPoreVolumes = poreVolumes;
            return this;
        }

        /** Local error tolerance per step, relative (default 1e-5). */
        public Builder stepTolerance(double value) {
            stepTolerance = value;
            return this;
        }

        /** Concentration floor of the error test, fraction of the reference (default 1e-6). */
        public Builder concentrationFloorFraction(double value) {
            concentrationFloorFraction = value;
            return this;
        }

        /** Newton relative tolerance (default 1e-9). */
        public Builder newtonRelativeTolerance(double value) {
            newtonRelativeTolerance = value;
            return this;
        }

        /** Newton iterations per step (default 60). */
        public Builder maximumNewtonIterations(int value) {
            maximumNewtonIterations = value;
            return this;
        }

        /** Checks the values and makes the settings. */
        public SolverSettings build() {
            return new SolverSettings(this);
        }
    }
}
