package eluvia.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.junit.jupiter.api.Test;

import eluvia.cost.CostEstimate;
import eluvia.design.AlternativeResult;
import eluvia.design.ContaminantFlushing;
import eluvia.design.FlushingDesignResult;
import eluvia.report.chart.BarChart;
import eluvia.report.chart.LineChart;
import eluvia.report.chart.Outline;
import eluvia.report.chart.SectionView;
import eluvia.report.chart.XySeries;
import eluvia.design.EnlargementPoint;
import eluvia.design.ZoneEnlargement;
import eluvia.site.model.TreatmentZone;
import eluvia.site.model.Vertex;
import eluvia.report.content.ResultFigures;

/** The chart data shows the results the pipeline chose, nothing else. */
final class ResultFiguresTest {

    @Test
    void residualCurveOfTheControllingContaminantCrossesItsTargetAtTheDesignPoreVolumes() {
        for (FlushingDesignResult r : ExampleRun.RUN.flushing()) {
            if (!"EQUILIBRIUM".equals(r.solutionMethod()) || r.controllingContaminant() == null) {
                continue;
            }
            LineChart chart = ResultFigures.residualCurves(r);
            ContaminantFlushing c = r.contaminants().stream()
                    .filter(x -> x.contaminantName().equals(r.controllingContaminant())).findFirst().orElseThrow();
            XySeries s = chart.series().stream().filter(x -> x.name().equals(c.contaminantName() + ", "
                    + r.criterion().description() + " (equilibrium)")).findFirst().orElseThrow();
            double[] x = s.x();
            double[] y = s.y();
            // at T = 0 nothing is flushed yet: C/C0 = 1 (initial condition of every solution)
            assertEquals(0.0, x[0], 0.0);
            assertEquals(1.0, y[0], 1e-9);
            // the curve falls through the target between the two grid points around the design pore volumes;
            // the pore volumes are found to 1e-9 relative (PoreVolumeSearch), so a grid point next to them may
            // sit on either side of the target by that much
            int i = 1;
            while (x[i] < r.poreVolumes()) {
                i++;
            }
            assertTrue(y[i - 1] >= c.targetFraction() * (1 - 1e-9) && y[i] <= c.targetFraction() * (1 + 1e-9),
                    r.designName() + ": " + y[i - 1] + " .. " + y[i] + " around target " + c.targetFraction());
            assertEquals(r.poreVolumes(), chart.xMarkers().get(0).value(), 0.0);
        }
    }

    @Test
    void stackedCostsAddUpToEachPresentValue() {
        String currency = ExampleRun.RUN.alternatives().stream().filter(a -> a.estimate() != null).findFirst()
                .orElseThrow().estimate().currency();
        BarChart chart = ResultFigures.costBreakdown(ExampleRun.RUN.alternatives(), currency);
        assertNotNull(chart);
        for (int i = 0; i < chart.categories().size(); i++) {
            String name = chart.categories().get(i);
            AlternativeResult a = ExampleRun.RUN.alternative(name).orElseThrow();
            CostEstimate e = a.estimate();
            double sum = 0;
            for (var s : chart.series()) {
                sum += s.values()[i];
            }
            // EPA 540-R-00-002: present value = capital + PV of annual O&M + PV of periodic costs
            assertEquals(e.presentValue().amount(), sum, 1e-9 * e.presentValue().amount(), name);
        }
        assertNull(ResultFigures.costBreakdown(ExampleRun.RUN.alternatives(), "XXX"));
        assertNull(ResultFigures.enlargement(List.of()));
    }

    @Test
    void sectionShowsTheEnteredZoneAndTheEnlargedOnesToTheirDepths() {
        for (ZoneEnlargement e : ExampleRun.RUN.enlargements()) {
            SectionView v = ResultFigures.section(ExampleRun.PROJECT, e);
            if (!e.available()) {
                assertNull(v);
                continue;
            }
            TreatmentZone z = ExampleRun.PROJECT.getSite().getZones().stream()
                    .filter(x -> x.getName().equals(e.zoneName())).findFirst().orElseThrow();
            double min = z.getFootprint().stream().mapToDouble(Vertex::getEastingMetres).min().orElseThrow();
            double max = z.getFootprint().stream().mapToDouble(Vertex::getEastingMetres).max().orElseThrow();
            Outline entered = v.outlines().stream().filter(o -> o.name().endsWith("as entered")).findFirst().orElseThrow();
            assertEquals(max - min, width(entered), 1e-9);
            assertEquals(z.getTopDepthMetres(), entered.y()[0], 0.0);
            assertEquals(z.getBottomDepthMetres(), entered.y()[2], 0.0);
            for (EnlargementPoint pt : e.envelope()) {
                if (pt.delayYears() == 0) {
                    continue;
                }
                Outline o = v.outlines().stream().filter(x -> x.name().equals("after "
                        + eluvia.report.content.InputTables.number(pt.delayYears()) + " yr")).findFirst().orElseThrow();
                // widened by the plan growth on both sides, between the depths the pipeline found
                assertEquals(max - min + 2 * pt.planGrowthMetres(), width(o), 1e-9);
                assertEquals(pt.bottomDepthMetres(), o.y()[2], 0.0);
            }
        }
    }

    private static double width(Outline o) {
        return o.x()[1] - o.x()[0];
    }

    @Test
    void figureIdsAreSafeFileNames() {
        assertEquals("residual-zone-a-5-days", ResultFigures.id("residual", "Zone A: 5 days!"));
        assertTrue(ResultFigures.id("x", "a".repeat(100)).length() <= 64);
    }
}
