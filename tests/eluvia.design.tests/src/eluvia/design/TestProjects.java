package eluvia.design;

import eluvia.site.model.CleanupLevel;
import eluvia.site.model.ExcavationDesign;
import eluvia.site.model.ExcavationSoilType;
import eluvia.site.model.PriceBook;
import eluvia.site.model.PriceItem;
import eluvia.site.model.Sample;
import eluvia.site.model.SamplingLocation;
import eluvia.site.model.Vertex;
import eluvia.site.model.ComplianceCriterion;
import eluvia.site.model.Contaminant;
import eluvia.site.model.FlushingDesign;
import eluvia.site.model.Project;
import eluvia.site.model.Site;
import eluvia.site.model.SiteFactory;
import eluvia.site.model.SoilLayer;
import eluvia.site.model.SourceConcentration;
import eluvia.site.model.TreatmentZone;

/** Builds small projects in code for the tests (test data, not a shipped example). */
final class TestProjects {

    private TestProjects() {
    }

    static SoilLayer layer(String name, double top, double bottom, double rho, double n, double theta, double foc,
            double ks, double alpha) {
        SoilLayer l = SiteFactory.eINSTANCE.createSoilLayer();
        l.setName(name);
        l.setTextureClass("sand");
        l.setTopDepthMetres(top);
        l.setBottomDepthMetres(bottom);
        l.setBulkDensityKgPerCubicMetre(rho);
        l.setPorosity(n);
        l.setWaterContent(theta);
        l.setOrganicCarbonFraction(foc);
        l.setSaturatedConductivityMetresPerDay(ks);
        l.setDispersivityMetres(alpha);
        return l;
    }

    /**
     * One layer 0-2 m with rho_b = 1600 kg/m3, theta = 0.3, foc = 0.002; one contaminant with
     * Koc = 59 L/kg (the REFERENCES.md retardation check case, R = 1.6293); source 100 mg/kg,
     * cleanup level {@code level} mg/kg; zone 0-2 m over 100 m2; flux 0.05 m/d.
     */
    static Project singleLayer(double alphaMetres, double levelMgPerKg, ComplianceCriterion criterion) {
        Project p = SiteFactory.eINSTANCE.createProject();
        p.setName("test project");
        p.setDescription("built in the test");
        p.setSchemaVersion(1);
        Site s = SiteFactory.eINSTANCE.createSite();
        s.setName("test site");
        p.setSite(s);
        s.getLayers().add(layer("sand", 0, 2, 1600, 0.35, 0.30, 0.002, 1.0, alphaMetres));
        Contaminant c = SiteFactory.eINSTANCE.createContaminant();
        c.setName("benzene");
        c.setCasNumber("71-43-2");
        c.setKocLitresPerKg(59);
        c.setDiffusionSquareMetresPerSecond(1e-9);
        p.getContaminants().add(c);
        CleanupLevel level = SiteFactory.eINSTANCE.createCleanupLevel();
        level.setContaminant(c);
        level.setSoilLevelMilligramsPerKg(levelMgPerKg);
        level.setBasis("test value");
        p.getCleanupLevels().add(level);
        TreatmentZone z = SiteFactory.eINSTANCE.createTreatmentZone();
        z.setName("zone A");
        z.setAreaSquareMetres(100);
        z.setTopDepthMetres(0);
        z.setBottomDepthMetres(2);
        SourceConcentration sc = SiteFactory.eINSTANCE.createSourceConcentration();
        sc.setContaminant(c);
        sc.setSoilConcentrationMilligramsPerKg(100);
        z.getSourceConcentrations().add(sc);
        s.getZones().add(z);
        FlushingDesign d = SiteFactory.eINSTANCE.createFlushingDesign();
        d.setName("flush A");
        d.setZone(z);
        d.setDarcyFluxMetresPerDay(0.05);
        d.setOperatingDaysPerWeek(5);
        d.setCaptureEfficiency(0.9);
        d.setCriterion(criterion);
        d.setMaxPoreVolumes(1000);
        p.getFlushingDesigns().add(d);
        return p;
    }

    static Vertex vertex(double e, double n) {
        Vertex v = SiteFactory.eINSTANCE.createVertex();
        v.setEastingMetres(e);
        v.setNorthingMetres(n);
        return v;
    }

    /** Gives the zone a rectangular footprint polygon from (e0, n0) to (e1, n1) and the matching area. */
    static void rectangle(TreatmentZone z, double e0, double n0, double e1, double n1) {
        z.getFootprint().clear();
        z.getFootprint().add(vertex(e0, n0));
        z.getFootprint().add(vertex(e1, n0));
        z.getFootprint().add(vertex(e1, n1));
        z.getFootprint().add(vertex(e0, n1));
        z.setAreaSquareMetres((e1 - e0) * (n1 - n0));
    }

    /** A site boundary rectangle from (0, 0) to (e, n). */
    static void boundary(Site s, double e, double n) {
        s.getBoundary().clear();
        s.getBoundary().add(vertex(0, 0));
        s.getBoundary().add(vertex(e, 0));
        s.getBoundary().add(vertex(e, n));
        s.getBoundary().add(vertex(0, n));
    }

    static Sample sample(Contaminant c, double top, double bottom, double mgPerKg) {
        Sample s = SiteFactory.eINSTANCE.createSample();
        s.setContaminant(c);
        s.setTopDepthMetres(top);
        s.setBottomDepthMetres(bottom);
        s.setConcentrationMilligramsPerKg(mgPerKg);
        return s;
    }

    static SamplingLocation location(String name, double e, double n) {
        SamplingLocation l = SiteFactory.eINSTANCE.createSamplingLocation();
        l.setName(name);
        l.setEastingMetres(e);
        l.setNorthingMetres(n);
        return l;
    }

    static ExcavationDesign excavation(String name, TreatmentZone zone, ExcavationSoilType soil, double overdigMetres) {
        ExcavationDesign x = SiteFactory.eINSTANCE.createExcavationDesign();
        x.setName(name);
        x.setZone(zone);
        x.setSoilType(soil);
        x.setOverdigMetres(overdigMetres);
        return x;
    }

    static PriceItem item(String code, String unit, double rate) {
        PriceItem i = SiteFactory.eINSTANCE.createPriceItem();
        i.setCode(code);
        i.setName(code);
        i.setUnit(unit);
        i.setRatePerUnit(rate);
        i.setSourceNote("test value");
        return i;
    }

    /**
     * A price book with every code the pipeline prices, at round test rates (test data, not
     * market rates): mobilisation 10000/LS, excavation.bank 20/m3, haul.load 300/load,
     * disposal.contaminated 50/t, stockpile.overburden 5/m3, borrow.purchase 15/m3,
     * backfill.place 8/m3, site.restoration 4/m2, flushing.system 100000/LS,
     * system.operation 40000/LS, water.treatment 3/m3, amendment 2/kg, monitoring.sample 200/sample.
     */
    static PriceBook fullPriceBook() {
        PriceBook b = SiteFactory.eINSTANCE.createPriceBook();
        b.setName("test book");
        b.setCurrency("EUR");
        b.setReference("round numbers for the tests");
        b.getItems().add(item("mobilisation", "LS", 10_000));
        b.getItems().add(item("excavation.bank", "m3", 20));
        b.getItems().add(item("haul.load", "load", 300));
        b.getItems().add(item("disposal.contaminated", "t", 50));
        b.getItems().add(item("stockpile.overburden", "m3", 5));
        b.getItems().add(item("borrow.purchase", "m3", 15));
        b.getItems().add(item("backfill.place", "m3", 8));
        b.getItems().add(item("site.restoration", "m2", 4));
        b.getItems().add(item("flushing.system", "LS", 100_000));
        b.getItems().add(item("system.operation", "LS", 40_000));
        b.getItems().add(item("water.treatment", "m3", 3));
        b.getItems().add(item("amendment", "kg", 2));
        b.getItems().add(item("monitoring.sample", "sample", 200));
        return b;
    }

    /**
     * A 20 m x 20 m site (boundary from the origin), one layer 0-3 m (rho_b 1600 kg/m3, n 0.35,
     * theta 0.3, foc 0.002, Ks 1 m/d, dispersivity {@code alphaMetres}), one contaminant (Koc
     * 59 L/kg) with cleanup level 1 mg/kg, and samples at the centres of 2 m x 2 m x 0.5 m blocks
     * (eastings and northings 1, 3, ... 19 m; depths 0.25, 0.75, ... 2.75 m): 5 mg/kg inside the
     * box 6-12 m east, 4-10 m north, 0.5-2.0 m deep, 50 mg/kg in its part 8-10 m east, 6-8 m north,
     * 0.5-1.5 m deep, and 0.01 mg/kg elsewhere. A flushing zone covers the box; its source
     * concentration is 50 mg/kg. Invented for the tests.
     */
    static Project sampledField(double alphaMetres) {
        Project p = singleLayer(alphaMetres, 1, ComplianceCriterion.MEAN_RESIDUAL);
        Site site = p.getSite();
        site.getLayers().get(0).setBottomDepthMetres(3);
        boundary(site, 20, 20);
        Contaminant c = p.getContaminants().get(0);
        TreatmentZone z = site.getZones().get(0);
        rectangle(z, 6, 4, 12, 10);
        z.setTopDepthMetres(0.5);
        z.setBottomDepthMetres(2.0);
        z.getSourceConcentrations().get(0).setSoilConcentrationMilligramsPerKg(50);
        for (int i = 0; i < 10; i++) {
            for (int j = 0; j < 10; j++) {
                double e = 1 + 2 * i;
                double n = 1 + 2 * j;
                SamplingLocation l = location("B-" + i + "-" + j, e, n);
                for (int k = 0; k < 6; k++) {
                    double d = 0.25 + 0.5 * k;
                    boolean box = e > 6 && e < 12 && n > 4 && n < 10 && d > 0.5 && d < 2.0;
                    boolean hot = e > 8 && e < 10 && n > 6 && n < 8 && d > 0.5 && d < 1.5;
                    l.getSamples().add(sample(c, d, d, hot ? 50 : box ? 5 : 0.01));
                }
                site.getSamplingLocations().add(l);
            }
        }
        return p;
    }
}
