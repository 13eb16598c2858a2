package eluvia.ui.internal.views;

import java.util.List;

import org.eclipse.swt.widgets.Composite;

import eluvia.design.DesignRun;
import eluvia.design.EnteredZoneComparison;
import eluvia.design.ZoneAnalysis;
import eluvia.design.ZoneEnlargement;
import eluvia.design.ZoneOutline;
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
 * The Plan view's content: the site to scale in the user's length unit with the block model's
 * columns coloured by their highest estimate of a contaminant, the sampling locations coloured by
 * the highest sample, the site boundary, the entered zones, the proposed zone and each entered zone
 * grown by its enlargement after the longest delay (the design package's chart,
 * {@link ResultFigures#plan}), and the zone analysis's figures: volume above the cleanup level,
 * the proposed zone, how the entered zones hold it and how far they grow.
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
        return c == null || project().getSite() == null ? null
                : ResultFigures.plan(project(), c, run.zoneAnalysis(), run.enlargements(), units.figureUnits());
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
        Project p = project();
        for (ZoneEnlargement e : run.enlargements()) {
            ZoneOutline grown = p == null ? null : ResultFigures.enlargedOutline(p, e).orElse(null);
            if (grown != null) {
                b.append(' ').append(Messages.bind(Messages.Plan_grown, grown.basis(),
                        u.format(grown.grownMetres(), Dimension.LENGTH, 3)));
            }
        }
        return b.toString();
    }
}
