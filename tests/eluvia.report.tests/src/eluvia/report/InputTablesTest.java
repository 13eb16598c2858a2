package eluvia.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;

import org.eclipse.emf.ecore.EAttribute;
import org.eclipse.emf.ecore.EObject;
import org.eclipse.emf.ecore.EStructuralFeature;
import org.junit.jupiter.api.Test;

import eluvia.report.content.InputTables;
import eluvia.report.document.Block;
import eluvia.report.document.BulletList;
import eluvia.report.document.Paragraph;
import eluvia.report.document.Table;
import eluvia.site.model.SitePackage;

/** Every input of the project is echoed with its unit and source, and every number reads back exactly. */
final class InputTablesTest {

    @Test
    void everyAttributeOfEveryObjectIsEchoedExactly() {
        List<Block> blocks = InputTables.blocks(ExampleRun.PROJECT);
        StringBuilder text = new StringBuilder();
        for (Block b : blocks) {
            if (b instanceof Table t) {
                t.rows().forEach(r -> text.append(String.join("|", r)).append('\n'));
                t.columns().forEach(c -> text.append(c.headingWithUnit()).append('\n'));
            } else if (b instanceof BulletList l) {
                l.items().forEach(p -> text.append(p.plainText()).append('\n'));
            } else if (b instanceof Paragraph p) {
                text.append(p.plainText()).append('\n');
            }
        }
        String all = text.toString();
        List<EObject> objects = new ArrayList<>();
        objects.add(ExampleRun.PROJECT);
        ExampleRun.PROJECT.eAllContents().forEachRemaining(objects::add);
        int numbers = 0;
        for (EObject o : objects) {
            for (EAttribute a : o.eClass().getEAllAttributes()) {
                if (a.isMany()) {
                    continue;
                }
                Object v = o.eGet(a);
                String cell = InputTables.cell(o, a);
                if (v instanceof Double d && Double.isFinite(d)) {
                    // the printed text reads back to exactly the double the run used
                    assertEquals(d, Double.parseDouble(cell), 0.0, a.getName());
                    numbers++;
                }
                if (cell.length() <= 40) {
                    assertTrue(all.contains(cell), o.eClass().getName() + "." + a.getName() + " = " + cell + " not echoed");
                } else {
                    assertTrue(all.contains(cell), "long value of " + a.getName() + " must be in a note under its table");
                }
                assertTrue(all.contains(InputTables.headingOf(a)), "quantity " + a.getName() + " not named");
            }
        }
        assertTrue(numbers > 100, "the example has well over a hundred numeric inputs: " + numbers);
    }

    @Test
    void unitsFollowTheNamingConventionOfTheModel() {
        SitePackage p = SitePackage.eINSTANCE;
        // units as the attribute names state them (the model's naming convention)
        assertEquals("m", unit(p.getSoilLayer_TopDepthMetres()));
        assertEquals("kg/m\u00b3", unit(p.getSoilLayer_BulkDensityKgPerCubicMetre()));
        assertEquals("m/d", unit(p.getSoilLayer_SaturatedConductivityMetresPerDay()));
        assertEquals("L/kg", unit(p.getContaminant_KocLitresPerKg()));
        assertEquals("m\u00b2/s", unit(p.getContaminant_DiffusionSquareMetresPerSecond()));
        assertEquals("d", unit(p.getContaminant_HalfLifeDays()));
        assertEquals("mg/kg", unit(p.getCleanupLevel_SoilLevelMilligramsPerKg()));
        assertEquals("m\u00b2", unit(p.getTreatmentZone_AreaSquareMetres()));
        assertEquals("d/week", unit(p.getFlushingDesign_OperatingDaysPerWeek()));
        // dimensionless by definition: porosity, water content (volume fractions)
        assertEquals("-", unit(p.getSoilLayer_Porosity()));
        assertEquals("-", unit(p.getSoilLayer_WaterContent()));
        // text has no unit
        assertNull(unit(p.getSoilLayer_TextureClass()));
        assertEquals("Top depth", InputTables.headingOf(p.getSoilLayer_TopDepthMetres()));
    }

    @Test
    void derivedAndLibraryValuesSayWhereTheyCameFrom() {
        SitePackage p = SitePackage.eINSTANCE;
        EObject zone = ExampleRun.PROJECT.getSite().getZones().get(0);
        assertTrue(InputTables.sourceOf(zone, p.getTreatmentZone_EffectiveAreaSquareMetres()).startsWith("derived"));
        EObject layer = ExampleRun.PROJECT.getSite().getLayers().get(0);
        assertTrue(InputTables.sourceOf(layer, p.getSoilLayer_EffectiveDispersivityMetres()).contains("Xu and Eckstein"));
        assertEquals("entered", InputTables.sourceOf(layer, p.getSoilLayer_Porosity()));
        EObject contaminant = ExampleRun.PROJECT.getContaminants().get(0);
        assertTrue(InputTables.sourceOf(contaminant, p.getContaminant_KocLitresPerKg()).contains("property source"));
    }

    @Test
    void numbersArePrintedShortestAndExact() {
        // Double.toString is the shortest text that reads back exactly (Java SE 19+ spec; JDK 17 agrees for these)
        assertEquals("0.15", InputTables.number(0.15));
        assertEquals("1e-9", InputTables.number(1e-9));
        assertEquals("1650", InputTables.number(1650));
        assertEquals("0", InputTables.number(0));
        assertEquals("not set", InputTables.number(Double.NaN));
        double awkward = 0.1 + 0.2;
        assertEquals(awkward, Double.parseDouble(InputTables.number(awkward)), 0.0);
    }

    private static String unit(EStructuralFeature f) {
        return InputTables.unitOf(f);
    }
}
