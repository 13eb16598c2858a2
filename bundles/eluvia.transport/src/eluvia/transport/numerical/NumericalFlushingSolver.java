package eluvia.transport.numerical;

import java.util.ArrayList;
import java.util.EnumMap;
import java.util.List;
import java.util.Map;

import eluvia.transport.CleanupCriterion;
import eluvia.transport.TransportInputException;

/**
 * Numerical solution of one-dimensional vertical flushing of a layered soil profile: advection,
 * dispersion, equilibrium or two-region sorption (linear, Freundlich or Langmuir) and first-order
 * decay.
 *
 * <p><b>Method.</b> Cell-centred finite volumes, each layer divided into cells of equal size
 * (refined where needed so that the cell Peclet number stays at or below 2, see
 * {@link AdvectionScheme}). Dispersive face conductances are harmonic means of the two cells'
 * theta_m D_m over their half-widths, so layer boundaries conserve flux. The top face carries the
 * flux (third-type) condition q C_in; the bottom face carries q C of the last cell (zero
 * gradient), which is also the flux-averaged effluent concentration. Time stepping is implicit,
 * with the variable-step second-order backward differentiation formula (BDF2, expected global
 * order 2 in time; the first step, and any step more than twice the one before, is backward
 * Euler) applied to the conserved quantity, the solute per bulk volume; with the central scheme
 * the expected order in space is 2 too, with upwind 1. Each step solves one tridiagonal system by
 * the Thomas algorithm; the immobile region of a two-region layer is eliminated cell by cell
 * before the solve (static condensation), so it costs no extra system. With linear sorption a
 * step is a single solve, and the factorisation is reused while the step length does not change.
 * With nonlinear sorption each step iterates Newton's method with the exact Jacobian, from the
 * linear extrapolation of the last two states, until the stored mass that the remaining error
 * stands for (dM/dC times the update, or times the update times theta / (1 - theta), theta the
 * observed contraction rate) is below the relative tolerance of the settings (default 1e-9) times
 * the cell's stored mass plus 1e-12 times the mass stored at the reference concentration, in every
 * cell. Freundlich slopes are taken no lower than the concentration C_ref 1e-12^(1/n), where the
 * sorbed amount is below that absolute tolerance; this keeps the Jacobian finite at C = 0.
 * Typically two iterations a step.
 *
 * <p><b>Units.</b> Concentrations in mg/L (water) and mg/kg (soil), depths in m, times in days,
 * masses in mg per m<sup>2</sup> of plan area.
 *
 * <p><b>Use.</b> Build a solver once per column and settings (the grid and all work arrays are
 * made here, so a run allocates nothing per step except the growing history), then call
 * {@link #run}. A solver is not thread-safe; use one per thread.
 *
 * <p>Sources: finite volumes for advection-dispersion (Patankar 1980, Numerical Heat Transfer and
 * Fluid Flow); BDF2 with variable steps and its error estimate (Hairer, Norsett, Wanner 1993,
 * Solving Ordinary Differential Equations I); two-region transport (van Genuchten and Wierenga
 * 1976); tortuosity (Millington and Quirk 1961).
 */
public final class NumericalFlushingSolver {
    private static final int LINEAR = 0;
    private static final int FREUNDLICH = 1;
    private static final int LANGMUIR = 2;
    /** Litres per cubic metre: converts (mg/L) times m to mg/m2. */
    private static final double LITRES_PER_CUBIC_METRE = 1000.0;
    /** Absolute Newton floors, as fractions of the reference concentration and of the mass stored at it. */
    private static final double NEWTON_ABSOLUTE_FLOOR = 1e-12;
    /** Local error of BDF2 over the difference to the quadratic predictor (constant steps). */
    private static final double BDF2_ERROR_CONSTANT = 2.0 / 11.0;

    // Units of the per-cell arrays and fields below: q m/day; inflow and concentrations mg/L;
    // dz and depth m; thetaM, thetaIm water contents (dimensionless); rhoM, rhoIm, rhoB bulk
    // densities in kg/L (sites in the mobile region, in the immobile one, all); muW, muS, alpha
    // 1/day; stored amounts m, mim in mg per litre of bulk soil; lo, dg, up, src0 in 1/day
    // (times mg/L for src0), the transport operator per unit cell length.
    private final FlushingColumn column;
    private final SolverSettings settings;
    private final int n;
    private final double q;
    private final double inflow;

    private final double[] dz;
    private final double[] depth;
    private final int[] layerOfCell;
    private final double[] thetaM;
    private final double[] thetaIm;
    private final double[] rhoM;
    private final double[] rhoIm;
    private final double[] rhoB;
    private final double[] muW;
    private final double[] muS;
    private final double[] alpha;
    private final int[] kind;
    private final double[] p1;
    private final double[] p2;
    private final boolean allLinear;
    private final boolean anyImmobile;
    private final boolean[] immobile;
    /** Linear sorption only: storage and decay per unit concentration, mobile and immobile. */
    private final double[] capM;
    private final double[] capIm;
    private final double[] decM;
    private final double[] decIm;
    private final double[] invRhoB;
    private final double[] lo;
    private final double[] dg;
    private final double[] up;
    private final double src0;
    private final int upwindFaces;
    private final int refinement;

    private final double[] initialC;
    private final double initialMaxC;
    private final double referenceC;

    // Work arrays: states at n+1 (new), n, n-1, n-2 and the tridiagonal system.
    private double[] cNew;
    private double[] c;
    private double[] cPrev;
    private double[] cPrev2;
    private double[] cimNew;
    private double[] cim;
    private double[] mNew;
    private double[] m;
    private double[] mPrev;
    private double[] mimNew;
    private double[] mim;
    private double[] mimPrev;
    private final double[] histM;
    private final double[] histIm;
    private final double[] lower;
    private final double[] upper;
    private final double[] factorInv;
    private final double[] factorUp;
    private final double[] rhs;
    private final double[] imGain;
    private final double[] imInv;
    private final double[] resIm;
    private final double[] wc;
    private final double[] sc;
    private final double[] wci;
    private final double[] sci;
    private final double[] hd;
    private final double[] diagonal;
    /** Newton: stored-mass change per unit concentration change over the mass tolerance, per cell. */
    private final double[] invScale;
    private final double[] invScaleIm;
    /** Concentration (mg/L) below which a Freundlich slope is taken at this floor, per cell. */
    private final double[] slopeFloor;
    /** Isotherm value and slope at Newton's last iterate (before its last update, held in rhs). */
    private final double[] iterSorbed;
    private final double[] iterSlope;
    private double cachedStep = Double.NaN;
    private double cachedA0 = Double.NaN;
    private int lastNewtonIterations;

    /**
     * Builds the grid and work arrays for {@code column}.
     *
     * @throws TransportInputException if the grid would need more cells than the settings allow,
     *         or a per-cell initial condition has the wrong length
     */
    public NumericalFlushingSolver(FlushingColumn column, SolverSettings settings) {
        this(column, settings, 1);
    }

    /**
     * As the public constructor, with every cell of the grid the settings give split into
     * {@code refinement} equal cells (Richardson extrapolation, {@link ExtrapolatedTargetSearch}).
     */
    NumericalFlushingSolver(FlushingColumn column, SolverSettings settings, int refinement) {
        if (column == null) {
            throw new TransportInputException("flushing column", null, "a column");
        }
        if (settings == null) {
            throw new TransportInputException("solver settings", null, "settings (SolverSettings.defaults())");
        }
        this.column = column;
        this.settings = settings;
        this.q = column.darcyFluxMetresPerDay();
        this.inflow = column.inflowMilligramsPerLitre();
        List<SoilLayer> layers = column.layers();
        int[] counts = cellCounts(layers, settings, q);
        long total = 0;
        for (int l = 0; l < counts.length; l++) {
            counts[l] *= refinement;
            total += counts[l];
        }
        if (total > settings.maximumCellCount()) {
            throw new TransportInputException("number of cells", total, "at most the maximum cell count "
                    + settings.maximumCellCount() + " (refinement " + refinement + "; allow more cells)");
        }
        n = (int) total;
        this.refinement = refinement;
        dz = new double[n];
        depth = new double[n];
        layerOfCell = new int[n];
        thetaM = new double[n];
        thetaIm = new double[n];
        rhoM = new double[n];
        rhoIm = new double[n];
        rhoB = new double[n];
        muW = new double[n];
        muS = new double[n];
        alpha = new double[n];
        kind = new int[n];
        p1 = new double[n];
        p2 = new double[n];
        immobile = new boolean[n];
        double[] dispersion = new double[n];
        boolean linear = true;
        boolean twoRegion = false;
        int i = 0;
        double top = 0;
        for (int l = 0; l < layers.size(); l++) {
            SoilLayer layer = layers.get(l);
            double size = layer.thicknessMetres() / counts[l];
            double rho = layer.bulkDensityKilogramsPerCubicMetre() / LITRES_PER_CUBIC_METRE;
            double phi = layer.mobileWaterFraction();
            double f = layer.mobileSorbingSiteFraction();
            SorptionIsotherm iso = layer.isotherm();
            for (int j = 0; j < counts[l]; j++, i++) {
                dz[i] = size;
                depth[i] = top + (j + 0.5) * size;
                layerOfCell[i] = l;
                thetaM[i] = phi * layer.waterContent();
                thetaIm[i] = (1 - phi) * layer.waterContent();
                rhoM[i] = f * rho;
                rhoIm[i] = (1 - f) * rho;
                rhoB[i] = rho;
                muW[i] = layer.decayInWaterPerDay();
                muS[i] = layer.decayOnSolidsPerDay();
                alpha[i] = layer.massTransferRatePerDay();
                dispersion[i] = layer.dispersionTermSquareMetresPerDay(q);
                if (iso instanceof SorptionIsotherm.Linear lin) {
                    kind[i] = LINEAR;
                    p1[i] = lin.kdLitresPerKilogram();
                } else if (iso instanceof SorptionIsotherm.Freundlich fr) {
                    kind[i] = FREUNDLICH;
                    p1[i] = fr.kf();
                    p2[i] = fr.exponent();
                    linear = false;
                } else if (iso instanceof SorptionIsotherm.Langmuir la) {
                    kind[i] = LANGMUIR;
                    p1[i] = la.capacityMilligramsPerKilogram();
                    p2[i] = la.affinityLitresPerMilligram();
                    linear = false;
                }
                immobile[i] = thetaIm[i] > 0 || rhoIm[i] > 0;
                twoRegion |= immobile[i];
            }
            top += layer.thicknessMetres();
        }
        allLinear = linear;
        anyImmobile = twoRegion;
        capM = new double[n];
        capIm = new double[n];
        decM = new double[n];
        decIm = new double[n];
        invRhoB = new double[n];
        for (int k = 0; k < n; k++) {
            invRhoB[k] = 1 / rhoB[k];
            if (kind[k] == LINEAR) {
                capM[k] = thetaM[k] + rhoM[k] * p1[k];
                capIm[k] = thetaIm[k] + rhoIm[k] * p1[k];
                decM[k] = muW[k] * thetaM[k] + muS[k] * rhoM[k] * p1[k];
                decIm[k] = muW[k] * thetaIm[k] + muS[k] * rhoIm[k] * p1[k];
            }
        }

        lo = new double[n];
        dg = new double[n];
        up = new double[n];
        int upwind = 0;
        boolean central = settings.advectionScheme() == AdvectionScheme.CENTRAL;
        for (int k = 0; k + 1 < n; k++) {
            double hl = 0.5 * dz[k] / dispersion[k];
            double hr = 0.5 * dz[k + 1] / dispersion[k + 1];
            double g = (dispersion[k] > 0 && dispersion[k + 1] > 0) ? 1.0 / (hl + hr) : 0.0;
            double wl = dz[k + 1] / (dz[k] + dz[k + 1]);
            double wr = 1 - wl;
            if (!central || q * wr > g) {
                if (central) {
                    upwind++;
                }
                wl = 1;
                wr = 0;
            }
            double toLeft = q * wl + g;
            double toRight = q * wr - g;
            dg[k] += toLeft / dz[k];
            up[k] += toRight / dz[k];
            lo[k + 1] -= toLeft / dz[k + 1];
            dg[k + 1] -= toRight / dz[k + 1];
        }
        dg[n - 1] += q / dz[n - 1];
        src0 = q * inflow / dz[0];
        upwindFaces = upwind;

        initialC = initialPoreWater(column, layers, counts);
        double maxC = 0;
        for (double v : initialC) {
            maxC = Math.max(maxC, v);
        }
        initialMaxC = maxC;
        double ref = Math.max(maxC, inflow);
        referenceC = ref > 0 ? ref : 1.0;

        cNew = new double[n];
        c = new double[n];
        cPrev = new double[n];
        cPrev2 = new double[n];
        cimNew = new double[n];
        cim = new double[n];
        mNew = new double[n];
        m = new double[n];
        mPrev = new double[n];
        mimNew = new double[n];
        mim = new double[n];
        mimPrev = new double[n];
        histM = new double[n];
        histIm = new double[n];
        lower = new double[n];
        upper = new double[n];
        factorInv = new double[n];
        factorUp = new double[n];
        rhs = new double[n];
        imGain = new double[n];
        imInv = new double[n];
        resIm = new double[n];
        wc = new double[n];
        sc = new double[n];
        wci = new double[n];
        sci = new double[n];
        hd = new double[n];
        diagonal = new double[n];
        invScale = new double[n];
        invScaleIm = new double[n];
        slopeFloor = new double[n];
        iterSorbed = new double[n];
        iterSlope = new double[n];
    }

    private static int[] cellCounts(List<SoilLayer> layers, SolverSettings settings, double q) {
        int layerCount = layers.size();
        int[] base = new int[layerCount];
        int[] wanted = new int[layerCount];
        long baseTotal = 0;
        long extraTotal = 0;
        for (int l = 0; l < layerCount; l++) {
            SoilLayer layer = layers.get(l);
            double byCellSize = Math.ceil(layer.thicknessMetres() / settings.maximumCellSizeMetres() * (1 - 1e-12));
            long b = Math.max(settings.minimumCellsPerLayer(), (long) Math.min(byCellSize, 1e9));
            base[l] = (int) Math.min(b, Integer.MAX_VALUE / 4);
            baseTotal += base[l];
            long w = base[l];
            double disp = layer.dispersionTermSquareMetresPerDay(q);
            if (disp > 0) {
                // cell Peclet number q dz / (theta_m D_m) at most the limit of the settings
                double byPeclet = Math.ceil(layer.thicknessMetres() * q / (settings.maximumCellPeclet() * disp)
                        * (1 - 1e-12));
                w = Math.max(w, (long) Math.min(byPeclet, 1e9));
            }
            wanted[l] = (int) Math.min(w, Integer.MAX_VALUE / 4);
            extraTotal += wanted[l] - base[l];
        }
        int max = settings.maximumCellCount();
        if (baseTotal > max) {
            throw new TransportInputException("number of cells", baseTotal, "at most the maximum cell count " + max
                    + " (allow more cells, or fewer cells per layer, or a larger maximum cell size)");
        }
        if (baseTotal + extraTotal <= max) {
            return wanted;
        }
        // Not enough cells for a cell Peclet number of 2 everywhere: share out what is left; the
        // faces still above 2 fall back to upwind.
        double share = (double) (max - baseTotal) / extraTotal;
        int[] counts = new int[layerCount];
        for (int l = 0; l < layerCount; l++) {
            counts[l] = base[l] + (int) Math.floor((wanted[l] - base[l]) * share);
        }
        return counts;
    }

    private double[] initialPoreWater(FlushingColumn col, List<SoilLayer> layers, int[] counts) {
        InitialCondition ic = col.initialCondition();
        double[] out = new double[n];
        switch (ic.kind()) {
            case PORE_WATER_PER_CELL -> {
                if (ic.size() * refinement != n) {
                    throw new TransportInputException("number of initial pore-water concentrations", ic.size(),
                            "exactly one per cell (" + n / refinement + "; see cellCount())");
                }
                for (int k = 0; k < n; k++) {
                    out[k] = ic.value(k / refinement);
                }
            }
            case PORE_WATER_PER_LAYER -> {
                for (int k = 0; k < n; k++) {
                    out[k] = ic.value(layerOfCell[k]);
                }
            }
            case SOIL_PER_LAYER -> {
                double[] perLayer = new double[layers.size()];
                for (int l = 0; l < layers.size(); l++) {
                    perLayer[l] = InitialCondition.poreWaterInEquilibrium(layers.get(l), ic.value(l));
                }
                for (int k = 0; k < n; k++) {
                    out[k] = perLayer[layerOfCell[k]];
                }
            }
            default -> throw new IllegalStateException("unknown initial condition " + ic.kind());
        }
        return out;
    }

    /**
     * The semi-discrete equations of a column with linear equilibrium sorption only (no immobile
     * region, no Freundlich or Langmuir layer), for {@link ModalFlushingSolution}; null otherwise.
     * The arrays are the solver's own: read them, never change them.
     */
    SemiDiscreteSystem linearEquilibriumSystem() {
        if (!allLinear || anyImmobile) {
            return null;
        }
        return new SemiDiscreteSystem(n, capM, decM, lo, dg, up, src0, dz, depth, rhoB, initialC, initialMaxC);
    }

    /**
     * Per cell (length n): storage capM (dimensionless, theta + rho_b Kd), decay decM (1/day), the
     * tridiagonal transport operator lo, dg, up (1/day per unit cell length; the stored amount
     * changes as dm_i/dt = -(lo_i c_(i-1) + dg_i c_i + up_i c_(i+1)) - decM_i c_i, plus
     * inflowSource (mg/L per day) in the first cell), cell sizes dz (m), centre depths (m), bulk
     * densities rhoB (kg/L), initial pore water (mg/L) and its largest value.
     */
    record SemiDiscreteSystem(int n, double[] capM, double[] decM, double[] lo, double[] dg, double[] up,
            double inflowSource, double[] dz, double[] depth, double[] rhoB, double[] initialC, double initialMaxC) {
    }

    /** The column this solver was built for. */
    public FlushingColumn column() {
        return column;
    }

    /** The settings this solver was built with. */
    public SolverSettings settings() {
        return settings;
    }

    /** Number of cells of the grid. */
    public int cellCount() {
        return n;
    }

    /** Depth of each cell centre below the top of the profile, m (a copy). */
    public double[] cellCentreDepthsMetres() {
        return depth.clone();
    }

    /** Size of each cell, m (a copy). */
    public double[] cellSizesMetres() {
        return dz.clone();
    }

    /** Faces where the central scheme had to fall back to upwind (cell Peclet number above 2). */
    public int upwindFaceCount() {
        return upwindFaces;
    }

    /** True when every layer has a linear isotherm (no Newton iteration needed). */
    public boolean isLinear() {
        return allLinear;
    }

    /**
     * Runs the flushing as requested.
     *
     * @throws TransportInputException when targets are requested for a column that starts clean,
     *         or a profile time lies beyond the run
     * @throws FlushingCancelledException when the progress receiver asks to stop
     * @throws ArithmeticException when Newton's method fails even at the smallest time step
     */
    public FlushingRunResult run(FlushingRunRequest request) {
        if (request == null) {
            throw new TransportInputException("run request", null, "a request (FlushingRunRequest.upToPoreVolumes(...))");
        }
        Map<CleanupCriterion, Double> targets = request.targets();
        if (!targets.isEmpty() && initialMaxC <= 0) {
            throw new TransportInputException("initial contamination (mg/L)", initialMaxC,
                    "greater than 0 somewhere when cleanup targets are requested");
        }
        double maxPv = request.maximumPoreVolumes();
        double endDays = column.daysForPoreVolumes(maxPv);
        double[] profileTimes = request.profileTimesDaysShared();
        for (double t : profileTimes) {
            if (t > endDays * (1 + 1e-12)) {
                throw new TransportInputException("profile time (days)", t,
                        "0 to the end of the run, " + endDays + " days (" + maxPv + " pore volumes)");
            }
        }
        FlushingProgress progress = request.progress();
        double daysPerPv = column.daysForPoreVolumes(1);
        double hMin = settings.minimumStepPoreVolumes() * daysPerPv;
        double hMax = settings.maximumStepPoreVolumes() * daysPerPv;
        double h = settings.initialStepPoreVolumes() * daysPerPv;
        boolean adaptive = !settings.isFixedStep();
        double tol = settings.stepTolerance();
        double floorFraction = settings.concentrationFloorFraction();
        for (double v : targets.values()) {
            floorFraction = Math.min(floorFraction, 0.1 * v);
        }
        double floor = floorFraction * referenceC;
        double newtonAbs = NEWTON_ABSOLUTE_FLOOR * referenceC;
        double storedAtReference = 0;
        for (int i = 0; i < n; i++) {
            storedAtReference = Math.max(storedAtReference,
                    storedMobile(i, referenceC) + (immobile[i] ? storedImmobile(i, referenceC) : 0));
        }
        double newtonAbsMass = NEWTON_ABSOLUTE_FLOOR * storedAtReference;
        // Freundlich slopes are taken at a concentration floor low enough that the sorbed amount
        // there, Kf floor^n, is below the mass tolerance: floor = C_ref 1e-12^(1/n)
        for (int i = 0; i < n; i++) {
            slopeFloor[i] = kind[i] == FREUNDLICH
                    ? referenceC * Math.max(1e-300, Math.pow(NEWTON_ABSOLUTE_FLOOR, 1 / Math.min(1, p2[i])))
                    : newtonAbs;
        }

        // initial state, immobile region in equilibrium with the mobile one
        for (int i = 0; i < n; i++) {
            c[i] = initialC[i];
            cim[i] = immobile[i] ? initialC[i] : 0;
            m[i] = storedMobile(i, c[i]);
            mim[i] = immobile[i] ? storedImmobile(i, cim[i]) : 0;
        }
        cachedStep = Double.NaN;
        double initialMass = 0;
        double initialMaxSoil = 0;
        for (int i = 0; i < n; i++) {
            initialMass += (m[i] + mim[i]) * dz[i];
            initialMaxSoil = Math.max(initialMaxSoil, (m[i] + mim[i]) / rhoB[i]);
        }
        double massScale = initialMass > 0 ? initialMass : 1;
        double soilScale = initialMaxSoil > 0 ? initialMaxSoil : 1;
        double effluentScale = initialMaxC > 0 ? initialMaxC : 1;

        History hist = new History(effluentScale);
        hist.add(0, 0, c[n - 1], initialMass / massScale, initialMaxSoil / soilScale);
        List<ResidualProfile> profiles = new ArrayList<>();
        int nextProfile = 0;
        while (nextProfile < profileTimes.length && profileTimes[nextProfile] <= 0) {
            profiles.add(profile(0, 0, initialMass / massScale, initialMaxSoil / soilScale));
            nextProfile++;
        }

        int critCount = CleanupCriterion.values().length;
        boolean[] wanted = new boolean[critCount];
        double[] target = new double[critCount];
        boolean[] below = new boolean[critCount];
        boolean[] crossed = new boolean[critCount];
        double[] crossingDays = new double[critCount];
        double[] value = { c[n - 1] / effluentScale, initialMass / massScale, initialMaxSoil / soilScale };
        for (Map.Entry<CleanupCriterion, Double> e : targets.entrySet()) {
            int k = e.getKey().ordinal();
            wanted[k] = true;
            target[k] = e.getValue();
            below[k] = value[k] <= target[k];
            crossingDays[k] = below[k] ? 0 : Double.NaN;
        }

        double t = 0;
        double hPrev = 0;
        double hPrev2 = 0;
        int accepted = 0;
        int rejected = 0;
        long newtonTotal = 0;
        double eIn = 0;
        double eOut = 0;
        double eDec = 0;
        double sumIn = 0;
        double sumOut = 0;
        double sumDec = 0;
        double mass = initialMass;
        double lastReportPv = 0;
        double reportEvery = maxPv / 200;

        while (t < endDays * (1 - 1e-13)) {
            if (progress.cancelRequested()) {
                throw new FlushingCancelledException(column.poreVolumesAfterDays(t));
            }
            double hTry = Math.min(h, endDays - t);
            boolean landing = false;
            if (nextProfile < profileTimes.length && t + hTry >= profileTimes[nextProfile] * (1 - 1e-13)) {
                hTry = profileTimes[nextProfile] - t;
                landing = true;
            }
            if (endDays - t - hTry < 1e-9 * hTry) {
                hTry = endDays - t;
            }
            double a0;
            double a1;
            double a2;
            if (accepted == 0 || hTry > 2.0 * hPrev * (1 + 1e-12)) {
                // backward Euler: the first step, and the step after a short one that landed on
                // a profile time (BDF2 is zero-stable only for step ratios below 1 + sqrt 2)
                a0 = 1;
                a1 = 1;
                a2 = 0;
            } else {
                double w = hTry / hPrev;
                a0 = (1 + 2 * w) / (1 + w);
                a1 = 1 + w;
                a2 = w * w / (1 + w);
            }
            boolean solved;
            if (allLinear) {
                solveLinear(hTry, a0, a1, a2);
                solved = true;
            } else {
                for (int i = 0; i < n; i++) {
                    histM[i] = a1 * m[i] - a2 * mPrev[i];
                }
                if (anyImmobile) {
                    for (int i = 0; i < n; i++) {
                        histIm[i] = a1 * mim[i] - a2 * mimPrev[i];
                    }
                }
                solved = solveNewton(hTry, a0, accepted == 0 ? 0 : hTry / hPrev, accepted >= 1, newtonAbs,
                        newtonAbsMass);
                newtonTotal += lastNewtonIterations;
            }
            if (!solved) {
                if (hTry <= hMin * (1 + 1e-12)) {
                    throw new ArithmeticException("Newton's method did not converge in "
                            + settings.maximumNewtonIterations() + " iterations even at the smallest time step ("
                            + settings.minimumStepPoreVolumes() + " pore volumes) after "
                            + column.poreVolumesAfterDays(t) + " pore volumes; allow more iterations or a looser "
                            + "Newton tolerance");
                }
                rejected++;
                h = Math.max(hMin, 0.25 * hTry);
                continue;
            }
            // error estimate from a predictor through the last states
            double err = 0;
            if (adaptive && accepted >= 1) {
                err = errorEstimate(hTry, hPrev, hPrev2, accepted, floor) / tol;
                if (err > 1 && hTry > hMin * (1 + 1e-12)) {
                    rejected++;
                    h = Math.max(hMin, hTry * Math.max(0.2, 0.9 * Math.pow(err, -1.0 / 3.0)));
                    continue;
                }
            }
            // accept: stored mass, bookkeeping of the scheme's own fluxes
            double newMass = 0;
            double decayRate = 0;
            double maxSoil = 0;
            if (allLinear && !anyImmobile) {
                for (int i = 0; i < n; i++) {
                    double ci = cNew[i];
                    double mi = capM[i] * ci;
                    mNew[i] = mi;
                    newMass += mi * dz[i];
                    decayRate += decM[i] * ci * dz[i];
                    double soil = mi * invRhoB[i];
                    if (soil > maxSoil) {
                        maxSoil = soil;
                    }
                }
            } else if (allLinear) {
                for (int i = 0; i < n; i++) {
                    double ci = cNew[i];
                    double cj = cimNew[i];
                    double mi = capM[i] * ci;
                    double mj = capIm[i] * cj;
                    mNew[i] = mi;
                    mimNew[i] = mj;
                    newMass += (mi + mj) * dz[i];
                    decayRate += (decM[i] * ci + decIm[i] * cj) * dz[i];
                    double soil = (mi + mj) * invRhoB[i];
                    if (soil > maxSoil) {
                        maxSoil = soil;
                    }
                }
            } else {
            for (int i = 0; i < n; i++) {
                double ci = cNew[i];
                double mi;
                double di;
                if (kind[i] == LINEAR) {
                    double s = p1[i] * ci;
                    mi = thetaM[i] * ci + rhoM[i] * s;
                    di = muW[i] * thetaM[i] * ci + muS[i] * rhoM[i] * s;
                } else {
                    // Newton's last update d was tiny: S(c + d) = S(c) + S'(c) d to within
                    // S'' d^2 / 2, below round-off, which saves evaluating the isotherm again
                    double d = rhs[i];
                    double s = Math.abs(d) <= 1e-7 * Math.abs(ci) ? iterSorbed[i] + iterSlope[i] * d : sorbed(i, ci);
                    mi = thetaM[i] * ci + rhoM[i] * s;
                    di = muW[i] * thetaM[i] * ci + muS[i] * rhoM[i] * s;
                }
                mNew[i] = mi;
                double tot = mi;
                if (immobile[i]) {
                    double cj = cimNew[i];
                    double s = sorbed(i, cj);
                    double mj = thetaIm[i] * cj + rhoIm[i] * s;
                    mimNew[i] = mj;
                    di += muW[i] * thetaIm[i] * cj + muS[i] * rhoIm[i] * s;
                    tot += mj;
                }
                newMass += tot * dz[i];
                decayRate += di * dz[i];
                double soil = tot * invRhoB[i];
                if (soil > maxSoil) {
                    maxSoil = soil;
                }
            }
            }
            eIn = (hTry * q * inflow + a2 * eIn) / a0;
            eOut = (hTry * q * cNew[n - 1] + a2 * eOut) / a0;
            eDec = (hTry * decayRate + a2 * eDec) / a0;
            sumIn += eIn;
            sumOut += eOut;
            sumDec += eDec;
            mass = newMass;
            rotate();
            t = landing ? profileTimes[nextProfile] : t + hTry;
            if (endDays - t < 1e-13 * endDays) {
                t = Math.max(t, endDays);
            }
            hPrev2 = hPrev;
            hPrev = hTry;
            accepted++;
            double pv = column.poreVolumesAfterDays(t);
            double eff = c[n - 1] / effluentScale;
            double meanF = mass / massScale;
            double maxF = maxSoil / soilScale;
            hist.add(t, pv, c[n - 1], meanF, maxF);
            while (nextProfile < profileTimes.length && profileTimes[nextProfile] <= t * (1 + 1e-13)) {
                profiles.add(profile(t, pv, meanF, maxF));
                nextProfile++;
            }
            value[0] = eff;
            value[1] = meanF;
            value[2] = maxF;
            boolean allBelow = !targets.isEmpty();
            for (int k = 0; k < critCount; k++) {
                if (!wanted[k]) {
                    continue;
                }
                boolean nowBelow = value[k] <= target[k];
                if (nowBelow && !below[k]) {
                    crossingDays[k] = crossing(hist, k, target[k]);
                    crossed[k] = true;
                } else if (!nowBelow) {
                    crossingDays[k] = Double.NaN;
                }
                below[k] = nowBelow;
                // a criterion that started below its target (the effluent of a column with a
                // clean bottom layer) may still rise above it: no early stop on its account
                allBelow &= nowBelow && crossed[k];
            }
            if (pv - lastReportPv >= reportEvery) {
                progress.advanced(pv, maxPv);
                lastReportPv = pv;
            }
            if (allBelow && request.stopWhenTargetsReached() && nextProfile >= profileTimes.length) {
                break;
            }
            // next step
            double base = landing ? Math.max(h, hTry) : hTry;
            double factor = 1;
            if (adaptive) {
                if (accepted == 1) {
                    factor = 2;
                } else {
                    factor = err > 0 ? 0.9 * Math.pow(err, -1.0 / 3.0) : 2;
                    factor = Math.min(2, Math.max(0.2, factor));
                    if (factor >= 1 && factor < 1.25) {
                        factor = 1; // keep the step, and with it the factorisation
                    }
                }
            }
            h = Math.min(hMax, Math.max(hMin, base * factor));
        }
        progress.advanced(column.poreVolumesAfterDays(t), maxPv);

        EnumMap<CleanupCriterion, TargetOutcome> outcomes = new EnumMap<>(CleanupCriterion.class);
        double runPv = column.poreVolumesAfterDays(t);
        for (CleanupCriterion crit : targets.keySet()) {
            int k = crit.ordinal();
            boolean reached = below[k];
            double days = reached ? crossingDays[k] : Double.NaN;
            double pv = reached ? column.poreVolumesAfterDays(days) : Double.NaN;
            outcomes.put(crit, new TargetOutcome(crit, target[k], reached, pv, days, runPv, value[k]));
        }
        MassBalance balance = new MassBalance(initialMass * LITRES_PER_CUBIC_METRE, sumIn * LITRES_PER_CUBIC_METRE,
                sumOut * LITRES_PER_CUBIC_METRE, sumDec * LITRES_PER_CUBIC_METRE, mass * LITRES_PER_CUBIC_METRE);
        return new FlushingRunResult(hist.times(), hist.poreVolumes(), hist.effluent(), hist.mean(), hist.max(),
                profiles, balance, outcomes, accepted, rejected, newtonTotal, n, upwindFaces, initialMaxC);
    }

    private void rotate() {
        double[] tmp = cPrev2;
        cPrev2 = cPrev;
        cPrev = c;
        c = cNew;
        cNew = tmp;
        tmp = mPrev;
        mPrev = m;
        m = mNew;
        mNew = tmp;
        if (anyImmobile) {
            tmp = cim;
            cim = cimNew;
            cimNew = tmp;
            tmp = mimPrev;
            mimPrev = mim;
            mim = mimNew;
            mimNew = tmp;
        }
    }

    private ResidualProfile profile(double t, double pv, double meanF, double maxF) {
        double[] soil = new double[n];
        double[] water = new double[n];
        for (int i = 0; i < n; i++) {
            soil[i] = (m[i] + (immobile[i] ? mim[i] : 0)) / rhoB[i];
            water[i] = c[i];
        }
        return new ResidualProfile(t, pv, depth.clone(), soil, water, meanF, maxF);
    }

    /** Time (days) at which criterion k fell to the target between the last two entries. */
    private static double crossing(History hist, int k, double target) {
        int last = hist.size() - 1;
        double t1 = hist.time(last - 1);
        double t2 = hist.time(last);
        double v1 = hist.criterion(last - 1, k);
        double v2 = hist.criterion(last, k);
        if (last >= 2) {
            double t0 = hist.time(last - 2);
            double v0 = hist.criterion(last - 2, k);
            if (v0 > 0 && v1 > 0 && v2 > 0 && t1 > t0) {
                double l0 = Math.log(v0);
                double l1 = Math.log(v1);
                double l2 = Math.log(v2);
                double lt = Math.log(target);
                // bisection on the quadratic through the three points, which passes l1 > lt >= l2
                double a = t1;
                double b = t2;
                for (int it = 0; it < 100 && b - a > 1e-15 * b; it++) {
                    double mid = 0.5 * (a + b);
                    double lm = l0 * (mid - t1) * (mid - t2) / ((t0 - t1) * (t0 - t2))
                            + l1 * (mid - t0) * (mid - t2) / ((t1 - t0) * (t1 - t2))
                            + l2 * (mid - t0) * (mid - t1) / ((t2 - t0) * (t2 - t1));
                    if (lm > lt) {
                        a = mid;
                    } else {
                        b = mid;
                    }
                }
                return 0.5 * (a + b);
            }
        }
        if (v1 == v2) {
            return t2;
        }
        return t1 + (t2 - t1) * (v1 - target) / (v1 - v2);
    }

    /**
     * Errors are measured against |C| plus the larger of the concentration floor and this
     * fraction of the highest concentration in the profile at the time: otherwise the foot of a
     * sharp front (a plume entering clean soil with a Freundlich exponent below 1) forces tiny
     * steps for no gain; it cut the steps of such a case by a factor of five at unchanged results.
     */
    private static final double PROFILE_FLOOR_FRACTION = 0.01;

    private double errorEstimate(double hNow, double h1, double h2, int accepted, double concentrationFloor) {
        double cmax = 0;
        for (int i = 0; i < n; i++) {
            cmax = Math.max(cmax, Math.abs(cNew[i]));
        }
        double floor = Math.max(concentrationFloor, PROFILE_FLOOR_FRACTION * cmax);
        double max = 0;
        if (accepted >= 2) {
            double ln = (hNow + h1) * (hNow + h1 + h2) / (h1 * (h1 + h2));
            double ln1 = -hNow * (hNow + h1 + h2) / (h1 * h2);
            double ln2 = hNow * (hNow + h1) / ((h1 + h2) * h2);
            for (int i = 0; i < n; i++) {
                double pred = ln * c[i] + ln1 * cPrev[i] + ln2 * cPrev2[i];
                double e = Math.abs(cNew[i] - pred) / (Math.abs(cNew[i]) + floor);
                if (e > max) {
                    max = e;
                }
            }
            return BDF2_ERROR_CONSTANT * max;
        }
        // second step: linear extrapolation, whose error is of lower order; a cautious estimate
        double w = hNow / h1;
        for (int i = 0; i < n; i++) {
            double pred = c[i] + w * (c[i] - cPrev[i]);
            double e = Math.abs(cNew[i] - pred) / (Math.abs(cNew[i]) + floor);
            if (e > max) {
                max = e;
            }
        }
        return BDF2_ERROR_CONSTANT * max;
    }

    /**
     * One implicit step with linear sorption: a single tridiagonal solve, the BDF2 history
     * a1 M^n - a2 M^(n-1) formed on the fly.
     */
    private void solveLinear(double h, double a0, double a1, double a2) {
        if (h != cachedStep || a0 != cachedA0) {
            double prevUp = 0;
            for (int i = 0; i < n; i++) {
                double kd = p1[i];
                double diag = thetaM[i] * (a0 + h * muW[i]) + rhoM[i] * kd * (a0 + h * muS[i]) + h * dg[i];
                if (immobile[i]) {
                    double ha = h * alpha[i];
                    double jim = thetaIm[i] * (a0 + h * muW[i]) + rhoIm[i] * kd * (a0 + h * muS[i]) + ha;
                    diag += ha - ha * ha / jim;
                    imInv[i] = 1 / jim;
                    imGain[i] = ha / jim;
                } else {
                    imInv[i] = 0;
                    imGain[i] = 0;
                }
                double l = h * lo[i];
                lower[i] = l;
                double inv = 1 / (diag - l * prevUp);
                factorInv[i] = inv;
                prevUp = h * up[i] * inv;
                factorUp[i] = prevUp;
            }
            cachedStep = h;
            cachedA0 = a0;
        }
        double[] x = cNew;
        double[] mm = m;
        double[] mp = mPrev;
        double[] inv = factorInv;
        double[] low = lower;
        if (anyImmobile) {
            double[] mj = mim;
            double[] mjp = mimPrev;
            double histJ = a1 * mj[0] - a2 * mjp[0];
            histIm[0] = histJ;
            double y = (a1 * mm[0] - a2 * mp[0] + h * src0 + imGain[0] * histJ) * inv[0];
            x[0] = y;
            for (int i = 1; i < n; i++) {
                histJ = a1 * mj[i] - a2 * mjp[i];
                histIm[i] = histJ;
                y = (a1 * mm[i] - a2 * mp[i] + imGain[i] * histJ - low[i] * y) * inv[i];
                x[i] = y;
            }
        } else {
            double y = (a1 * mm[0] - a2 * mp[0] + h * src0) * inv[0];
            x[0] = y;
            for (int i = 1; i < n; i++) {
                y = (a1 * mm[i] - a2 * mp[i] - low[i] * y) * inv[i];
                x[i] = y;
            }
        }
        double[] fu = factorUp;
        for (int i = n - 2; i >= 0; i--) {
            x[i] -= fu[i] * x[i + 1];
        }
        if (anyImmobile) {
            for (int i = 0; i < n; i++) {
                cimNew[i] = immobile[i] ? (histIm[i] * imInv[i] + imGain[i] * x[i]) : 0;
            }
        }
    }

    /**
     * One implicit step with nonlinear sorption: Newton's method, one tridiagonal solve per
     * iteration, started from the linear extrapolation of the last two states (kept at or above
     * a quarter of the present value: concentrations only fall towards zero, by decay or
     * flushing, and a Freundlich slope is steep there), which saves about one iteration a step.
     */
    private boolean solveNewton(double h, double a0, double w, boolean extrapolate, double abs, double absMass) {
        double relTol = settings.newtonRelativeTolerance();
        int maxIt = settings.maximumNewtonIterations();
        for (int i = 0; i < n; i++) {
            wc[i] = thetaM[i] * (a0 + h * muW[i]);
            sc[i] = rhoM[i] * (a0 + h * muS[i]);
            lower[i] = h * lo[i];
            upper[i] = h * up[i];
            hd[i] = h * dg[i];
            double guess = c[i];
            if (extrapolate) {
                guess = Math.max(c[i] + w * (c[i] - cPrev[i]), 0.25 * c[i]);
            }
            cNew[i] = guess;
        }
        if (anyImmobile) {
            for (int i = 0; i < n; i++) {
                wci[i] = thetaIm[i] * (a0 + h * muW[i]);
                sci[i] = rhoIm[i] * (a0 + h * muS[i]);
                cimNew[i] = cim[i];
            }
        }
        cachedStep = Double.NaN;
        double hSrc = h * src0;
        double previousSize = Double.POSITIVE_INFINITY;
        for (int it = 1; it <= maxIt; it++) {
            if (!anyImmobile) {
                // one region: residual, Jacobian and forward sweep in one pass, back substitution
                // and update in another
                double size = fusedNewtonIteration(hSrc, abs, relTol, absMass);
                if (!(size < Double.POSITIVE_INFINITY)) {
                    lastNewtonIterations = it;
                    return false;
                }
                double theta = size / previousSize;
                previousSize = size;
                if (size <= 1 || (it > 1 && theta < 0.5 && theta / (1 - theta) * size <= 1)) {
                    lastNewtonIterations = it;
                    return true;
                }
                continue;
            }
            for (int i = 0; i < n; i++) {
                double ci = cNew[i];
                double s;
                double ds;
                switch (kind[i]) {
                    case LINEAR -> {
                        s = p1[i] * ci;
                        ds = p1[i];
                    }
                    case FREUNDLICH -> {
                        double a = Math.abs(ci);
                        double aa = Math.max(a, slopeFloor[i]);
                        double pw = p1[i] * Math.pow(aa, p2[i]);
                        ds = p2[i] * pw / aa;
                        s = a >= slopeFloor[i] ? pw : p1[i] * Math.pow(a, p2[i]);
                        if (ci < 0) {
                            s = -s;
                        }
                    }
                    default -> {
                        double d = 1 + p2[i] * Math.abs(ci);
                        s = p1[i] * p2[i] * ci / d;
                        ds = p1[i] * p2[i] / (d * d);
                    }
                }
                double transport = hd[i] * ci;
                if (i > 0) {
                    transport += lower[i] * cNew[i - 1];
                }
                if (i + 1 < n) {
                    transport += upper[i] * cNew[i + 1];
                }
                rhs[i] = histM[i] - wc[i] * ci - sc[i] * s - transport;
                diagonal[i] = wc[i] + sc[i] * ds + hd[i];
                iterSorbed[i] = s;
                iterSlope[i] = ds;
                invScale[i] = (thetaM[i] + rhoM[i] * ds)
                        / (relTol * (thetaM[i] * Math.abs(ci) + rhoM[i] * Math.abs(s)) + absMass);
            }
            rhs[0] += hSrc;
            if (anyImmobile) {
                for (int i = 0; i < n; i++) {
                    if (!immobile[i]) {
                        continue;
                    }
                    double ha = h * alpha[i];
                    double ci = cNew[i];
                    double cj = cimNew[i];
                    double sj = sorbed(i, cj);
                    double dsj = slope(i, cj, abs);
                    double qres = wci[i] * cj + sci[i] * sj + ha * (cj - ci) - histIm[i];
                    double jim = wci[i] + sci[i] * dsj + ha;
                    invScaleIm[i] = (thetaIm[i] + rhoIm[i] * dsj)
                            / (relTol * (thetaIm[i] * Math.abs(cj) + rhoIm[i] * Math.abs(sj)) + absMass);
                    double invJ = 1 / jim;
                    rhs[i] -= ha * (ci - cj) + ha * qres * invJ;
                    diagonal[i] += ha - ha * ha * invJ;
                    resIm[i] = qres;
                    imInv[i] = invJ;
                }
            }
            // Thomas algorithm on (lower, diagonal, upper); the update lands in rhs
            double prevUp = 0;
            double y = 0;
            for (int i = 0; i < n; i++) {
                double inv = 1 / (diagonal[i] - lower[i] * prevUp);
                y = (rhs[i] - lower[i] * y) * inv;
                rhs[i] = y;
                prevUp = upper[i] * inv;
                factorUp[i] = prevUp;
            }
            for (int i = n - 2; i >= 0; i--) {
                rhs[i] -= factorUp[i] * rhs[i + 1];
            }
            // scaled size of the update: 1 = the tolerance
            double size = 0;
            for (int i = 0; i < n; i++) {
                double d = rhs[i];
                double next = cNew[i] + d;
                size = Math.max(size, Math.abs(d) * invScale[i]);
                cNew[i] = next;
            }
            if (anyImmobile) {
                for (int i = 0; i < n; i++) {
                    if (immobile[i]) {
                        double dj = (-resIm[i] + h * alpha[i] * rhs[i]) * imInv[i];
                        double nextJ = cimNew[i] + dj;
                        size = Math.max(size, Math.abs(dj) * invScaleIm[i]);
                        cimNew[i] = nextJ;
                    }
                }
            }
            if (!(size < Double.POSITIVE_INFINITY)) {
                lastNewtonIterations = it;
                return false;
            }
            // converged when the update is within the tolerance, or when the contraction rate
            // theta says the error left after it is: theta / (1 - theta) * size <= 1
            double theta = size / previousSize;
            boolean converged = size <= 1 || (it > 1 && theta < 0.5 && theta / (1 - theta) * size <= 1);
            previousSize = size;
            if (converged) {
                lastNewtonIterations = it;
                return true;
            }
        }
        lastNewtonIterations = maxIt;
        return false;
    }

    /**
     * One Newton iteration without immobile regions: returns the scaled size of the update (1 =
     * the tolerance). The residual of cell i needs the old iterate of cell i + 1, which the
     * forward sweep has not changed yet.
     */
    private double fusedNewtonIteration(double hSrc, double abs, double relTol, double absMass) {
        double prevUp = 0;
        double y = 0;
        double left = 0;
        for (int i = 0; i < n; i++) {
            double ci = cNew[i];
            double s;
            double ds;
            switch (kind[i]) {
                case LINEAR -> {
                    s = p1[i] * ci;
                    ds = p1[i];
                }
                case FREUNDLICH -> {
                    double a = Math.abs(ci);
                    double aa = Math.max(a, slopeFloor[i]);
                    double pw = p1[i] * Math.pow(aa, p2[i]);
                    ds = p2[i] * pw / aa;
                    s = a >= slopeFloor[i] ? pw : p1[i] * Math.pow(a, p2[i]);
                    if (ci < 0) {
                        s = -s;
                    }
                }
                default -> {
                    double d = 1 + p2[i] * Math.abs(ci);
                    s = p1[i] * p2[i] * ci / d;
                    ds = p1[i] * p2[i] / (d * d);
                }
            }
            double transport = hd[i] * ci + lower[i] * left;
            if (i + 1 < n) {
                transport += upper[i] * cNew[i + 1];
            }
            left = ci;
            double r = histM[i] - wc[i] * ci - sc[i] * s - transport;
            if (i == 0) {
                r += hSrc;
            }
            iterSorbed[i] = s;
            iterSlope[i] = ds;
            invScale[i] = (thetaM[i] + rhoM[i] * ds)
                    / (relTol * (thetaM[i] * Math.abs(ci) + rhoM[i] * Math.abs(s)) + absMass);
            double inv = 1 / (wc[i] + sc[i] * ds + hd[i] - lower[i] * prevUp);
            y = (r - lower[i] * y) * inv;
            rhs[i] = y;
            prevUp = upper[i] * inv;
            factorUp[i] = prevUp;
        }
        double size = 0;
        double next = rhs[n - 1];
        cNew[n - 1] += next;
        size = Math.abs(next) * invScale[n - 1];
        for (int i = n - 2; i >= 0; i--) {
            double d = rhs[i] - factorUp[i] * next;
            rhs[i] = d;
            cNew[i] += d;
            size = Math.max(size, Math.abs(d) * invScale[i]);
            next = d;
        }
        return size;
    }

    private double sorbed(int i, double cw) {
        switch (kind[i]) {
            case LINEAR:
                return p1[i] * cw;
            case FREUNDLICH: {
                double s = p1[i] * Math.pow(Math.abs(cw), p2[i]);
                return cw < 0 ? -s : s;
            }
            default:
                return p1[i] * p2[i] * cw / (1 + p2[i] * Math.abs(cw));
        }
    }

    private double slope(int i, double cw, double abs) {
        switch (kind[i]) {
            case LINEAR:
                return p1[i];
            case FREUNDLICH: {
                double a = Math.max(Math.abs(cw), slopeFloor[i]);
                return p2[i] * p1[i] * Math.pow(a, p2[i] - 1);
            }
            default: {
                double d = 1 + p2[i] * Math.abs(cw);
                return p1[i] * p2[i] / (d * d);
            }
        }
    }

    private double storedMobile(int i, double cw) {
        return thetaM[i] * cw + rhoM[i] * sorbed(i, cw);
    }

    private double storedImmobile(int i, double cw) {
        return thetaIm[i] * cw + rhoIm[i] * sorbed(i, cw);
    }

    /** Growing primitive arrays for the histories (amortised, no boxing). */
    private static final class History {
        private double[] t = new double[256];
        private double[] pv = new double[256];
        private double[] eff = new double[256];
        private double[] mean = new double[256];
        private double[] max = new double[256];
        private int size;
        private final double effluentScale;

        History(double effluentScale) {
            this.effluentScale = effluentScale;
        }

        void add(double time, double poreVolumes, double effluent, double meanF, double maxF) {
            if (size == t.length) {
                int cap = size * 2;
                t = java.util.Arrays.copyOf(t, cap);
                pv = java.util.Arrays.copyOf(pv, cap);
                eff = java.util.Arrays.copyOf(eff, cap);
                mean = java.util.Arrays.copyOf(mean, cap);
                max = java.util.Arrays.copyOf(max, cap);
            }
            t[size] = time;
            pv[size] = poreVolumes;
            eff[size] = effluent;
            mean[size] = meanF;
            max[size] = maxF;
            size++;
        }

        int size() {
            return size;
        }

        double time(int i) {
            return t[i];
        }

        /** Criterion k at entry i: 0 effluent fraction, 1 mean residual, 2 maximum residual. */
        double criterion(int i, int k) {
            return k == 0 ? eff[i] / effluentScale : (k == 1 ? mean[i] : max[i]);
        }

        double[] times() {
            return java.util.Arrays.copyOf(t, size);
        }

        double[] poreVolumes() {
            return java.util.Arrays.copyOf(pv, size);
        }

        double[] effluent() {
            return java.util.Arrays.copyOf(eff, size);
        }

        double[] mean() {
            return java.util.Arrays.copyOf(mean, size);
        }

        double[] max() {
            return java.util.Arrays.copyOf(max, size);
        }
    }
}
