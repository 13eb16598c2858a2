package eluvia.ui.internal.editor;

import java.util.ArrayList;
import java.util.List;

import org.eclipse.emf.ecore.EObject;
import org.eclipse.emf.ecore.EStructuralFeature;
import org.eclipse.swt.SWT;
import org.eclipse.swt.custom.CTabFolder;
import org.eclipse.swt.custom.CTabItem;
import org.eclipse.swt.graphics.Color;
import org.eclipse.swt.layout.GridData;
import org.eclipse.swt.layout.GridLayout;
import org.eclipse.swt.widgets.Composite;

import eluvia.design.Cautions;
import eluvia.site.library.PropertyLibrary;
import eluvia.site.model.UnitSystem;
import eluvia.ui.internal.Messages;
import eluvia.ui.internal.document.Navigator;
import eluvia.ui.internal.document.ProjectDocument;
import eluvia.ui.internal.document.ResultState;
import eluvia.ui.internal.fields.Bindings;
import eluvia.ui.internal.fields.FieldMessages;
import eluvia.ui.internal.fields.UnitDisplay;

/**
 * The project editor's content: a caution line, one page per part of the project (site, layers,
 * contaminants, sampling, cleanup levels, zones, flushing, excavation, price books, column tests,
 * uncertainty, zone analysis)
 * and the message line for values that are kept as typed but not accepted. Every edit goes through
 * the document's command stack. Results are not shown here but in the result views, which follow
 * the active editor. The composite computes nothing.
 */
public final class ProjectEditorComposite extends Composite implements Navigator {

    private final ProjectDocument document;
    private final PropertyLibrary library;
    private final Color cautionColour;
    private final Color badColour;
    private UnitSystem units;
    private CTabFolder tabs;
    private FieldMessages messages;
    private Bindings bindings;
    private final List<EditorPage> pages = new ArrayList<>();
    private ResultState latest = ResultState.none();

    public ProjectEditorComposite(Composite parent, ProjectDocument document, UnitSystem units, PropertyLibrary library) {
        super(parent, SWT.NONE);
        this.document = document;
        this.library = library;
        this.units = units;
        cautionColour = new Color(252, 244, 226);
        badColour = new Color(251, 226, 222);
        GridLayout layout = new GridLayout(1, false);
        layout.marginWidth = 0;
        layout.marginHeight = 0;
        layout.verticalSpacing = 0;
        setLayout(layout);
        Composite banner = Forms.caution(this, Cautions.LICENSED_REVIEW, cautionColour, 1);
        ((GridData) banner.getLayoutData()).horizontalIndent = 0;
        build(0);
    }

    private void build(int selectedPage) {
        if (tabs != null) {
            tabs.dispose();
            messages.label().dispose();
        }
        pages.clear();
        tabs = new CTabFolder(this, SWT.TOP | SWT.FLAT);
        tabs.setLayoutData(new GridData(SWT.FILL, SWT.FILL, true, true));
        Composite messageHolder = this;
        messages = new FieldMessages(messageHolder);
        ((GridData) messages.label().getLayoutData()).exclude = true;
        messages.label().setVisible(false);
        bindings = new Bindings(document, new UnitDisplay(units), messages, badColour);
        pages.add(new SitePage(bindings));
        pages.add(new LayersPage(bindings));
        pages.add(new ContaminantsPage(bindings, library));
        pages.add(new SamplingPage(bindings, new SampleImport(bindings)));
        pages.add(new CleanupLevelsPage(bindings));
        pages.add(new ZonesPage(bindings));
        pages.add(new FlushingPage(bindings, cautionColour));
        pages.add(new ExcavationPage(bindings, cautionColour));
        pages.add(new PriceBooksPage(bindings, cautionColour));
        pages.add(new ColumnTestsPage(bindings));
        pages.add(new UncertaintyPage(bindings));
        pages.add(new ZoneAnalysisPage(bindings, () -> latest));
        for (EditorPage page : pages) {
            CTabItem item = new CTabItem(tabs, SWT.NONE);
            item.setText(page.title());
            item.setData(page);
        }
        tabs.addListener(SWT.Selection, e -> ensureCreated(tabs.getSelectionIndex()));
        int index = Math.max(0, Math.min(selectedPage, pages.size() - 1));
        tabs.setSelection(index);
        ensureCreated(index);
        layout(true, true);
    }

    private void ensureCreated(int index) {
        if (index < 0) {
            return;
        }
        CTabItem item = tabs.getItem(index);
        if (item.getControl() == null) {
            Composite body = new Composite(tabs, SWT.NONE);
            ((EditorPage) item.getData()).create(body);
            item.setControl(body);
            body.layout(true, true);
        }
    }

    /** Shows numbers in another unit system (the pages are rebuilt; the model is untouched). */
    public void setUnits(UnitSystem newUnits) {
        if (newUnits == units) {
            return;
        }
        units = newUnits;
        build(tabs.getSelectionIndex());
    }

    public UnitSystem units() {
        return units;
    }

    public ProjectDocument document() {
        return document;
    }

    /** The tab folder (tests and navigation). */
    public CTabFolder tabs() {
        return tabs;
    }

    /** The messages of values kept as typed but not accepted. */
    public List<String> fieldMessages() {
        return messages.messages();
    }

    /** Selects a page by its index and builds it if needed. */
    public void showPage(int index) {
        tabs.setSelection(index);
        ensureCreated(index);
    }

    /** The index of the page with the given title, or -1. */
    public int pageIndex(String title) {
        for (int i = 0; i < pages.size(); i++) {
            if (pages.get(i).title().equals(title)) {
                return i;
            }
        }
        return -1;
    }

    @Override
    public boolean reveal(EObject object, EStructuralFeature feature) {
        if (object == null) {
            return false;
        }
        for (int i = 0; i < pages.size(); i++) {
            ensureCreated(i);
            CTabItem previous = tabs.getSelection();
            tabs.setSelection(i);
            if (pages.get(i).reveal(object, feature)) {
                return true;
            }
            tabs.setSelection(previous);
        }
        if (object == document.project()) {
            showPage(0);
            return true;
        }
        return false;
    }

    @Override
    public void resultsChanged(ResultState state) {
        latest = state == null ? ResultState.none() : state;
        if (!isDisposed()) {
            for (EditorPage page : pages) {
                page.resultsChanged();
            }
        }
    }

    /** The latest results published for the document. */
    public ResultState latestResults() {
        return latest;
    }

    @Override
    public boolean setFocus() {
        return tabs.setFocus();
    }

    @Override
    public void dispose() {
        super.dispose();
        cautionColour.dispose();
        badColour.dispose();
    }

    /** Title of the editor tab for a document, with the dirty marker handled by the workbench. */
    public static String title(ProjectDocument document) {
        return Messages.bind(Messages.Editor_title, document.file().getFileName());
    }
}
