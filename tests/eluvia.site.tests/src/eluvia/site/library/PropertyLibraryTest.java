package eluvia.site.library;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.StringReader;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import eluvia.site.model.Contaminant;
import eluvia.site.model.SiteFactory;

/** The shipped property library and the user library file. */
final class PropertyLibraryTest {

    private static final String HEADER = "name,cas_number,quantity,value,unit,provenance,source\n";

    /**
     * REFERENCES.md [PUB]: US EPA (1996) EPA/540/R-95/128 App. K Table K-1, Koc in L/kg,
     * calculated / measured.
     */
    private static final Map<String, double[]> TABLE_K1 = Map.of(
            "71-43-2", new double[] {59, 61.7},     // benzene
            "108-88-3", new double[] {182, 140},    // toluene
            "100-41-4", new double[] {363, 204},    // ethylbenzene
            "95-47-6", new double[] {363, 241},     // o-xylene
            "79-01-6", new double[] {166, 94.3},    // trichloroethylene
            "127-18-4", new double[] {155, 265},    // tetrachloroethylene
            "107-06-2", new double[] {17, 38.0});   // 1,2-dichloroethane

    @TempDir
    Path folder;

    @Test
    void theShippedKocValuesAreThoseOfTableK1() {
        PropertyLibrary library = PropertyLibrary.shipped();

        for (Map.Entry<String, double[]> row : TABLE_K1.entrySet()) {
            LibraryEntry entry = library.find(row.getKey()).orElseThrow(() -> new AssertionError("missing " + row.getKey()));
            assertEquals(row.getValue()[0], entry.value(LibraryQuantity.KOC_CALCULATED).orElseThrow().value(), 0.0, entry.name());
            assertEquals(row.getValue()[1], entry.value(LibraryQuantity.KOC_MEASURED).orElseThrow().value(), 0.0, entry.name());
            assertEquals(Provenance.PUBLISHED, entry.value(LibraryQuantity.KOC_MEASURED).orElseThrow().provenance());
            assertEquals(row.getValue()[1], entry.koc().orElseThrow().value(), 0.0, "measured Koc preferred");
        }
    }

    @Test
    void onlyValuesInTheCitedTableAreMarkedPublishedAndEveryValueHasASource() {
        List<LibraryEntry> entries = PropertyLibrary.shipped().entries();

        assertTrue(entries.size() >= 10, "about ten contaminants: " + entries.size());
        for (LibraryEntry entry : entries) {
            assertFalse(entry.userEntry());
            assertTrue(CasNumbers.isValid(entry.casNumber()), entry.name() + " " + entry.casNumber());
            for (LibraryValue value : entry.values()) {
                assertFalse(value.source().isBlank());
                if (value.provenance() == Provenance.PUBLISHED) {
                    // Every value marked published must be one of the REFERENCES.md [PUB] numbers above.
                    double[] k1 = TABLE_K1.get(entry.casNumber());
                    assertTrue(k1 != null && (value.quantity() == LibraryQuantity.KOC_CALCULATED && value.value() == k1[0]
                            || value.quantity() == LibraryQuantity.KOC_MEASURED && value.value() == k1[1]),
                            entry.name() + " " + value + " is marked published but is not in Table K-1");
                    assertTrue(value.source().contains("Table K-1"));
                } else {
                    assertEquals(Provenance.FROM_MEMORY, value.provenance());
                    assertTrue(value.source().contains("not verified"), value.source());
                }
            }
        }
    }

    @Test
    void diffusionCoefficientsAreAboutOneInTenToTheNine() {
        // Common practice (REFERENCES.md): free-water diffusion of small solutes is about 1e-9 m2/s.
        for (LibraryEntry entry : PropertyLibrary.shipped().entries()) {
            entry.value(LibraryQuantity.FREE_WATER_DIFFUSION).ifPresent(v ->
                    assertTrue(v.value() > 3e-10 && v.value() < 3e-9, entry.name() + " " + v.value()));
        }
    }

    @Test
    void applyingAnEntryFillsTheContaminantAndStatesTheSources() {
        Contaminant contaminant = SiteFactory.eINSTANCE.createContaminant();
        LibraryEntry benzene = PropertyLibrary.shipped().find("benzene").orElseThrow();

        PropertyLibrary.applyTo(benzene, contaminant);

        assertEquals("Benzene", contaminant.getName());
        assertEquals("71-43-2", contaminant.getCasNumber());
        // REFERENCES.md [PUB]: EPA 1996 Table K-1, measured Koc of benzene 61.7 L/kg.
        assertEquals(61.7, contaminant.getKocLitresPerKg(), 0.0);
        assertFalse(contaminant.isKdEntered());
        assertTrue(contaminant.getPropertySource().contains("Table K-1"));
        assertTrue(contaminant.getPropertySource().contains("FROM MEMORY"), "solubility and diffusion are from memory");
        assertEquals(benzene.value(LibraryQuantity.WATER_SOLUBILITY).orElseThrow().value(),
                contaminant.getWaterSolubilityMilligramsPerLitre(), 0.0);
    }

    @Test
    void userEntriesAreWrittenReadAndTakePrecedence() throws Exception {
        LibraryEntry mine = new LibraryEntry("Benzene", "71-43-2", List.of(
                new LibraryValue(LibraryQuantity.KD, 0.35, Provenance.USER, "site batch tests, invented for this test"),
                new LibraryValue(LibraryQuantity.HALF_LIFE, 120, Provenance.USER, "invented for this test")), true);
        LibraryEntry other = new LibraryEntry("Invented solvent \"X\", grade 2", "", List.of(
                new LibraryValue(LibraryQuantity.KOC_MEASURED, 12.5, Provenance.USER, "invented, with a comma, and \"quotes\"")), true);
        Path file = folder.resolve("user-library.csv");

        PropertyLibrary.empty().withUserEntry(mine).withUserEntry(other).writeUserFile(file);
        PropertyLibrary user = PropertyLibrary.readUserFile(file);
        PropertyLibrary combined = PropertyLibrary.shipped().withEntriesOf(user);

        assertEquals(List.of(other, mine).size(), user.entries().size());
        assertTrue(user.entries().containsAll(List.of(mine, other)));
        LibraryEntry benzene = combined.find("71-43-2").orElseThrow();
        assertTrue(benzene.userEntry(), "the user's benzene replaces the shipped one");
        assertEquals(PropertyLibrary.shipped().entries().size() + 1, combined.entries().size());
        Contaminant c = SiteFactory.eINSTANCE.createContaminant();
        PropertyLibrary.applyTo(benzene, c);
        assertTrue(c.isKdEntered());
        assertEquals(0.35, c.getKdLitresPerKg(), 0.0);
        assertEquals(120.0, c.getHalfLifeDays(), 0.0);
    }

    @Test
    void aMissingUserFileIsAnEmptyLibrary() throws Exception {
        assertEquals(List.of(), PropertyLibrary.readUserFile(folder.resolve("none.csv")).entries());
    }

    @Test
    void badRowsAreRefusedWithTheirLine() {
        assertLine(2, "quantity = 'kow'", HEADER + "Benzene,71-43-2,kow,2.1,-,user,x\n");
        assertLine(3, "value = 'sixty'", HEADER + "# comment\nBenzene,71-43-2,koc_measured,sixty,L/kg,user,x\n");
        assertLine(2, "unit = 'mL/g'", HEADER + "Benzene,71-43-2,koc_measured,61.7,mL/g,user,x\n");
        assertLine(2, "provenance = 'book'", HEADER + "Benzene,71-43-2,koc_measured,61.7,L/kg,book,x\n");
        assertLine(2, "allowed a finite number 0 or more", HEADER + "Benzene,71-43-2,koc_measured,-4,L/kg,user,x\n");
        assertLine(2, "no source", HEADER + "Benzene,71-43-2,koc_measured,61.7,L/kg,user,\n");
        assertLine(2, "correct check digit", HEADER + "Benzene,71-43-3,koc_measured,61.7,L/kg,user,x\n");
        assertLine(3, "twice", HEADER + "Benzene,71-43-2,koc_measured,61.7,L/kg,user,x\nBenzene,71-43-2,koc_measured,60,L/kg,user,y\n");
        assertLine(2, "expected 7 columns", HEADER + "Benzene,71-43-2,koc_measured\n");
        assertLine(1, "the header must be", "name,cas,quantity,value,unit,provenance,source\n");
    }

    @Test
    void badValuesAndEntriesThrowNamingTheQuantity() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> new LibraryValue(LibraryQuantity.KOC_MEASURED, Double.NaN, Provenance.USER, "x"));
        assertTrue(e.getMessage().contains("koc_measured = NaN L/kg"), e.getMessage());
        assertThrows(IllegalArgumentException.class, () -> new LibraryEntry(" ", "", List.of(), true));
        assertThrows(NullPointerException.class, () -> new LibraryValue(null, 1, Provenance.USER, "x"));
        assertThrows(NullPointerException.class, () -> PropertyLibrary.applyTo(null, SiteFactory.eINSTANCE.createContaminant()));
    }

    private static void assertLine(int line, String text, String csv) {
        LibraryFileException e = assertThrows(LibraryFileException.class,
                () -> PropertyLibrary.read(new StringReader(csv), "user.csv", true));
        assertEquals(line, e.line(), e.getMessage());
        assertTrue(e.getMessage().contains(text), e.getMessage());
        assertTrue(e.getMessage().startsWith("user.csv, line " + line + ": "), e.getMessage());
    }
}
