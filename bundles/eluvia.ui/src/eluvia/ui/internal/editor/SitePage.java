package eluvia.ui.internal.editor;

import java.text.DateFormat;
import java.util.ArrayList;
import java.util.List;

import org.eclipse.emf.ecore.EObject;
import org.eclipse.emf.ecore.EStructuralFeature;
import org.eclipse.swt.SWT;
import org.eclipse.swt.custom.ScrolledComposite;
import org.eclipse.swt.layout.GridLayout;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Control;
import org.eclipse.swt.widgets.Text;

import eluvia.site.model.Revision;
import eluvia.site.model.Site;
import eluvia.site.model.SiteFactory;
import eluvia.site.model.SitePackage;
import eluvia.site.model.Vertex;
import eluvia.site.units.Dimension;
import eluvia.ui.internal.Messages;
import eluvia.ui.internal.fields.Bindings;
import eluvia.ui.internal.fields.NumberSpec;
import eluvia.ui.internal.fields.ObjectTable;
import eluvia.ui.internal.fields.Range;

/** The project and its site: names, descriptions, coordinate frame, boundary and revision history. */
final class SitePage extends EditorPage {

    private static final SitePackage P = SitePackage.eINSTANCE;
    private ScrolledComposite area;
    private final List<ObjectTable<?>> tables = new ArrayList<>();

    SitePage(Bindings bindings) {
        super(bindings);
    }

    @Override
    String title() {
        return Messages.Page_site;
    }

    static NumberSpec easting() {
        return NumberSpec.of(Messages.Vertex_easting, Dimension.LENGTH, Range.any());
    }

    static NumberSpec northing() {
        return NumberSpec.of(Messages.Vertex_northing, Dimension.LENGTH, Range.any());
    }

    @Override
    void create(Composite parent) {
        parent.setLayout(new GridLayout(1, false));
        area = Forms.scrolled(parent);
        Composite form = new Composite(area, SWT.NONE);
        GridLayout layout = new GridLayout(2, false);
        layout.horizontalSpacing = 12;
        form.setLayout(layout);
        Bindings b = bindings;
        Forms.heading(form, Messages.Site_projectHeading, 2);
        b.text(form, project, P.getProject_Name(), Messages.Site_projectName, false);
        b.text(form, project, P.getProject_Description(), Messages.Site_projectDescription, true);
        Site site = project.getSite();
        if (site == null) {
            Forms.note(form, Messages.Site_noSite, 2);
            Forms.fit(area, form);
            return;
        }
        Forms.heading(form, Messages.Site_siteHeading, 2);
        b.text(form, site, P.getSite_Name(), Messages.Site_siteName, false);
        b.text(form, site, P.getSite_Description(), Messages.Site_siteDescription, true);
        b.text(form, site, P.getSite_CoordinateFrame(), Messages.Site_frame, true);
        b.number(form, site, P.getSite_GroundSurfaceElevationMetres(),
                NumberSpec.of(Messages.Site_groundElevation, Dimension.LENGTH, Range.any()));
        tables.add(ListEditor.create(form, b, Messages.Site_boundaryHeading, site, P.getSite_Boundary(),
                () -> SiteFactory.eINSTANCE.createVertex(), t -> t.number(P.getVertex_EastingMetres(), easting())
                        .number(P.getVertex_NorthingMetres(), northing())));
        Forms.note(form, Messages.Site_boundaryNote, 2);
        Forms.heading(form, Messages.Site_revisionsHeading, 2);
        Composite holder = new Composite(form, SWT.NONE);
        GridLayout hl = new GridLayout(1, false);
        hl.marginWidth = 0;
        holder.setLayout(hl);
        holder.setLayoutData(new org.eclipse.swt.layout.GridData(SWT.FILL, SWT.FILL, true, false, 2, 1));
        DateFormat when = DateFormat.getDateTimeInstance(DateFormat.MEDIUM, DateFormat.SHORT);
        ObjectTable<Revision> revisions = new ObjectTable<>(holder, b, project::getRevisions, 4)
                .column(Messages.Site_revisionWhen, r -> r.getTimestamp() == null ? "" : when.format(r.getTimestamp()))
                .column(Messages.Site_revisionAuthor, Revision::getAuthor)
                .column(Messages.Site_revisionSummary, Revision::getSummary).build();
        tables.add(revisions);
        Forms.fit(area, form);
    }

    @Override
    boolean reveal(EObject object, EStructuralFeature feature) {
        boolean mine = object == project || object == project.getSite() || object instanceof Vertex v
                && v.eContainer() == project.getSite() || object instanceof Revision;
        if (!mine) {
            return false;
        }
        Control c = feature == null ? null : bindings.controlFor(object, feature);
        if (object == project && feature != null && c == null) {
            return false;
        }
        if (c != null) {
            area.showControl(c);
            c.setFocus();
            if (c instanceof Text t) {
                t.selectAll();
            }
            return true;
        }
        for (ObjectTable<?> t : tables) {
            if (reveal(t, object, feature)) {
                area.showControl(t.table());
                return true;
            }
        }
        return true;
    }

    @SuppressWarnings("unchecked")
    private static <X extends EObject> boolean reveal(ObjectTable<X> t, EObject object, EStructuralFeature feature) {
        return t.reveal((X) object, feature);
    }
}
