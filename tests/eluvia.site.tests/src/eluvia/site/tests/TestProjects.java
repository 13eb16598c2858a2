package eluvia.site.tests;

import java.util.ArrayList;
import java.util.List;

import org.eclipse.emf.ecore.EAttribute;
import org.eclipse.emf.ecore.EClass;
import org.eclipse.emf.ecore.EClassifier;
import org.eclipse.emf.ecore.EDataType;
import org.eclipse.emf.ecore.EEnum;
import org.eclipse.emf.ecore.EEnumLiteral;
import org.eclipse.emf.ecore.EObject;
import org.eclipse.emf.ecore.EcorePackage;
import org.eclipse.emf.ecore.util.EcoreUtil;

import eluvia.site.files.ExampleProjects;
import eluvia.site.files.ProjectFileException;
import eluvia.site.model.Project;
import eluvia.site.model.SitePackage;

/** Projects for the tests: the shipped (invented) example, and one with every feature set. */
public final class TestProjects {

    private TestProjects() {
    }

    /** The shipped example, an invented site (see its description). */
    public static Project example() {
        try {
            return ExampleProjects.loadRiversideDepot();
        } catch (ProjectFileException e) {
            throw new AssertionError("the shipped example must load: " + e.getMessage(), e);
        }
    }

    /** Every concrete class of the site model. */
    public static List<EClass> modelClasses() {
        List<EClass> classes = new ArrayList<>();
        for (EClassifier classifier : SitePackage.eINSTANCE.getEClassifiers()) {
            if (classifier instanceof EClass c && !c.isAbstract() && !c.isInterface()) {
                classes.add(c);
            }
        }
        return classes;
    }

    /**
     * The example with every changeable attribute of every object set to a value different from its
     * default (numbers made unique, strings with XML-special and non-ASCII characters, booleans
     * flipped, enums moved off their default), so that a round trip that drops or garbles any
     * feature shows up in an equality check. schemaVersion is left to the file code.
     */
    public static Project everyFeatureSet() {
        Project project = example();
        int counter = 0;
        List<EObject> objects = new ArrayList<>();
        objects.add(project);
        project.eAllContents().forEachRemaining(objects::add);
        for (EObject object : objects) {
            for (EAttribute attribute : object.eClass().getEAllAttributes()) {
                if (!attribute.isChangeable() || attribute.isDerived() || attribute.isTransient()
                        || attribute == SitePackage.Literals.PROJECT__SCHEMA_VERSION) {
                    continue;
                }
                counter++;
                Object value = distinctValue(attribute, counter);
                if (attribute.isMany()) {
                    @SuppressWarnings("unchecked")
                    List<Object> list = (List<Object>) object.eGet(attribute);
                    list.clear();
                    list.add(value);
                } else {
                    object.eSet(attribute, value);
                }
            }
        }
        return project;
    }

    private static Object distinctValue(EAttribute attribute, int counter) {
        EDataType type = attribute.getEAttributeType();
        if (type instanceof EEnum eEnum) {
            List<EEnumLiteral> literals = eEnum.getELiterals();
            Object defaultValue = attribute.getDefaultValue();
            EEnumLiteral defaultLiteral = defaultValue instanceof org.eclipse.emf.common.util.Enumerator e
                    ? eEnum.getEEnumLiteral(e.getValue()) : literals.get(0);
            EEnumLiteral other = literals.get((literals.indexOf(defaultLiteral) + 1 + counter) % literals.size());
            if (other == defaultLiteral) {
                other = literals.get((literals.indexOf(defaultLiteral) + 1) % literals.size());
            }
            return other.getInstance();
        }
        Class<?> instanceClass = type.getInstanceClass();
        if (instanceClass == double.class || instanceClass == Double.class) {
            return 0.1 + counter * 1.000001;
        }
        if (instanceClass == int.class || instanceClass == Integer.class) {
            return 1000 + counter;
        }
        if (instanceClass == long.class || instanceClass == Long.class) {
            return 5_000_000_000L + counter;
        }
        if (instanceClass == boolean.class || instanceClass == Boolean.class) {
            return !Boolean.TRUE.equals(attribute.getDefaultValue());
        }
        if (instanceClass == String.class) {
            return "text " + counter + " <&>\"' \u00e9\u00df\u03b1 \ttab\nnewline";
        }
        if (type == EcorePackage.Literals.EDATE || instanceClass == java.util.Date.class) {
            return new java.util.Date(1_700_000_000_000L + counter * 1000L);
        }
        throw new AssertionError("TestProjects.distinctValue has no value for type " + type.getName()
                + " of " + attribute.getEContainingClass().getName() + "." + attribute.getName() + "; add one");
    }

    /** A deep copy (for tests that change a project and compare with the original). */
    public static Project copy(Project project) {
        return EcoreUtil.copy(project);
    }
}
