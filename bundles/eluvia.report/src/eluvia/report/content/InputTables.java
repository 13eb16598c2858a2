package eluvia.report.content;

import java.math.BigDecimal;
import java.text.SimpleDateFormat;
import java.util.ArrayList;
import java.util.Date;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.TimeZone;

import org.eclipse.emf.common.util.Enumerator;
import org.eclipse.emf.ecore.EAttribute;
import org.eclipse.emf.ecore.EClass;
import org.eclipse.emf.ecore.EObject;
import org.eclipse.emf.ecore.EReference;
import org.eclipse.emf.ecore.EStructuralFeature;

import eluvia.report.document.Block;
import eluvia.report.document.BulletList;
import eluvia.report.document.Column;
import eluvia.report.document.Paragraph;
import eluvia.report.document.Table;
import eluvia.site.model.Contaminant;
import eluvia.site.model.DispersivityRule;
import eluvia.site.model.Project;
import eluvia.site.model.SoilLayer;

/**
 * The inputs of a project exactly as the run used them: every attribute of every object of the
 * project file, with its unit and where it came from (entered; from the property library with the
 * source the contaminant records; derived, with the rule). The tables are built from the model's
 * own structure, so an attribute added to the schema appears here without a change.
 *
 * <p>Units come from the attribute names, which carry them by the project's convention
 * ({@code topDepthMetres} is in m, {@code kdLitresPerKg} in L/kg); an attribute whose name carries
 * no unit is dimensionless ("-"), or text. Numbers are printed with the shortest decimal text that
 * reads back to exactly the value used ({@link #number(double)}).
 */
public final class InputTables {

    /** Objects of a class with at most this many instances are tabulated one column per object. */
    static final int MAX_COLUMNS_PER_OBJECT_TABLE = 4;
    /** Classes with more objects than that and at most this many attributes are tabulated one row per object. */
    static final int MAX_COLUMNS_PER_ROW_TABLE = 7;

    /** Name suffixes and their units, longest first. */
    private static final String[][] UNIT_SUFFIXES = {
            { "MgPerKgPerMgPerLitreToN", "(mg/kg)/(mg/L)^n" }, { "SquareMetresPerSecond", "m\u00b2/s" },
            { "SquareMetresPerDay", "m\u00b2/d" }, { "KilogramsPerCubicMetre", "kg/m\u00b3" },
            { "KgPerCubicMetre", "kg/m\u00b3" }, { "LitresPerMilligram", "L/mg" }, { "MilligramsPerLitre", "mg/L" },
            { "MilligramsPerKg", "mg/kg" }, { "HorizontalPerVertical", "H:V (-)" }, { "DaysPerWeek", "d/week" },
            { "MetresPerDay", "m/d" }, { "SquareMetres", "m\u00b2" }, { "CubicMetres", "m\u00b3" },
            { "LitresPerKg", "L/kg" }, { "Kilograms", "kg" }, { "Metres", "m" }, { "RatePerDay", "1/d" },
            { "PerDay", "1/d" }, { "Days", "d" }, { "PerUnit", "currency per unit" } };

    private InputTables() {
    }

    /**
     * The blocks of the inputs section: one table per kind of object, in the order the project file
     * holds them, the project itself first.
     */
    public static List<Block> blocks(Project project) {
        Map<EClass, List<EObject>> byClass = new LinkedHashMap<>();
        byClass.computeIfAbsent(project.eClass(), k -> new ArrayList<>()).add(project);
        project.eAllContents().forEachRemaining(o -> byClass.computeIfAbsent(o.eClass(), k -> new ArrayList<>()).add(o));
        List<Block> blocks = new ArrayList<>();
        for (Map.Entry<EClass, List<EObject>> e : byClass.entrySet()) {
            List<EStructuralFeature> features = features(e.getKey());
            if (features.isEmpty()) {
                continue;
            }
            blocks.add(Paragraph.marked("**" + plural(e.getKey()) + "**"));
            List<EObject> objects = e.getValue();
            if (objects.size() > MAX_COLUMNS_PER_OBJECT_TABLE && features.size() <= MAX_COLUMNS_PER_ROW_TABLE) {
                blocks.add(byRow(objects, features));
            } else {
                for (int i = 0; i < objects.size(); i += MAX_COLUMNS_PER_OBJECT_TABLE) {
                    blocks.addAll(List.of(byObjectWithNotes(
                            objects.subList(i, Math.min(objects.size(), i + MAX_COLUMNS_PER_OBJECT_TABLE)), features)));
                }
            }
        }
        return blocks;
    }

    /** The unit of an attribute from its name; "-" for a dimensionless number, null for text. */
    public static String unitOf(EStructuralFeature f) {
        if (!(f instanceof EAttribute a) || !isNumber(a)) {
            return null;
        }
        String name = f.getName();
        for (String[] s : UNIT_SUFFIXES) {
            if (name.endsWith(s[0])) {
                return s[1];
            }
        }
        return Column.DIMENSIONLESS;
    }

    /** What the attribute is, in words: the name split at its capitals, without the unit. */
    public static String headingOf(EStructuralFeature f) {
        String name = f.getName();
        if (unitOf(f) != null) {
            for (String[] s : UNIT_SUFFIXES) {
                if (name.endsWith(s[0]) && name.length() > s[0].length()) {
                    name = name.substring(0, name.length() - s[0].length());
                    break;
                }
            }
        }
        StringBuilder b = new StringBuilder();
        for (int i = 0; i < name.length(); i++) {
            char c = name.charAt(i);
            if (Character.isUpperCase(c) && i > 0) {
                b.append(' ').append(Character.toLowerCase(c));
            } else {
                b.append(i == 0 ? Character.toUpperCase(c) : c);
            }
        }
        return b.toString();
    }

    /**
     * A number as the shortest decimal text that reads back (with {@link Double#parseDouble}) to
     * exactly {@code value}: plain between 1e-4 and 1e9, otherwise in e-notation.
     */
    public static String number(double value) {
        if (!Double.isFinite(value)) {
            return Double.isNaN(value) ? "not set" : (value > 0 ? "\u221e" : "-\u221e");
        }
        if (value == 0) {
            return "0";
        }
        String s = Double.toString(value);
        double a = Math.abs(value);
        if (a >= 1e-4 && a < 1e9) {
            return new BigDecimal(s).stripTrailingZeros().toPlainString();
        }
        return s.replace("E", "e").replace(".0e", "e");
    }

    /** The cell text of a feature's value. */
    public static String cell(EObject o, EStructuralFeature f) {
        Object v = o.eGet(f);
        if (v == null) {
            return "";
        }
        if (v instanceof Double d) {
            return number(d);
        }
        if (v instanceof Float d) {
            return number(d);
        }
        if (v instanceof Number n) {
            return n.toString();
        }
        if (v instanceof Boolean b) {
            return b ? "yes" : "no";
        }
        if (v instanceof Enumerator en) {
            return en.getLiteral();
        }
        if (v instanceof Date d) {
            SimpleDateFormat fmt = new SimpleDateFormat("yyyy-MM-dd HH:mm 'UTC'", Locale.ROOT);
            fmt.setTimeZone(TimeZone.getTimeZone("UTC"));
            return fmt.format(d);
        }
        if (v instanceof EObject ref) {
            return label(ref);
        }
        return v.toString();
    }

    /** Where a value came from: entered, from the library, or derived with the rule. */
    public static String sourceOf(EObject o, EStructuralFeature f) {
        String n = f.getName();
        if (o instanceof Contaminant c) {
            if (n.equals("kdLitresPerKg") && !c.isKdEntered()) {
                return "not used: Kd = Koc foc of each layer (Karickhoff et al. 1979)";
            }
            if (!n.equals("name") && !n.equals("casNumber") && !n.equals("propertySource") && !n.equals("kdEntered")
                    && !n.equals("kdLitresPerKg") && c.getPropertySource() != null && !c.getPropertySource().isBlank()) {
                return "entered or library (see property source)";
            }
        }
        if (o instanceof SoilLayer l && n.equals("dispersivityMetres") && l.getDispersivityRule() != DispersivityRule.ENTERED) {
            return "not used: the dispersivity rule applies";
        }
        if (f.isDerived()) {
            return "derived: " + switch (n) {
            case "effectiveDispersivityMetres" -> "by the dispersivity rule (entered; 0.1 L, common practice; or "
                    + "0.83 (log10 L)^2.414, Xu and Eckstein 1995)";
            case "effectiveAreaSquareMetres" -> "area of the footprint polygon, or the entered area without one";
            case "volumeCubicMetres" -> "effective area x thickness";
            case "poreVolumeCubicMetres" -> "water content of the layers x volume";
            default -> "computed by the site model";
            };
        }
        return "entered";
    }

    /** The name of an object, or its kind and position when it has none. */
    public static String label(EObject o) {
        EStructuralFeature name = o.eClass().getEStructuralFeature("name");
        if (name != null && o.eGet(name) instanceof String s && !s.isBlank()) {
            return s;
        }
        String kind = o.eClass().getName();
        if (o.eContainer() != null && o.eContainingFeature().isMany()) {
            List<?> siblings = (List<?>) o.eContainer().eGet(o.eContainingFeature());
            return kind + " " + (siblings.indexOf(o) + 1);
        }
        return kind;
    }

    /** The features shown for a class: every attribute and every single reference to another object. */
    static List<EStructuralFeature> features(EClass c) {
        List<EStructuralFeature> fs = new ArrayList<>();
        for (EStructuralFeature f : c.getEAllStructuralFeatures()) {
            if (f instanceof EAttribute a && !a.isMany()) {
                fs.add(f);
            } else if (f instanceof EReference r && !r.isContainment() && !r.isMany() && !r.isContainer()) {
                fs.add(f);
            }
        }
        return fs;
    }

    private static boolean isNumber(EAttribute a) {
        Class<?> t = a.getEAttributeType().getInstanceClass();
        return t == double.class || t == int.class || t == float.class || t == long.class || t == Double.class
                || t == Integer.class;
    }

    /** Cell text longer than this goes to a note under its table, so that columns stay legible. */
    static final int LONGEST_CELL_CHARACTERS = 40;

    /** The short form of a source for a table cell: "entered", "library", "derived" or "not used". */
    static String shortSource(String source) {
        int colon = source.indexOf(':');
        if (source.startsWith("entered or library")) {
            return "entered or library";
        }
        return colon < 0 ? source : source.substring(0, colon);
    }

    private static Block[] byObjectWithNotes(List<EObject> objects, List<EStructuralFeature> features) {
        List<String> notes = new ArrayList<>();
        Table t = byObject(objects, features, notes);
        if (notes.isEmpty()) {
            return new Block[] { t };
        }
        return new Block[] { t, new BulletList(notes.stream().map(Paragraph::of).toList()) };
    }

    private static String noted(String text, String what, List<String> notes) {
        if (text.length() <= LONGEST_CELL_CHARACTERS) {
            return text;
        }
        notes.add("(" + (notes.size() + 1) + ") " + what + ": " + text);
        return "see note " + notes.size();
    }

    private static Table byObject(List<EObject> objects, List<EStructuralFeature> features, List<String> notes) {
        List<Column> columns = new ArrayList<>();
        columns.add(Column.text("Quantity"));
        columns.add(Column.text("Unit"));
        for (EObject o : objects) {
            columns.add(new Column(where(o), null, eluvia.report.document.Alignment.RIGHT));
        }
        columns.add(Column.text("Source"));
        List<List<String>> rows = new ArrayList<>();
        for (EStructuralFeature f : features) {
            List<String> row = new ArrayList<>();
            row.add(headingOf(f));
            String unit = unitOf(f);
            row.add(unit == null ? "" : unit);
            List<String> sources = new ArrayList<>();
            for (EObject o : objects) {
                row.add(noted(cell(o, f), where(o) + ", " + headingOf(f).toLowerCase(Locale.ROOT), notes));
                String s = sourceOf(o, f);
                String brief = shortSource(s);
                if (!sources.contains(brief)) {
                    sources.add(brief);
                }
                if (!brief.equals(s) && s.contains(":")) {
                    String rule = headingOf(f) + ", " + s;
                    if (notes.stream().noneMatch(x -> x.endsWith(rule))) {
                        notes.add("(" + (notes.size() + 1) + ") " + rule);
                    }
                }
            }
            row.add(String.join("; ", sources));
            rows.add(row);
        }
        return new Table(columns, rows, null);
    }

    private static Table byRow(List<EObject> objects, List<EStructuralFeature> features) {
        List<Column> columns = new ArrayList<>();
        columns.add(Column.text("Item"));
        for (EStructuralFeature f : features) {
            String unit = unitOf(f);
            columns.add(unit == null ? Column.text(headingOf(f)) : Column.number(headingOf(f), unit));
        }
        List<List<String>> rows = new ArrayList<>();
        List<String> notes = new ArrayList<>();
        for (EObject o : objects) {
            List<String> row = new ArrayList<>();
            row.add(where(o));
            for (EStructuralFeature f : features) {
                row.add(cell(o, f));
                String s = sourceOf(o, f);
                if (!s.equals("entered")) {
                    String note = headingOf(f) + ": " + s;
                    if (!notes.contains(note)) {
                        notes.add(note);
                    }
                }
            }
            rows.add(row);
        }
        String caption = "Every value entered" + (notes.isEmpty() ? "." : ", except " + String.join("; ", notes) + ".");
        return new Table(columns, rows, caption);
    }

    /** The object's label, with its container's when the object has no name of its own. */
    private static String where(EObject o) {
        EStructuralFeature name = o.eClass().getEStructuralFeature("name");
        if (name != null || o.eContainer() == null || o.eContainer().eContainer() == null) {
            return label(o);
        }
        return label(o.eContainer()) + ", " + headingOf(o.eContainingFeature().getName()).toLowerCase(Locale.ROOT) + " "
                + label(o).replaceAll("^\\D+", "");
    }

    private static String plural(EClass c) {
        String words = headingOf(c.getName());
        if (words.endsWith("ex")) {
            return words.substring(0, words.length() - 2) + "ices";
        }
        return words.endsWith("s") ? words : words + "s";
    }

    private static String headingOf(String camel) {
        StringBuilder b = new StringBuilder();
        for (int i = 0; i < camel.length(); i++) {
            char c = camel.charAt(i);
            b.append(Character.isUpperCase(c) && i > 0 ? " " + Character.toLowerCase(c) : String.valueOf(c));
        }
        return b.toString();
    }
}
