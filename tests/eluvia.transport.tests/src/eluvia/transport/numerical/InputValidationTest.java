package eluvia.transport.numerical;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.function.UnaryOperator;
import java.util.stream.Stream;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.function.Executable;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;

import eluvia.transport.CleanupCriterion;
import eluvia.transport.TransportInputException;

/** Every bad input throws TransportInputException naming the quantity, the value and the range. */
final class InputValidationTest {

    private static void assertRejected(String quantityPart, String valuePart, Executable call) {
        TransportInputException e = assertThrows(TransportInputException.class, call);
        assertTrue(e.quantity().contains(quantityPart), "quantity '" + e.quantity() + "' should name " + quantityPart);
        assertEquals(valuePart, e.value(), e.getMessage());
        assertTrue(!e.allowedRange().isBlank() && e.getMessage().contains(e.allowedRange()), e.getMessage());
    }

    private static SoilLayer.Builder good() {
        return Columns.sand(1, 0.1);
    }

    static Stream<Arguments> badLayers() {
        List<Arguments> list = new ArrayList<>();
        add(list, "thickness", "0.0", b -> b.thicknessMetres(0));
        add(list, "thickness", "NaN", b -> b.thicknessMetres(Double.NaN));
        add(list, "porosity", "1.0", b -> b.porosity(1));
        add(list, "porosity", "0.0", b -> b.porosity(0));
        add(list, "water content", "0.45", b -> b.waterContent(0.45));
        add(list, "water content", "0.0", b -> b.waterContent(0));
        add(list, "bulk density", "1.6", b -> b.bulkDensityKilogramsPerCubicMetre(1.6));
        add(list, "bulk density", "3500.0", b -> b.bulkDensityKilogramsPerCubicMetre(3500));
        add(list, "dispersivity", "-0.1", b -> b.dispersivityMetres(-0.1));
        add(list, "diffusion", "-1.0E-9", b -> b.freeWaterDiffusionSquareMetresPerSecond(-1e-9));
        add(list, "diffusion", "8.64E-5", b -> b.freeWaterDiffusionSquareMetresPerSecond(8.64e-5));
        add(list, "decay rate in water", "-0.01", b -> b.decayInWaterPerDay(-0.01));
        add(list, "decay rate on solids", "Infinity", b -> b.decayOnSolidsPerDay(Double.POSITIVE_INFINITY));
        add(list, "mobile water fraction", "0.0", b -> b.mobileWaterFraction(0));
        add(list, "mobile water fraction", "1.2", b -> b.mobileWaterFraction(1.2));
        add(list, "sorbing sites", "-0.1", b -> b.mobileSorbingSiteFraction(-0.1));
        add(list, "sorbing sites", "1.5", b -> b.mobileSorbingSiteFraction(1.5));
        add(list, "mass-transfer rate", "-1.0", b -> b.massTransferRatePerDay(-1));
        return list.stream();
    }

    private static void add(List<Arguments> list, String quantity, String value, UnaryOperator<SoilLayer.Builder> change) {
        list.add(Arguments.of(quantity, value, change));
    }

    @ParameterizedTest(name = "{0} = {1}")
    @MethodSource("badLayers")
    void badLayerProperty(String quantity, String value, UnaryOperator<SoilLayer.Builder> change) {
        assertRejected(quantity, value, () -> change.apply(good()).build());
    }

    @Test
    void badIsotherms() {
        assertRejected("Kd", "-1.0", () -> SorptionIsotherm.linear(-1));
        assertRejected("Freundlich coefficient", "-2.0", () -> SorptionIsotherm.freundlich(-2, 0.8));
        assertRejected("Freundlich exponent", "0.0", () -> SorptionIsotherm.freundlich(2, 0));
        assertRejected("Freundlich exponent", "2.5", () -> SorptionIsotherm.freundlich(2, 2.5));
        assertRejected("Langmuir capacity", "0.0", () -> SorptionIsotherm.langmuir(0, 0.1));
        assertRejected("Langmuir constant", "NaN", () -> SorptionIsotherm.langmuir(10, Double.NaN));
    }

    @Test
    void badColumns() {
        SoilLayer l = good().build();
        InitialCondition ic = InitialCondition.poreWaterPerLayer(1);
        assertRejected("number of soil layers", "0", () -> new FlushingColumn(List.of(), 0.1, 0, ic));
        assertRejected("soil layer [1]", "null", () -> new FlushingColumn(Arrays.asList(l, null), 0.1, 0,
                InitialCondition.poreWaterPerLayer(1, 1)));
        assertRejected("Darcy flux", "0.0", () -> FlushingColumn.singleLayer(l, 0, 0, ic));
        assertRejected("Darcy flux", "864.0", () -> FlushingColumn.singleLayer(l, 864, 0, ic));
        assertRejected("inflow concentration", "-1.0", () -> FlushingColumn.singleLayer(l, 0.1, -1, ic));
        assertRejected("initial condition", "null", () -> FlushingColumn.singleLayer(l, 0.1, 0, null));
        assertRejected("number of initial concentrations", "2",
                () -> FlushingColumn.singleLayer(l, 0.1, 0, InitialCondition.soilPerLayer(1, 2)));
        assertRejected("initial pore-water concentration per layer (mg/L) [1]", "-3.0",
                () -> InitialCondition.poreWaterPerLayer(1, -3));
        assertRejected("initial soil concentration per layer", "[]", () -> InitialCondition.soilPerLayer());
        assertRejected("per cell", "NaN", () -> InitialCondition.poreWaterPerCell(1, Double.NaN));
        assertRejected("soil concentration", "-5.0", () -> InitialCondition.poreWaterInEquilibrium(l, -5));
    }

    @Test
    void badSettings() {
        assertRejected("minimum cells per layer", "0", () -> SolverSettings.builder().minimumCellsPerLayer(0).build());
        assertRejected("maximum cell size", "0.0", () -> SolverSettings.builder().maximumCellSizeMetres(0).build());
        assertRejected("maximum cell count", "0", () -> SolverSettings.builder().maximumCellCount(0).build());
        assertRejected("maximum cell Peclet", "3.0", () -> SolverSettings.builder().maximumCellPeclet(3).build());
        assertRejected("minimum time step", "0.0", () -> SolverSettings.builder().minimumStepPoreVolumes(0).build());
        assertRejected("maximum time step", "1.0E-10", () -> SolverSettings.builder().maximumStepPoreVolumes(1e-10).build());
        assertRejected("initial time step", "0.5", () -> SolverSettings.builder().initialStepPoreVolumes(0.5).build());
        assertRejected("time-step tolerance", "0.0", () -> SolverSettings.builder().stepTolerance(0).build());
        assertRejected("concentration floor", "1.0", () -> SolverSettings.builder().concentrationFloorFraction(1).build());
        assertRejected("Newton relative tolerance", "0.1", () -> SolverSettings.builder().newtonRelativeTolerance(0.1).build());
        assertRejected("Newton iterations", "0", () -> SolverSettings.builder().maximumNewtonIterations(0).build());
    }

    @Test
    void badRequests() {
        assertRejected("run length", "0.0", () -> FlushingRunRequest.upToPoreVolumes(0).build());
        assertRejected("run length", "2000000.0", () -> FlushingRunRequest.upToPoreVolumes(2e6).build());
        assertRejected("target fraction", "1.0",
                () -> FlushingRunRequest.upToPoreVolumes(10).target(CleanupCriterion.EFFLUENT, 1));
        assertRejected("target fraction", "0.0", () -> FlushingRunRequest.upToPoreVolumes(10).targetForAll(0));
        assertRejected("cleanup criterion", "null", () -> FlushingRunRequest.upToPoreVolumes(10).target(null, 0.1));
        assertRejected("profile time [1]", "-1.0", () -> FlushingRunRequest.upToPoreVolumes(10).profilesAtDays(1, -1));
    }

    @Test
    void badRuns() {
        SoilLayer l = good().build();
        assertRejected("number of initial pore-water concentrations", "3", () -> new NumericalFlushingSolver(
                FlushingColumn.singleLayer(l, 0.1, 0, InitialCondition.poreWaterPerCell(1, 2, 3)), SolverSettings.defaults()));
        assertRejected("number of cells", "300", () -> new NumericalFlushingSolver(
                FlushingColumn.singleLayer(l, 0.1, 0, InitialCondition.poreWaterPerLayer(1)),
                SolverSettings.builder().minimumCellsPerLayer(300).maximumCellCount(200).build()));
        NumericalFlushingSolver clean = new NumericalFlushingSolver(
                FlushingColumn.singleLayer(l, 0.1, 0, InitialCondition.poreWaterPerLayer(0)), SolverSettings.defaults());
        assertRejected("initial contamination", "0.0",
                () -> clean.run(FlushingRunRequest.upToPoreVolumes(1).targetForAll(0.1).build()));
        // 1 pore volume of this column is 3 days
        assertRejected("profile time", "4.0", () -> clean.run(FlushingRunRequest.upToPoreVolumes(1).profilesAtDays(4).build()));
        assertRejected("run request", "null", () -> clean.run(null));
        assertRejected("flushing column", "null", () -> new NumericalFlushingSolver(null, SolverSettings.defaults()));
        assertRejected("solver settings", "null", () -> new NumericalFlushingSolver(
                FlushingColumn.singleLayer(l, 0.1, 0, InitialCondition.poreWaterPerLayer(1)), null));
    }
}
