package eluvia.ui.internal.views;

import java.util.ArrayList;
import java.util.List;

import org.eclipse.swt.widgets.Composite;

import eluvia.design.ContaminantFlushing;
import eluvia.design.DesignRun;
import eluvia.design.FlushingDesignResult;
import eluvia.design.FlushingMethod;
import eluvia.report.chart.Axis;
import eluvia.report.chart.BarChart;
import eluvia.report.chart.BarSeries;
import eluvia.report.chart.ChartSpec;
import eluvia.transport.CleanupCriterion;
import eluvia.transport.FlushingEstimate;
import eluvia.transport.PoreVolumeResult;
import eluvia.ui.internal.Messages;
import eluvia.ui.internal.document.OpenDocuments;
import eluvia.ui.internal.fields.UnitDisplay;

/**
 * The Pore volumes view's content: for one flushing design and contaminant, the pore volumes to
 * the cleanup level under each of the three criteria by the solution that governs the design
 * (equilibrium, two-region or numerical), beside the well-mixed estimate (the slow bound, US EPA
 * pump-and-treat guidance) and plug flow (the fast bound, T = R). A criterion whose level is not
 * reached within the design's limit has no bar. The notes add the independent check of a
 * numerical run.
 */
public final class PoreVolumesView extends ChartView {

    public PoreVolumesView(Composite parent, OpenDocuments documents) {
        super(parent, documents, Messages.Chart_design, Messages.Chart_contaminant);
        start();
    }

    private static FlushingDesignResult design(DesignRun run, String name) {
        return run.flushing().stream().filter(r -> r.designName().equals(name)).findFirst().orElse(null);
    }

    private static ContaminantFlushing contaminant(FlushingDesignResult d, String name) {
        return d == null ? null : d.contaminants().stream().filter(c -> c.contaminantName().equals(name)).findFirst()
                .orElse(null);
    }

    @Override
    List<String> firstChoices(DesignRun run) {
        return run.flushing().stream().map(FlushingDesignResult::designName).toList();
    }

    @Override
    List<String> secondChoices(DesignRun run, String firstChoice) {
        FlushingDesignResult d = design(run, firstChoice);
        return d == null ? List.of() : d.contaminants().stream().map(ContaminantFlushing::contaminantName).toList();
    }

    @Override
    ChartSpec chart(DesignRun run, String designName, String contaminantName, UnitDisplay units) {
        ContaminantFlushing c = contaminant(design(run, designName), contaminantName);
        if (c == null) {
            return null;
        }
        List<String> categories = new ArrayList<>();
        double[] solution = new double[CleanupCriterion.values().length];
        double[] wellMixed = new double[solution.length];
        double[] plugFlow = new double[solution.length];
        String model = "";
        int i = 0;
        for (CleanupCriterion k : CleanupCriterion.values()) {
            FlushingEstimate e = c.estimate(k);
            PoreVolumeResult governing = c.governingResult(k);
            categories.add(k.description());
            solution[i] = governing != null && governing.reachable() ? governing.poreVolumes() : 0;
            wellMixed[i] = e.wellMixedPoreVolumes();
            plugFlow[i] = e.plugFlowPoreVolumes();
            i++;
        }
        model = c.governing().method().label();
        return new BarChart(Messages.bind(Messages.PoreVolumes_title, designName, contaminantName),
                new Axis(Messages.PoreVolumes_axis, "PV"), Messages.PoreVolumes_criterion, categories,
                List.of(new BarSeries(Messages.bind(Messages.PoreVolumes_solution, model), solution),
                        new BarSeries(Messages.PoreVolumes_wellMixed, wellMixed),
                        new BarSeries(Messages.PoreVolumes_plugFlow, plugFlow)),
                false);
    }

    @Override
    String noChartReason(DesignRun run, String designName, String contaminantName) {
        return run.flushing().isEmpty() ? Messages.PoreVolumes_noDesigns : Messages.PoreVolumes_noContaminant;
    }

    @Override
    String notes(DesignRun run, String designName, String contaminantName) {
        ContaminantFlushing c = contaminant(design(run, designName), contaminantName);
        if (c == null) {
            return "";
        }
        StringBuilder b = new StringBuilder(Messages.bind(Messages.PoreVolumes_target,
                eluvia.ui.internal.fields.Numbers.format(c.targetFraction(), 3)));
        for (CleanupCriterion k : CleanupCriterion.values()) {
            PoreVolumeResult governing = c.governingResult(k);
            if (governing == null || !governing.reachable()) {
                b.append(' ').append(Messages.bind(Messages.PoreVolumes_notReached, k.description()));
            }
        }
        if (c.numerical() != null) {
            b.append(' ').append(Messages.bind(Messages.PoreVolumes_numericalCheck,
                    c.numerical().spectralCheck().describe(c.method(FlushingMethod.NUMERICAL).orElse(null))));
        }
        b.append(' ').append(Messages.PoreVolumes_curvesElsewhere);
        return b.toString();
    }
}
