package eluvia.ui.internal.views;

import java.util.List;

import org.eclipse.swt.widgets.Composite;

import eluvia.design.ContaminantFlushing;
import eluvia.design.DesignRun;
import eluvia.design.FlushingDesignResult;
import eluvia.report.chart.ChartSpec;
import eluvia.report.content.ResultFigures;
import eluvia.ui.internal.Messages;
import eluvia.ui.internal.document.OpenDocuments;
import eluvia.ui.internal.fields.Numbers;
import eluvia.ui.internal.fields.UnitDisplay;

/**
 * The Residuals view's content: for one flushing design, the remaining fraction against pore
 * volumes for every contaminant under the three criteria, and the two-region tail where the
 * contaminant has nonequilibrium parameters, with the targets and the design's pore volumes marked:
 * the design package's own chart ({@link ResultFigures#residualCurves}).
 */
public final class ResidualCurvesView extends ChartView {

    public ResidualCurvesView(Composite parent, OpenDocuments documents) {
        super(parent, documents, Messages.Chart_design, null);
        start();
    }

    private static FlushingDesignResult design(DesignRun run, String name) {
        return run.flushing().stream().filter(r -> r.designName().equals(name)).findFirst().orElse(null);
    }

    @Override
    List<String> firstChoices(DesignRun run) {
        return run.flushing().stream().map(FlushingDesignResult::designName).toList();
    }

    @Override
    ChartSpec chart(DesignRun run, String designName, String unused, UnitDisplay units) {
        FlushingDesignResult d = design(run, designName);
        return d == null || d.contaminants().isEmpty() ? null : ResultFigures.residualCurves(d);
    }

    @Override
    String noChartReason(DesignRun run, String designName, String unused) {
        return run.flushing().isEmpty() ? Messages.PoreVolumes_noDesigns : Messages.PoreVolumes_noContaminant;
    }

    @Override
    String notes(DesignRun run, String designName, String unused) {
        FlushingDesignResult d = design(run, designName);
        if (d == null) {
            return "";
        }
        StringBuilder b = new StringBuilder();
        b.append(FlushingResultsView.headline(d, new UnitDisplay(eluvia.ui.internal.preferences.UiPreferences.unitSystem())));
        for (ContaminantFlushing c : d.contaminants()) {
            if (c.twoRegion() != null) {
                b.append(' ').append(Messages.bind(Messages.Residual_twoRegion, new Object[] { c.contaminantName(),
                        Numbers.format(c.twoRegion().beta(), 3), Numbers.format(c.twoRegion().omega(), 3), c.twoRegion().basis() }));
            }
        }
        return b.toString();
    }
}
