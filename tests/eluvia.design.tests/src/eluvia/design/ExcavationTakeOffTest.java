package eluvia.design;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

import eluvia.cost.Caution;
import eluvia.cost.ExcavationQuantities;
import eluvia.site.model.ComplianceCriterion;
import eluvia.site.model.ExcavationDesign;
import eluvia.site.model.ExcavationSoilType;
import eluvia.site.model.Project;
import eluvia.site.model.SoilLayer;
import eluvia.site.model.TreatmentZone;

final class ExcavationTakeOffTest {

    /**
     * A project built in the test: two layers, 0-1 m (rho_b 1600 kg/m3, theta 0.30, swell 0.20,
     * shrinkage 0.10) and 1-5 m (rho_b 1800 kg/m3, theta 0.20, swell 0.30, shrinkage 0.15); a zone
     * with a 20 m x 10 m rectangular footprint from 0.5 to 2.5 m deep; one excavation design with
     * 0.25 m overdig, Type B soil, trucks of 15 m3 and 20000 kg.
     */
    private static Project project(boolean slopeEntered, double slope) {
        Project p = TestProjects.singleLayer(0.2, 1, ComplianceCriterion.EFFLUENT);
        SoilLayer top = p.getSite().getLayers().get(0);
        top.setBottomDepthMetres(1);
        top.setSwellFactor(0.20);
        top.setShrinkageFactor(0.10);
        SoilLayer deep = TestProjects.layer("deep sand", 1, 5, 1800, 0.30, 0.20, 0.001, 1.0, 0.2);
        deep.setSwellFactor(0.30);
        deep.setShrinkageFactor(0.15);
        p.getSite().getLayers().add(deep);
        TreatmentZone z = p.getSite().getZones().get(0);
        TestProjects.rectangle(z, 0, 0, 20, 10);
        z.setTopDepthMetres(0.5);
        z.setBottomDepthMetres(2.5);
        ExcavationDesign x = TestProjects.excavation("dig", z, ExcavationSoilType.TYPE_B, 0.25);
        if (slopeEntered) {
            x.setSideSlopeHorizontalPerVertical(slope);
        }
        p.getExcavationDesigns().add(x);
        return p;
    }

    private static DesignSettings fast() {
        return DesignSettings.builder().pushDownBelowColumn(false).build();
    }

    /** Prismoidal formula h/6 (A1 + 4 Am + A2) for a pit on a rectangular bottom L x W (exact for it). */
    private static double prismoidal(double l, double w, double h, double m) {
        double a1 = l * w;
        double am = (l + m * h) * (w + m * h);
        double a2 = (l + 2 * m * h) * (w + 2 * m * h);
        return h / 6 * (a1 + 4 * am + a2);
    }

    @Test
    void pitVolumesFollowThePrismoidalFormulaByHand() {
        ExcavationResult r = DesignPipeline.run(project(false, 0), fast(), DesignProgress.NONE).excavations().get(0);
        ExcavationQuantities q = r.quantities();
        // slope not entered: Type B from US OSHA 29 CFR 1926 Subpart P App. B Table B-1, 1:1 (REFERENCES.md [PUB])
        assertTrue(r.slopeBasis().contains("Type B"), r.slopeBasis());
        // bottom = zone offset by the 0.25 m overdig: 20.5 m x 10.5 m at 2.5 + 0.25 = 2.75 m
        assertEquals(2.75, q.pitDepthMetres(), 1e-12);
        // prismoidal formula by hand (REFERENCES.md, Excavation)
        double pit = prismoidal(20.5, 10.5, 2.75, 1.0);
        assertEquals(pit, q.pitBankVolumeCubicMetres(), 1e-9 * pit);
        // REFERENCES.md closed form V = h [L W + m h (L + W) + (4/3) m^2 h^2] agrees with it
        assertEquals(2.75 * (20.5 * 10.5 + 2.75 * 31 + 4.0 / 3 * 2.75 * 2.75), pit, 1e-9 * pit);
        // contaminated = the part below the zone top (2.25 m of the same pit), overburden the rest
        double contaminated = prismoidal(20.5, 10.5, 2.25, 1.0);
        assertEquals(contaminated, q.contaminatedBankVolumeCubicMetres(), 1e-9 * pit);
        assertEquals(pit - contaminated, q.overburdenBankVolumeCubicMetres(), 1e-9 * pit);
        // pit top at the surface: (20.5 + 2 x 2.75) x (10.5 + 2 x 2.75) = 26 x 16 = 416 m2
        assertEquals(416, q.pitTop().areaSquareMetres(), 1e-9);
        // soil factors thickness-weighted over 0-2.75 m: 1 m of the top layer, 1.75 m of the deep one (by hand)
        double swell = (1 * 0.20 + 1.75 * 0.30) / 2.75;
        double shrink = (1 * 0.10 + 1.75 * 0.15) / 2.75;
        // bank density with the pore water: (rho_b + 1000 theta) / 1000 t/m3 (common practice)
        double density = (1 * (1.6 + 0.30) + 1.75 * (1.8 + 0.20)) / 2.75;
        assertEquals(contaminated * (1 + swell), q.contaminatedLooseVolumeCubicMetres(), 1e-9 * pit);
        assertEquals(contaminated * density, q.contaminatedMassTonnes(), 1e-9 * pit);
        // loads: the larger of loose / heaped capacity and mass / payload, rounded up (REFERENCES.md)
        long loads = (long) Math.max(Math.ceil(contaminated * (1 + swell) / 15), Math.ceil(contaminated * density / 20));
        assertEquals(loads, q.contaminatedLoads());
        // reused overburden fills overburden x (1 - shrinkage); backfill back to grade = pit bank volume
        assertEquals(pit, q.backfillCompactedVolumeCubicMetres(), 1e-9 * pit);
        assertEquals((pit - contaminated) * (1 - shrink), q.reusedOverburdenCompactedVolumeCubicMetres(), 1e-9 * pit);
        // 2.75 m deep > 1.52 m (5 ft): protective system caution (US OSHA 29 CFR 1926 Subpart P; REFERENCES.md)
        assertTrue(q.cautions().stream().anyMatch(c -> c.code().equals(Caution.PROTECTIVE_SYSTEM)));
        assertFalse(q.cautions().stream().anyMatch(c -> c.code().equals(Caution.SLOPE_STEEPER_THAN_TABLE)));
    }

    @Test
    void anEnteredSlopeIsUsedAndASteepOneRaisesTheCaution() {
        ExcavationQuantities flat = DesignPipeline.run(project(true, 2.0), fast(), DesignProgress.NONE).excavations()
                .get(0).quantities();
        double pit = prismoidal(20.5, 10.5, 2.75, 2.0); // prismoidal formula by hand, m = 2
        assertEquals(pit, flat.pitBankVolumeCubicMetres(), 1e-9 * pit);
        ExcavationQuantities steep = DesignPipeline.run(project(true, 0.5), fast(), DesignProgress.NONE).excavations()
                .get(0).quantities();
        // 0.5 H:1V is steeper than the 1:1 of Type B soil (Table B-1, REFERENCES.md [PUB])
        assertTrue(steep.cautions().stream().anyMatch(c -> c.code().equals(Caution.SLOPE_STEEPER_THAN_TABLE)));
    }

    @Test
    void excavationCautionIsAmongTheRunCautions() {
        DesignRun run = DesignPipeline.run(project(false, 0), fast(), DesignProgress.NONE);
        assertTrue(run.cautions().contains(Cautions.EXCAVATION_SAFETY));
    }
}
