package eluvia.design;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Locale;

import eluvia.design.internal.FlushingSolutions;
import eluvia.design.internal.LayerCombination;
import eluvia.site.model.Contaminant;
import eluvia.site.model.FlushingDesign;
import eluvia.site.model.NonequilibriumEntry;
import eluvia.site.model.Project;
import eluvia.site.model.SourceConcentration;
import eluvia.site.model.TreatmentZone;
import eluvia.transport.TransportInputException;
import eluvia.transport.numerical.FlushingColumn;
import eluvia.transport.numerical.FlushingRunRequest;
import eluvia.transport.numerical.FlushingRunResult;
import eluvia.transport.numerical.InitialCondition;
import eluvia.transport.numerical.NumericalFlushingSolver;
import eluvia.transport.numerical.ResidualProfile;
import eluvia.transport.numerical.SolverSettings;

/**
 * Residual soil concentration against depth over the treated column of a flushing design at chosen
 * shares of the pore volumes the design needs ({@link #DEFAULT_SHARES}: 0, 25 %, 50 % and 100 %),
 * for the design package's "concentration against depth at chosen times".
 *
 * <p>The profiles come from one run of the layered numerical solution (eluvia.transport.numerical:
 * cell-centred finite volumes, implicit in time, mass balance kept) on the same column the pipeline
 * builds for a NUMERICAL design: the site layers clipped to the zone's depth interval, each with its
 * water content, porosity, bulk density, dispersivity (eluvia.site Dispersivities), the contaminant's
 * isotherm (linear Kd entered or Koc foc per layer, Karickhoff et al. 1979; Freundlich; Langmuir),
 * free-water diffusion, first-order decay and, when entered as physical or chemical parameters, the
 * two-region / two-site exchange (van Genuchten and Wierenga 1976; Nkedi-Kizza et al. 1984); the
 * whole column starts at the contaminant's source concentration and is flushed with clean water at
 * the design's Darcy flux. The run goes to the design's pore volumes (whatever solution the design is
 * governed by), so at 100 % the profile shows what the numerical solution leaves at the design's
 * pore volumes. Below the treated column nothing is computed here (see {@link BelowLayerPush}).
 *
 * <p>Units: depths m below ground, soil concentrations mg/kg of dry soil (total), times operating
 * days (d of pumping) and calendar days (at the design's operating days per week); pore volumes and
 * fractions are dimensionless. Grid and step tolerance: the design's numerical cell count and
 * relative tolerance when they are valid, otherwise {@link #DEFAULT_CELLS} and
 * {@link #DEFAULT_STEP_TOLERANCE}.
 */
public final class DepthProfiles {

    /** Shares of the design's pore volumes at which profiles are drawn (dimensionless). */
    public static final List<Double> DEFAULT_SHARES = List.of(0.0, 0.25, 0.5, 1.0);
    /** Cells over the column when the design gives no valid cell count (dimensionless count). */
    public static final int DEFAULT_CELLS = 200;
    /** Step tolerance when the design gives no valid one (dimensionless, relative). */
    public static final double DEFAULT_STEP_TOLERANCE = 1e-6;
    /** Smallest number of cells of a layer in the grid, as the pipeline's numerical run (dimensionless count). */
    static final int MINIMUM_CELLS_PER_LAYER = 5;

    private DepthProfiles() {
    }

    /**
     * Profiles of the controlling contaminant of a flushing design at {@link #DEFAULT_SHARES}.
     *
     * @param project the project the result was computed from
     * @param result the design's result from {@link DesignPipeline}
     * @return the profiles, or a set that says why there are none (no controlling contaminant, the
     *         cleanup level not reached, a contaminant the layered solution cannot describe)
     * @throws IllegalArgumentException when the project or the result is null, or the project has no
     *         flushing design of the result's name
     */
    public static DepthProfileSet ofControlling(Project project, FlushingDesignResult result) {
        requireInputs(project, result);
        if (result.controllingContaminant() == null || !(result.poreVolumes() > 0)) {
            return DepthProfileSet.notAvailable(result.designName(), result.controllingContaminant(),
                    "the design has no pore volumes to its cleanup level (no controlling contaminant reaches it)");
        }
        return of(project, result, result.controllingContaminant(), DEFAULT_SHARES);
    }

    /**
     * Profiles of one contaminant of a flushing design at chosen shares of the design's pore volumes.
     *
     * @param project the project the result was computed from
     * @param result the design's result from {@link DesignPipeline}
     * @param contaminantName a contaminant of the result ({@link ContaminantFlushing#contaminantName()})
     * @param sharesOfDesign shares of the design's pore volumes (dimensionless), each 0 to 1, at least one
     * @return the profiles, or a set that says why there are none (the cleanup level not reached, inputs
     *         the layered solution cannot describe or does not accept)
     * @throws IllegalArgumentException for a null or unknown argument or a share outside 0 to 1
     */
    public static DepthProfileSet of(Project project, FlushingDesignResult result, String contaminantName,
            List<Double> sharesOfDesign) {
        requireInputs(project, result);
        ContaminantFlushing row = result.contaminants().stream()
                .filter(c -> c.contaminantName().equals(contaminantName)).findFirst()
                .orElseThrow(() -> new IllegalArgumentException("contaminant '" + contaminantName + "' is not one of "
                        + "flushing design '" + result.designName() + "' (allowed: " + result.contaminants().stream()
                                .map(ContaminantFlushing::contaminantName).toList() + ")"));
        if (sharesOfDesign == null || sharesOfDesign.isEmpty()) {
            throw new IllegalArgumentException("shares of the design's pore volumes: " + sharesOfDesign
                    + "; allowed: at least one share between 0 and 1 (e.g. 0, 0.25, 0.5, 1)");
        }
        double[] shares = new double[sharesOfDesign.size()];
        for (int i = 0; i < shares.length; i++) {
            Double s = sharesOfDesign.get(i);
            if (s == null || !(s >= 0 && s <= 1)) {
                throw new IllegalArgumentException("share of the design's pore volumes [" + i + "] (dimensionless): " + s
                        + "; allowed: 0 to 1");
            }
            shares[i] = s;
        }
        Arrays.sort(shares);
        if (!(result.poreVolumes() > 0)) {
            return DepthProfileSet.notAvailable(result.designName(), contaminantName,
                    "the design has no pore volumes to its cleanup level");
        }
        FlushingDesign design = designOf(project, result);
        TreatmentZone zone = design.getZone();
        Contaminant c = contaminantOf(zone, contaminantName);
        NonequilibriumEntry entry = c.getNonequilibrium() == null ? NonequilibriumEntry.EQUILIBRIUM : c.getNonequilibrium();
        String why = unavailableReason(c, entry);
        if (why != null) {
            return DepthProfileSet.notAvailable(result.designName(), contaminantName, why);
        }

        try {
            return run(project, result, design, zone, c, entry, row, shares);
        } catch (TransportInputException e) {
            return DepthProfileSet.notAvailable(result.designName(), contaminantName, "the layered solution does not "
                    + "accept the inputs: " + e.getMessage());
        } catch (DesignInputException e) {
            return DepthProfileSet.notAvailable(result.designName(), contaminantName, "the layered solution does not "
                    + "accept the inputs: " + e.getMessage());
        }
    }

    private static DepthProfileSet run(Project project, FlushingDesignResult result, FlushingDesign design,
            TreatmentZone zone, Contaminant c, NonequilibriumEntry entry, ContaminantFlushing row, double[] shares) {
        String contaminantName = row.contaminantName();
        List<LayerCombination.Slice> slices = LayerCombination.slices(project.getSite().getLayers(),
                zone.getTopDepthMetres(), zone.getBottomDepthMetres());
        double decayPerDay = c.getHalfLifeDays() > 0 ? Math.log(2) / c.getHalfLifeDays() : 0;
        List<eluvia.transport.numerical.SoilLayer> layers = new ArrayList<>();
        List<Double> bases = new ArrayList<>();
        double thickness = 0;
        for (LayerCombination.Slice s : slices) {
            layers.add(layerOf(s, c, entry, decayPerDay));
            bases.add(s.bottomDepthMetres());
            thickness += s.thicknessMetres();
        }
        double initial = row.initialSoilMilligramsPerKg();
        double[] initialPerLayer = new double[layers.size()];
        Arrays.fill(initialPerLayer, initial);
        FlushingColumn column = new FlushingColumn(layers, design.getDarcyFluxMetresPerDay(), 0,
                InitialCondition.soilPerLayer(initialPerLayer));
        int cells = design.getNumericalCellCount() >= 1 && design.getNumericalCellCount() <= 100_000
                ? design.getNumericalCellCount() : DEFAULT_CELLS;
        double tolerance = design.getNumericalRelativeTolerance() > 0 && design.getNumericalRelativeTolerance() <= 1e-2
                ? design.getNumericalRelativeTolerance() : DEFAULT_STEP_TOLERANCE;
        SolverSettings settings = SolverSettings.builder().maximumCellSizeMetres(thickness / cells)
                .minimumCellsPerLayer(MINIMUM_CELLS_PER_LAYER).stepTolerance(tolerance).build();

        double pv = result.poreVolumes();
        double[] days = new double[shares.length];
        for (int i = 0; i < shares.length; i++) {
            days[i] = column.daysForPoreVolumes(shares[i] * pv);
        }
        FlushingRunRequest request = FlushingRunRequest.upToPoreVolumes(pv).profilesAtDays(days)
                .stopWhenTargetsReached(false).build();
        FlushingRunResult run = new NumericalFlushingSolver(column, settings).run(request);

        double top = zone.getTopDepthMetres();
        double weekFactor = 7.0 / design.getOperatingDaysPerWeek();
        List<DepthProfileSet.Profile> profiles = new ArrayList<>();
        for (int i = 0; i < run.profiles().size(); i++) {
            ResidualProfile p = run.profiles().get(i);
            double[] depth = p.depthMetres();
            for (int k = 0; k < depth.length; k++) {
                depth[k] += top;
            }
            profiles.add(new DepthProfileSet.Profile(shares[i], p.poreVolumes(), p.timeDays(), p.timeDays() * weekFactor,
                    depth, p.soilMilligramsPerKilogram(), p.meanResidualFraction(), p.maxResidualFraction()));
        }
        String iso = layers.get(0).isotherm().describe();
        String basis = String.format(Locale.ROOT, "numerical finite-volume solution over %d layer%s of the treated column "
                + "(%d cells, step tolerance %s), %s, clean water at %s m/d, run to the design's %.4g pore volumes; "
                + "mass-balance error %.2e", layers.size(), layers.size() == 1 ? "" : "s", run.cellCount(), tolerance,
                iso + (layers.size() > 1 && layers.get(0).isotherm().isLinear() ? " (Kd per layer)" : ""),
                design.getDarcyFluxMetresPerDay(), pv, run.massBalance().relativeError());
        return new DepthProfileSet(result.designName(), contaminantName, true, "", initial,
                row.cleanupLevelMilligramsPerKg(), top, zone.getBottomDepthMetres(), bases, pv, profiles,
                run.massBalance(), basis);
    }

    private static void requireInputs(Project project, FlushingDesignResult result) {
        if (project == null) {
            throw new IllegalArgumentException("project: null; allowed: the project the design result was computed from");
        }
        if (result == null) {
            throw new IllegalArgumentException("flushing design result: null; allowed: a result of DesignPipeline");
        }
    }

    private static FlushingDesign designOf(Project project, FlushingDesignResult result) {
        return project.getFlushingDesigns().stream().filter(d -> d.getName().equals(result.designName())).findFirst()
                .orElseThrow(() -> new IllegalArgumentException("flushing design '" + result.designName()
                        + "' is not in project '" + project.getName() + "'; allowed: the project the result came from"));
    }

    private static Contaminant contaminantOf(TreatmentZone zone, String name) {
        for (SourceConcentration s : zone.getSourceConcentrations()) {
            if (s.getContaminant() != null && s.getContaminant().getName().equals(name)) {
                return s.getContaminant();
            }
        }
        throw new IllegalArgumentException("contaminant '" + name + "' has no source concentration in zone '"
                + zone.getName() + "'; allowed: a contaminant of the zone");
    }

    /** Why the layered solution cannot describe the contaminant, or null (the pipeline's rule). */
    private static String unavailableReason(Contaminant c, NonequilibriumEntry entry) {
        return FlushingSolutions.numericalUnavailableReason(c, entry);
    }

    /** One layer slice as the pipeline's numerical run builds it (the same code). */
    private static eluvia.transport.numerical.SoilLayer layerOf(LayerCombination.Slice s, Contaminant c,
            NonequilibriumEntry entry, double decayPerDay) {
        return FlushingSolutions.numericalLayer(s, c, entry, decayPerDay,
                "correct the layer or the contaminant's parameters for the depth profile");
    }
}
