package eluvia.design;

import eluvia.site.model.CleanupLevel;
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
}
