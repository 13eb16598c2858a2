package eluvia.ui.internal.views;

import java.util.List;

import org.eclipse.swt.widgets.Composite;

import eluvia.cost.CostOfDelay;
import eluvia.design.CostOfDelayResult;
import eluvia.design.DesignRun;
import eluvia.report.chart.ChartSpec;
import eluvia.report.content.ResultFigures;
import eluvia.ui.internal.Messages;
import eluvia.ui.internal.document.OpenDocuments;
import eluvia.ui.internal.fields.Numbers;
import eluvia.ui.internal.fields.UnitDisplay;

/**
 * The Enlargement view's content: the volume above the cleanup level against the delay before the
 * remedy starts, for every zone (the design package's chart, {@link ResultFigures#enlargement}),
 * and the cost of that delay for each alternative.
 */
public final class EnlargementView extends ChartView {

    public EnlargementView(Composite parent, OpenDocuments documents) {
        super(parent, documents, null, null);
        start();
    }

    @Override
    List<String> firstChoices(DesignRun run) {
        return List.of();
    }

    @Override
    ChartSpec chart(DesignRun run, String a, String b, UnitDisplay units) {
        return ResultFigures.enlargement(run.enlargements(), units.figureUnits());
    }

    @Override
    String noChartReason(DesignRun run, String a, String b) {
        return run.enlargements().stream().filter(e -> !e.available()).map(e -> e.zoneName() + ": " + e.unavailableReason())
                .findFirst().orElse(Messages.Enlargement_none);
    }

    @Override
    String notes(DesignRun run, String a, String b) {
        StringBuilder s = new StringBuilder();
        for (CostOfDelayResult c : run.costOfDelay()) {
            if (!c.available() || c.points().isEmpty()) {
                continue;
            }
            CostOfDelay.Point last = c.points().get(c.points().size() - 1);
            s.append(Messages.bind(Messages.Enlargement_costOfDelay, new Object[] { c.alternativeName(),
                    Numbers.format(last.delayYears(), 3), Numbers.format(last.increaseToday().amount(), 3),
                    last.increaseToday().currency() })).append(' ');
        }
        return s.toString().trim();
    }
}
