package eluvia.site.edit.provider;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.Collection;
import java.util.HashSet;
import java.util.List;
import java.util.Set;

import org.eclipse.emf.common.command.BasicCommandStack;
import org.eclipse.emf.common.command.Command;
import org.eclipse.emf.ecore.EAttribute;
import org.eclipse.emf.ecore.EClass;
import org.eclipse.emf.ecore.EClassifier;
import org.eclipse.emf.ecore.EObject;
import org.eclipse.emf.ecore.EStructuralFeature;
import org.eclipse.emf.edit.command.CommandParameter;
import org.eclipse.emf.edit.command.CreateChildCommand;
import org.eclipse.emf.edit.command.SetCommand;
import org.eclipse.emf.edit.domain.AdapterFactoryEditingDomain;
import org.eclipse.emf.edit.provider.ComposedAdapterFactory;
import org.eclipse.emf.edit.provider.IEditingDomainItemProvider;
import org.eclipse.emf.edit.provider.IItemLabelProvider;
import org.eclipse.emf.edit.provider.IItemPropertyDescriptor;
import org.eclipse.emf.edit.provider.IItemPropertySource;
import org.eclipse.emf.edit.provider.ReflectiveItemProviderAdapterFactory;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;

import eluvia.site.files.ExampleProjects;
import eluvia.site.model.Project;
import eluvia.site.model.SiteFactory;
import eluvia.site.model.SitePackage;
import eluvia.site.model.SoilLayer;

/**
 * The generated item providers give every model object a label, an icon and a property sheet row
 * for every feature, and edits made through them can be undone: what the workbench's editors and
 * property view rely on. Runs headless (no SWT).
 */
final class SiteItemProvidersTest {

    private ComposedAdapterFactory adapterFactory;
    private AdapterFactoryEditingDomain domain;
    private Project project;

    @BeforeEach
    void setUp() throws Exception {
        adapterFactory = new ComposedAdapterFactory(List.of(new SiteItemProviderAdapterFactory(),
                new ReflectiveItemProviderAdapterFactory()));
        domain = new AdapterFactoryEditingDomain(adapterFactory, new BasicCommandStack());
        project = ExampleProjects.loadRiversideDepot();
        domain.getResourceSet().createResource(org.eclipse.emf.common.util.URI.createURI("memory:/example.eluvia"));
    }

    @AfterEach
    void tearDown() {
        adapterFactory.dispose();
    }

    private List<EObject> allObjects() {
        List<EObject> objects = new ArrayList<>();
        objects.add(project);
        project.eAllContents().forEachRemaining(objects::add);
        return objects;
    }

    @Test
    void everyObjectHasALabelAndAnIcon() {
        Set<EClass> seen = new HashSet<>();
        for (EObject object : allObjects()) {
            IItemLabelProvider labels = (IItemLabelProvider) adapterFactory.adapt(object, IItemLabelProvider.class);
            assertNotNull(labels, object.eClass().getName());
            String text = labels.getText(object);
            assertFalse(text == null || text.isBlank(), object.eClass().getName());
            assertFalse(text.startsWith("_UI_"), "label from plugin.properties: " + text);
            assertNotNull(labels.getImage(object), object.eClass().getName() + " has no icon");
            seen.add(object.eClass());
        }
        Set<EClass> all = new HashSet<>();
        for (EClassifier classifier : SitePackage.eINSTANCE.getEClassifiers()) {
            if (classifier instanceof EClass c) {
                all.add(c);
            }
        }
        assertEquals(all, seen, "the example holds one of each class, so each provider was exercised");
        SoilLayer layer = project.getSite().getLayers().get(0);
        assertEquals("Soil Layer Silty sand",
                ((IItemLabelProvider) adapterFactory.adapt(layer, IItemLabelProvider.class)).getText(layer));
    }

    @Test
    void everyAttributeHasAPropertyDescriptorAndDerivedOnesAreReadOnly() {
        for (EObject object : allObjects()) {
            IItemPropertySource source = (IItemPropertySource) adapterFactory.adapt(object, IItemPropertySource.class);
            assertNotNull(source, object.eClass().getName());
            Set<Object> described = new HashSet<>();
            for (IItemPropertyDescriptor descriptor : source.getPropertyDescriptors(object)) {
                EStructuralFeature feature = (EStructuralFeature) descriptor.getFeature(object);
                described.add(feature);
                assertFalse(descriptor.getDisplayName(object).startsWith("_UI_"), descriptor.getDisplayName(object));
                assertEquals(feature.isChangeable(), descriptor.canSetProperty(object),
                        object.eClass().getName() + "." + feature.getName());
            }
            for (EAttribute attribute : object.eClass().getEAllAttributes()) {
                assertTrue(described.contains(attribute), object.eClass().getName() + "." + attribute.getName() + " has no property row");
            }
        }
    }

    @Test
    void aPropertyEditCanBeUndoneAndRedone() {
        SoilLayer layer = project.getSite().getLayers().get(0);
        IItemPropertySource source = (IItemPropertySource) adapterFactory.adapt(layer, IItemPropertySource.class);
        IItemPropertyDescriptor porosity = source.getPropertyDescriptor(layer, SitePackage.Literals.SOIL_LAYER__POROSITY);
        assertNotNull(porosity);
        // Bring the project under the editing domain, as the editor does.
        domain.getResourceSet().getResources().get(0).getContents().add(project);

        porosity.setPropertyValue(layer, 0.42);
        assertEquals(0.42, layer.getPorosity(), 0.0);
        assertTrue(domain.getCommandStack().canUndo());

        domain.getCommandStack().undo();
        assertEquals(0.4, layer.getPorosity(), 0.0, "undo restores the value in the example");
        domain.getCommandStack().redo();
        assertEquals(0.42, layer.getPorosity(), 0.0);
    }

    @Test
    void commandsThroughTheDomainAreUndoable() {
        domain.getResourceSet().getResources().get(0).getContents().add(project);
        Command rename = SetCommand.create(domain, project, SitePackage.Literals.PROJECT__NAME, "renamed");
        assertTrue(rename.canExecute());

        domain.getCommandStack().execute(rename);
        assertEquals("renamed", project.getName());
        domain.getCommandStack().undo();
        assertEquals("Riverside Depot (invented example)", project.getName());
    }

    @Test
    void theSiteOffersNewLayersZonesAndLocationsAsChildren() {
        IEditingDomainItemProvider provider = (IEditingDomainItemProvider) adapterFactory.adapt(project.getSite(),
                IEditingDomainItemProvider.class);

        Collection<?> descriptors = provider.getNewChildDescriptors(project.getSite(), domain, null);

        Set<EStructuralFeature> features = new HashSet<>();
        for (Object d : descriptors) {
            features.add((EStructuralFeature) ((CommandParameter) d).getFeature());
        }
        assertTrue(features.containsAll(List.of(SitePackage.Literals.SITE__LAYERS, SitePackage.Literals.SITE__ZONES,
                SitePackage.Literals.SITE__SAMPLING_LOCATIONS, SitePackage.Literals.SITE__BOUNDARY)), features.toString());

        domain.getResourceSet().getResources().get(0).getContents().add(project);
        CommandParameter newLayer = (CommandParameter) descriptors.stream()
                .filter(d -> ((CommandParameter) d).getFeature() == SitePackage.Literals.SITE__LAYERS).findFirst().orElseThrow();
        int before = project.getSite().getLayers().size();
        domain.getCommandStack().execute(CreateChildCommand.create(domain, project.getSite(), newLayer, List.of(project.getSite())));
        assertEquals(before + 1, project.getSite().getLayers().size());
        domain.getCommandStack().undo();
        assertEquals(before, project.getSite().getLayers().size());
    }

    @Test
    void theFactoryIsAllTheSiteModelNeeds() {
        SiteItemProviderAdapterFactory factory = new SiteItemProviderAdapterFactory();
        for (EClassifier classifier : SitePackage.eINSTANCE.getEClassifiers()) {
            if (classifier instanceof EClass c) {
                EObject object = SiteFactory.eINSTANCE.create(c);
                assertTrue(factory.isFactoryForType(IItemPropertySource.class));
                assertNotNull(factory.adapt(object, IItemPropertySource.class), c.getName());
            }
        }
        factory.dispose();
    }
}
