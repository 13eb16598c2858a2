package eluvia.site.edit.command;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.eclipse.emf.common.command.BasicCommandStack;
import org.eclipse.emf.common.command.Command;
import org.eclipse.emf.common.util.URI;
import org.eclipse.emf.edit.command.AddCommand;
import org.eclipse.emf.edit.command.DeleteCommand;
import org.eclipse.emf.edit.command.SetCommand;
import org.eclipse.emf.edit.provider.ComposedAdapterFactory;
import org.eclipse.emf.edit.provider.ReflectiveItemProviderAdapterFactory;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;

import eluvia.site.edit.provider.SiteItemProviderAdapterFactory;
import eluvia.site.files.ExampleProjects;
import eluvia.site.model.FlushingDesign;
import eluvia.site.model.Project;
import eluvia.site.model.SiteFactory;
import eluvia.site.model.SitePackage;
import eluvia.site.model.SoilLayer;

/**
 * The editing domain's commands say what they change (what Edit > Undo names), with the names of
 * the generated item providers ({@code plugin.properties}), and still do and undo what EMF's do.
 */
final class SiteEditingDomainTest {

    private static final SitePackage P = SitePackage.eINSTANCE;

    private BasicCommandStack stack;
    private SiteEditingDomain domain;
    private Project project;

    @BeforeEach
    void setUp() throws Exception {
        stack = new BasicCommandStack();
        domain = new SiteEditingDomain(new ComposedAdapterFactory(List.of(new SiteItemProviderAdapterFactory(),
                new ReflectiveItemProviderAdapterFactory())), stack);
        project = ExampleProjects.loadRiversideDepot();
        domain.getResourceSet().createResource(URI.createURI("memory:/example.eluvia")).getContents().add(project);
    }

    @Test
    void aSetNamesTheFeatureAndUndoes() {
        FlushingDesign d = project.getFlushingDesigns().get(0);
        double before = d.getDarcyFluxMetresPerDay();
        Command c = SetCommand.create(domain, d, P.getFlushingDesign_DarcyFluxMetresPerDay(), before * 2);
        // the property name of plugin.properties (_UI_FlushingDesign_darcyFluxMetresPerDay_feature)
        assertEquals("Set Darcy Flux Metres Per Day", c.getLabel());
        stack.execute(c);
        assertEquals(before * 2, d.getDarcyFluxMetresPerDay());
        assertSame(c, stack.getUndoCommand());
        stack.undo();
        assertEquals(before, d.getDarcyFluxMetresPerDay());
        assertEquals("Set Darcy Flux Metres Per Day", stack.getRedoCommand().getLabel());
    }

    @Test
    void anAddNamesTheTypeAndADeleteTheObject() {
        int layers = project.getSite().getLayers().size();
        SoilLayer layer = SiteFactory.eINSTANCE.createSoilLayer();
        layer.setName("Clay lens (test)");
        Command add = AddCommand.create(domain, project.getSite(), P.getSite_Layers(), layer);
        // _UI_SoilLayer_type of plugin.properties
        assertEquals("Add Soil Layer", add.getLabel());
        stack.execute(add);
        assertEquals(layers + 1, project.getSite().getLayers().size());
        Command delete = DeleteCommand.create(domain, List.of(layer));
        assertTrue(delete.getLabel().startsWith("Delete ") && delete.getLabel().contains("Clay lens (test)"), delete.getLabel());
        stack.execute(delete);
        assertFalse(project.getSite().getLayers().contains(layer));
        stack.undo();
        assertTrue(project.getSite().getLayers().contains(layer));
        Command two = AddCommand.create(domain, project.getSite(), P.getSite_Layers(),
                List.of(SiteFactory.eINSTANCE.createSoilLayer(), SiteFactory.eINSTANCE.createSoilLayer()));
        assertEquals("Add 2 \u00d7 Soil Layer", two.getLabel());
    }

    @Test
    void aCallerCanNameTheEditBetterAndAnImpossibleEditStaysImpossible() {
        FlushingDesign d = project.getFlushingDesigns().get(0);
        Command c = SiteEditingDomain.labelled("Set Darcy flux (m/d)",
                SetCommand.create(domain, d, P.getFlushingDesign_DarcyFluxMetresPerDay(), 0.3));
        assertEquals("Set Darcy flux (m/d)", c.getLabel());
        stack.execute(c);
        assertEquals(0.3, d.getDarcyFluxMetresPerDay());
        assertEquals("Set Darcy flux (m/d)", stack.getUndoCommand().getLabel());
        // EMF cannot add to a single-valued feature: the labelled command cannot execute either
        Command impossible = AddCommand.create(domain, d, P.getFlushingDesign_DarcyFluxMetresPerDay(), List.of(1.0));
        assertFalse(impossible.canExecute());
    }
}
