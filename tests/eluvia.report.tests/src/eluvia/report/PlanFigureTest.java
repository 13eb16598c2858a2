package eluvia.report;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.junit.jupiter.api.Test;

import eluvia.cost.PitFootprint;
import eluvia.design.ContaminantZone;
import eluvia.design.EnlargementPoint;
import eluvia.design.ZoneAnalysis;
import eluvia.design.ZoneEnlargement;
import eluvia.report.chart.Outline;
import eluvia.report.chart.PlanView;
import eluvia.report.chart.ValueGrid;
import eluvia.report.content.FigureUnits;
import eluvia.report.content.ResultFigures;
import eluvia.site.model.Contaminant;
import eluvia.site.model.TreatmentZone;
import eluvia.site.model.Vertex;
import eluvia.zone.BlockEstimate;
import eluvia.zone.BlockModel;
import eluvia.zone.ContaminantEstimate;
import eluvia.zone.ExceedanceZone;
import eluvia.zone.PlanPoint;

/**
 * The plan of the shipped example: the block model's columns, the proposed zone and the entered
 * zone grown by the enlargement's plan growth, as the design run computed them.
 */
final class PlanFigureTest {

    private static final ZoneAnalysis ZONES = ExampleRun.RUN.zoneAnalysis();

    private static Contaminant contaminant(String name) {
        return ExampleRun.PROJECT.getContaminants().stream().filter(c -> c.getName().equals(name)).findFirst().orElseThrow();
    }

    private static PlanView plan(Contaminant c) {
        return ResultFigures.plan(ExampleRun.PROJECT, c, ZONES, ExampleRun.RUN.enlargements());
    }

    private static Outline outline(PlanView v, Outline.Kind kind) {
        return v.outlines().stream().filter(o -> o.kind() == kind).findFirst()
                .orElseThrow(() -> new AssertionError("no " + kind + " outline in " + v.outlines()));
    }

    @Test
    void everyColumnOfTheBlockModelShowsItsHighestEstimateOverDepth() {
        assertTrue(ZONES.available(), ZONES.unavailableReason());
        for (ContaminantZone cz : ZONES.contaminants()) {
            PlanView v = plan(contaminant(cz.contaminantName()));
            ValueGrid g = v.grid();
            assertNotNull(g, cz.contaminantName());
            BlockEstimate e = cz.estimate();
            BlockModel m = e.blockModel();
            // the example's model is small enough to be drawn column by column (no grouping)
            assertTrue(m.countEasting() <= ValueGrid.MAX_CELLS_PER_SIDE && m.countNorthing() <= ValueGrid.MAX_CELLS_PER_SIDE);
            assertEquals(m.countEasting(), g.countX());
            assertEquals(m.countNorthing(), g.countY());
            assertEquals(m.originEastingMetres(), g.originX(), 0.0);
            assertEquals(m.blockEastingMetres(), g.cellWidth(), 0.0);
            int above = 0;
            int drawn = 0;
            for (int j = 0; j < m.countNorthing(); j++) {
                for (int i = 0; i < m.countEasting(); i++) {
                    // the definition of the column's value: the largest estimate of its blocks (from the top down)
                    double max = Double.NaN;
                    for (int k = 0; k < m.countDepth(); k++) {
                        double c = e.concentrationMgPerKg(m.blockIndex(i, j, k));
                        if (!Double.isNaN(c) && (Double.isNaN(max) || c > max)) {
                            max = c;
                        }
                    }
                    assertEquals(max, g.valueAt(i, j), 0.0, "column " + i + ", " + j);
                    above += g.valueAt(i, j) > cz.cleanupLevelMilligramsPerKg() ? 1 : 0;
                    drawn += Double.isNaN(g.valueAt(i, j)) ? 0 : 1;
                }
            }
            // a column is above the level when one of its blocks is: the zone bundle's plan cells of this contaminant
            int cells = ExceedanceZone.find(new ContaminantEstimate(cz.contaminantName(), e, cz.cleanupLevelMilligramsPerKg()))
                    .planCells().size();
            assertEquals(cells, above, cz.contaminantName());
            assertTrue(above > 0, "the example has soil above the cleanup level of " + cz.contaminantName());
            // the colour scale changes at the cleanup level
            assertEquals(cz.cleanupLevelMilligramsPerKg(), v.valueMarker().value(), 0.0);
            // the CSV has a row per drawn column
            long rows = v.data().rows().stream().filter(r -> r.get(0).equals("cell")).count();
            assertEquals(drawn, rows);
        }
    }

    @Test
    void theProposedZoneIsTheZoneAnalysisFootprint() {
        PlanView v = plan(contaminant("Benzene"));
        Outline proposed = outline(v, Outline.Kind.PROPOSED);
        List<PlanPoint> hull = ZONES.proposedZone().footprint().vertices();
        assertArrayEquals(hull.stream().mapToDouble(PlanPoint::eastingMetres).toArray(), proposed.x(), 0.0);
        assertArrayEquals(hull.stream().mapToDouble(PlanPoint::northingMetres).toArray(), proposed.y(), 0.0);
        // and the CSV lists its corners
        assertEquals(hull.size(), v.data().rows().stream().filter(r -> r.get(1).equals(proposed.name())).count());
    }

    @Test
    void theEnlargedOutlineLiesOutsideTheEnteredZoneByThePlanGrowthOfTheRun() {
        ZoneEnlargement e = ExampleRun.RUN.enlargements().get(0);
        assertTrue(e.available(), e.unavailableReason());
        EnlargementPoint last = e.envelope().get(e.envelope().size() - 1);
        double growth = last.planGrowthMetres();
        assertTrue(growth > 0, "the example's zone grows while the remedy waits: " + growth);
        PlanView v = plan(contaminant("Benzene"));
        Outline grown = outline(v, Outline.Kind.ENLARGED);
        assertTrue(grown.name().startsWith(e.zoneName() + " after " + eluvia.report.content.InputTables.number(last.delayYears())
                + " yr"), grown.name());
        TreatmentZone zone = ExampleRun.PROJECT.getSite().getZones().get(0);
        double[] zx = zone.getFootprint().stream().mapToDouble(Vertex::getEastingMetres).toArray();
        double[] zy = zone.getFootprint().stream().mapToDouble(Vertex::getNorthingMetres).toArray();
        double[] gx = grown.x();
        double[] gy = grown.y();
        assertEquals(zx.length, gx.length);
        // every side of the grown outline runs parallel to a side of the entered one at the plan growth's distance
        // (point-to-line distance |cross| / |side|, a formula), and every corner of the entered zone lies inside it
        for (int s = 0; s < gx.length; s++) {
            double ax = gx[s];
            double ay = gy[s];
            double bx = gx[(s + 1) % gx.length];
            double by = gy[(s + 1) % gx.length];
            boolean parallelSideFound = false;
            for (int t = 0; t < zx.length; t++) {
                double px = zx[t];
                double py = zy[t];
                double qx = zx[(t + 1) % zx.length];
                double qy = zy[(t + 1) % zx.length];
                double len = Math.hypot(qx - px, qy - py);
                double da = Math.abs((qx - px) * (ay - py) - (qy - py) * (ax - px)) / len;
                double db = Math.abs((qx - px) * (by - py) - (qy - py) * (bx - px)) / len;
                double cross = (qx - px) * (by - ay) - (qy - py) * (bx - ax);
                if (Math.abs(cross) < 1e-9 * len * Math.hypot(bx - ax, by - ay) && Math.abs(da - growth) < 1e-9
                        && Math.abs(db - growth) < 1e-9) {
                    parallelSideFound = true;
                }
            }
            assertTrue(parallelSideFound, "side " + s + " of the grown outline is not " + growth + " m off a side of the zone");
        }
        for (int t = 0; t < zx.length; t++) {
            assertTrue(inside(gx, gy, zx[t], zy[t]), "corner " + t + " of the zone is inside the grown outline");
        }
        // its area is the one the cost of delay prices: A + P d + K d^2 of the zone's outline (eluvia.cost PitFootprint),
        // and for the example's rectangle W x H simply (W + 2d)(H + 2d) (formula)
        double area = shoelace(gx, gy);
        assertEquals(PitFootprint.convexPolygon(zx, zy).offset(growth).areaSquareMetres(), area, 1e-9 * area);
        double w = java.util.Arrays.stream(zx).max().orElseThrow() - java.util.Arrays.stream(zx).min().orElseThrow();
        double h = java.util.Arrays.stream(zy).max().orElseThrow() - java.util.Arrays.stream(zy).min().orElseThrow();
        assertEquals((w + 2 * growth) * (h + 2 * growth), area, 1e-9 * area);
    }

    @Test
    void usCustomaryFiguresAreTheSiFiguresInFeetAndCubicYards() {
        // 1 ft = 0.3048 m exactly (the international foot of 1959; NIST SP 811, 2008, Appendix B.8), 1 yd = 3 ft
        double metresPerFoot = 0.3048;
        double cubicMetresPerCubicYard = Math.pow(3 * metresPerFoot, 3);
        Contaminant benzene = contaminant("Benzene");
        PlanView si = plan(benzene);
        PlanView us = ResultFigures.plan(ExampleRun.PROJECT, benzene, ZONES, ExampleRun.RUN.enlargements(),
                FigureUnits.US_CUSTOMARY);
        // the design package's figure is the SI one
        assertEquals(si, ResultFigures.plan(ExampleRun.PROJECT, benzene, ZONES, ExampleRun.RUN.enlargements(), FigureUnits.SI));
        assertEquals("m", si.eastingAxis().unit());
        assertEquals("ft", us.eastingAxis().unit());
        assertEquals("ft", us.northingAxis().unit());
        assertEquals("mg/kg", us.valueAxis().unit(), "concentrations are not converted");
        assertEquals(si.points().size(), us.points().size());
        for (int i = 0; i < si.points().size(); i++) {
            assertEquals(si.points().get(i).x(), us.points().get(i).x() * metresPerFoot, 1e-12 * Math.abs(si.points().get(i).x()));
            assertEquals(si.points().get(i).y(), us.points().get(i).y() * metresPerFoot, 1e-12 * Math.abs(si.points().get(i).y()));
            assertEquals(si.points().get(i).value(), us.points().get(i).value(), 0.0);
        }
        for (int o = 0; o < si.outlines().size(); o++) {
            double[] x = si.outlines().get(o).x();
            double[] ux = us.outlines().get(o).x();
            for (int i = 0; i < x.length; i++) {
                assertEquals(x[i], ux[i] * metresPerFoot, 1e-12 * Math.max(1, Math.abs(x[i])));
            }
        }
        assertEquals(si.grid().cellWidth(), us.grid().cellWidth() * metresPerFoot, 1e-12 * si.grid().cellWidth());
        assertEquals(si.grid().endY(), us.grid().endY() * metresPerFoot, 1e-12 * si.grid().endY());
        assertArrayEquals(si.grid().values(), us.grid().values(), 0.0);

        var siVolume = ResultFigures.enlargement(ExampleRun.RUN.enlargements());
        var usVolume = ResultFigures.enlargement(ExampleRun.RUN.enlargements(), FigureUnits.US_CUSTOMARY);
        assertEquals("yd\u00b3", usVolume.yAxis().unit());
        double[] m3 = siVolume.series().get(0).y();
        double[] yd3 = usVolume.series().get(0).y();
        for (int i = 0; i < m3.length; i++) {
            assertEquals(m3[i], yd3[i] * cubicMetresPerCubicYard, 1e-12 * Math.max(1, m3[i]));
        }
        assertArrayEquals(siVolume.series().get(0).x(), usVolume.series().get(0).x(), 0.0, "delays stay in years");

        var siSection = ResultFigures.section(ExampleRun.PROJECT, ExampleRun.RUN.enlargements().get(0));
        var usSection = ResultFigures.section(ExampleRun.PROJECT, ExampleRun.RUN.enlargements().get(0),
                FigureUnits.US_CUSTOMARY);
        assertEquals("ft", usSection.depthAxis().unit());
        assertEquals(siSection.verticalExaggeration(), usSection.verticalExaggeration(), 0.0);
        for (int i = 0; i < siSection.depthMarkers().size(); i++) {
            double m = siSection.depthMarkers().get(i).value();
            assertEquals(m, usSection.depthMarkers().get(i).value() * metresPerFoot, 1e-12 * m);
        }
    }

    private static boolean inside(double[] x, double[] y, double px, double py) {
        boolean in = false;
        for (int i = 0, j = x.length - 1; i < x.length; j = i++) {
            if ((y[i] > py) != (y[j] > py) && px < (x[j] - x[i]) * (py - y[i]) / (y[j] - y[i]) + x[i]) {
                in = !in;
            }
        }
        return in;
    }

    private static double shoelace(double[] x, double[] y) {
        double s = 0;
        for (int i = 0; i < x.length; i++) {
            int j = (i + 1) % x.length;
            s += x[i] * y[j] - x[j] * y[i];
        }
        return Math.abs(s) / 2;
    }
}
