package eluvia.transport.numerical;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.stream.Stream;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * Mass balance of every kind of run to 1e-8 relative (machine-level bookkeeping), and the booked
 * amounts checked against quantities computed independently in the test: the final stored mass
 * from the output profile, the outflow from the effluent history (trapezoid rule, time-step
 * accuracy), the inflow from q C_in t.
 */
final class MassBalanceTest {

    static Stream<Arguments> cases() {
        SoilLayer top = Columns.sand(0.5, 0.05).isotherm(SorptionIsotherm.linear(0.4)).decayInWaterPerDay(0.01)
                .decayOnSolidsPerDay(0.002).freeWaterDiffusionSquareMetresPerSecond(1e-9).build();
        SoilLayer middle = SoilLayer.builder().thicknessMetres(0.8).waterContent(0.22).porosity(0.35)
                .bulkDensityKilogramsPerCubicMetre(1750).dispersivityMetres(0.08)
                .isotherm(SorptionIsotherm.freundlich(1.2, 0.8)).mobileWaterFraction(0.7).mobileSorbingSiteFraction(0.4)
                .massTransferRatePerDay(0.02).decayInWaterPerDay(0.005).build();
        SoilLayer bottom = Columns.sand(0.4, 0.02).isotherm(SorptionIsotherm.langmuir(50, 0.3)).build();
        SoilLayer twoSite = Columns.sand(1, 0.1).isotherm(SorptionIsotherm.linear(1)).mobileSorbingSiteFraction(0.3)
                .massTransferRatePerDay(0.1).build();
        return Stream.of(
                Arguments.of("linear with decay", List.of(top), 0.0, InitialCondition.poreWaterPerLayer(3)),
                Arguments.of("two-site linear", List.of(twoSite), 0.0, InitialCondition.soilPerLayer(25)),
                Arguments.of("three layers, all isotherms", List.of(top, middle, bottom), 0.0,
                        InitialCondition.soilPerLayer(10, 40, 0)),
                Arguments.of("contaminated inflow", List.of(top, bottom), 0.5, InitialCondition.poreWaterPerLayer(2, 0)));
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("cases")
    void balanceCloses(String name, List<SoilLayer> layers, double inflow, InitialCondition initial) {
        double q = 0.05;
        FlushingColumn col = new FlushingColumn(layers, q, inflow, initial);
        // a loose step tolerance keeps the test fast; the balance does not depend on it
        NumericalFlushingSolver solver = new NumericalFlushingSolver(col,
                SolverSettings.builder().stepTolerance(1e-3).build());
        double endDays = col.daysForPoreVolumes(6);
        FlushingRunResult r = solver.run(FlushingRunRequest.upToPoreVolumes(6).profilesAtDays(0, endDays / 3, endDays).build());
        MassBalance b = r.massBalance();
        // machine-level bookkeeping: 1e-8 relative (task requirement)
        assertTrue(Math.abs(b.relativeError()) < 1e-8, name + ": " + b);

        // stored mass from the profiles: sum of soil mg/kg x rho_b x dz x 1000 L/m3 [exact conversion]
        double[] dz = solver.cellSizesMetres();
        double[] rho = new double[dz.length];
        int i = 0;
        for (SoilLayer l : layers) {
            int cells = (int) Math.round(l.thicknessMetres() / dz[i]);
            for (int j = 0; j < cells; j++, i++) {
                rho[i] = l.bulkDensityKilogramsPerCubicMetre();
            }
        }
        assertEquals(dz.length, i);
        ResidualProfile first = r.profiles().get(0);
        ResidualProfile last = r.profiles().get(2);
        assertEquals(b.initialStoredMilligramsPerSquareMetre(), stored(first, rho, dz),
                1e-12 * b.initialStoredMilligramsPerSquareMetre());
        assertEquals(b.finalStoredMilligramsPerSquareMetre(), stored(last, rho, dz),
                1e-12 * b.initialStoredMilligramsPerSquareMetre());

        // outflow from the effluent history, q integral of C dt (trapezoid rule) x 1000 L/m3;
        // booked and integrated amounts differ by the time-step error, 1e-3 here
        double[] t = r.timesDays();
        double[] c = r.effluentMilligramsPerLitre();
        double integral = 0;
        for (int k = 1; k < t.length; k++) {
            integral += 0.5 * (c[k] + c[k - 1]) * (t[k] - t[k - 1]);
        }
        double outflow = q * integral * 1000;
        assertEquals(outflow, b.outflowMilligramsPerSquareMetre(),
                1e-3 * outflow + 1e-6 * (b.initialStoredMilligramsPerSquareMetre() + b.inflowMilligramsPerSquareMetre()));
        // inflow q C_in t x 1000 L/m3
        assertEquals(q * inflow * endDays * 1000, b.inflowMilligramsPerSquareMetre(), 1e-6 * (q * endDays * 1000));
        assertEquals(6, r.finalPoreVolumes(), 1e-9);
    }

    private static double stored(ResidualProfile p, double[] rhoKilogramsPerCubicMetre, double[] dzMetres) {
        double[] soil = p.soilMilligramsPerKilogram();
        double sum = 0;
        for (int k = 0; k < soil.length; k++) {
            sum += soil[k] * rhoKilogramsPerCubicMetre[k] * dzMetres[k];
        }
        return sum;
    }
}
