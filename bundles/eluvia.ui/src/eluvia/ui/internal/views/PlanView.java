package eluvia.ui.internal.views;

import java.util.List;

import org.eclipse.swt.widgets.Composite;

import eluvia.design.DesignRun;
import eluvia.design.EnteredZoneComparison;
import eluvia.design.ZoneAnalysis;
import eluvia.report.chart.ChartSpec;
import eluvia.report.content.ResultFigures;
import eluvia.site.model.Contaminant;
import eluvia.site.model.Project;
import eluvia.site.units.Dimension;
import eluvia.ui.internal.Messages;
import eluvia.ui.internal.document.OpenDocuments;
import eluvia.ui.internal.fields.Numbers;
import eluvia.ui.internal.fields.UnitDisplay;

/**
 * The Plan view's content: the site to scale with the sampling locations coloured by the highest
 * sample of a contaminant, the site boundary and the zones (the design package's chart,
 * {@link ResultFigures#plan}), and the zone analysis's figures: volume above the cleanup level,
 * the proposed zone and how the entered zones hold it.
 */
public final class PlanView extends ChartView {

    public PlanView(Composite parent, OpenDocuments documents) {
        super(parent, documents, Messages.Chart_contaminant, null);
        start();
    }

    private Contaminant contaminant(String name) {
        Project p = project();
        return p == null ? null : p.getContaminants().stream().filter(c -> name != null && name.equals(c.getName()))
                .findFirst().orElse(null);
    }

    @Override
    List<String> firstChoices(DesignRun run) {
        Project p = project();
        return p == null ? List.of() : p.getContaminants().stream().map(Contaminant::getName).toList();
    }

    @Override
    ChartSpec chart(DesignRun run, String contaminantName, String unused, UnitDisplay units) {
        Contaminant c = contaminant(contaminantName);
        return c == null || project().getSite() == null ? null : ResultFigures.plan(project(), c);
    }

    @Override
    String noChartReason(DesignRun run, String contaminantName, String unused) {
        return Messages.Plan_nothing;
    }

    @Override
    String notes(DesignRun run, String contaminantName, String unused) {
        ZoneAnalysis z = run.zoneAnalysis();
        if (z == null || !z.available()) {
            return Messages.bind(Messages.Plan_noAnalysis, z == null ? "" : z.unavailableReason());
        }
        UnitDisplay u = new UnitDisplay(eluvia.ui.internal.preferences.UiPreferences.unitSystem());
        StringBuilder b = new StringBuilder(Messages.bind(Messages.Plan_analysis, new Object[] { z.estimator().label(),
                u.format(z.volumeAboveLevelCubicMetres(), Dimension.VOLUME, 3), z.blockModelBasis() }));
        if (z.proposedZone() != null) {
            b.append(' ').append(Messages.bind(Messages.Plan_proposed, new Object[] {
                    u.format(z.proposedZone().footprint().areaSquareMetres(), Dimension.AREA, 3),
                    u.format(z.proposedZone().topDepthMetres(), Dimension.LENGTH, 3),
                    u.format(z.proposedZone().bottomDepthMetres(), Dimension.LENGTH, 3) }));
        }
        for (EnteredZoneComparison e : z.enteredZones()) {
            b.append(' ').append(e.zoneName()).append(": ").append(e.assessment());
            if (Double.isFinite(e.fractionInside())) {
                b.append(' ').append(Messages.bind(Messages.Plan_fraction, Numbers.format(100 * e.fractionInside(), 3)));
            }
        }
        return b.toString();
    }
}
