package eluvia.ui.internal.views;

import org.eclipse.e4.ui.di.Focus;
import org.eclipse.e4.ui.model.application.ui.basic.MPart;
import org.eclipse.swt.layout.FillLayout;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Label;

import eluvia.ui.internal.Messages;
import eluvia.ui.internal.document.OpenDocuments;
import jakarta.annotation.PostConstruct;

/**
 * A result view of the workbench. Which one is named by the part's persisted state under
 * {@link #VIEW_KEY} in the application model; every result view follows the active project.
 */
public final class ResultPart {

    /** Persisted-state key naming the view. */
    public static final String VIEW_KEY = "eluvia.ui.view";

    private Composite view;

    @PostConstruct
    public void create(Composite parent, MPart part, OpenDocuments documents) {
        parent.setLayout(new FillLayout());
        String kind = part.getPersistedState().getOrDefault(VIEW_KEY, "");
        view = create(kind, parent, documents);
    }

    /** The view of a kind, or a label saying the kind is unknown. */
    public static Composite create(String kind, Composite parent, OpenDocuments documents) {
        return switch (kind) {
        case "flushing" -> new FlushingResultsView(parent, documents);
        case "poreVolumes" -> new PoreVolumesView(parent, documents);
        case "residualCurves" -> new ResidualCurvesView(parent, documents);
        case "depthProfiles" -> new DepthProfilesView(parent, documents);
        case "plan" -> new PlanView(parent, documents);
        case "section" -> new SectionView(parent, documents);
        case "enlargement" -> new EnlargementView(parent, documents);
        case "excavation" -> new ExcavationView(parent, documents);
        case "alternatives" -> new AlternativesView(parent, documents);
        case "uncertainty" -> new UncertaintyView(parent, documents);
        case "calibration" -> new CalibrationView(parent, documents);
        default -> {
            Composite c = new Composite(parent, org.eclipse.swt.SWT.NONE);
            c.setLayout(new FillLayout());
            new Label(c, org.eclipse.swt.SWT.WRAP).setText(Messages.bind(Messages.Results_unknownView, kind));
            yield c;
        }
        };
    }

    @Focus
    public void focus() {
        view.setFocus();
    }
}
