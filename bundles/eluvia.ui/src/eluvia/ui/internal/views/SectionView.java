package eluvia.ui.internal.views;

import java.util.List;

import org.eclipse.swt.widgets.Composite;

import eluvia.design.DesignRun;
import eluvia.design.EnlargementPoint;
import eluvia.design.ZoneEnlargement;
import eluvia.report.chart.ChartSpec;
import eluvia.report.content.ResultFigures;
import eluvia.site.units.Dimension;
import eluvia.ui.internal.Messages;
import eluvia.ui.internal.document.OpenDocuments;
import eluvia.ui.internal.fields.Numbers;
import eluvia.ui.internal.fields.UnitDisplay;

/**
 * The Section view's content: a vertical section through a zone with the zone as entered, the zone
 * above the cleanup level after each delay of the pipeline's enlargement, and the layer boundaries
 * (the design package's chart, {@link ResultFigures#section}).
 */
public final class SectionView extends ChartView {

    public SectionView(Composite parent, OpenDocuments documents) {
        super(parent, documents, Messages.Section_zone, null);
        start();
    }

    private static ZoneEnlargement enlargement(DesignRun run, String zone) {
        return run.enlargements().stream().filter(e -> e.zoneName().equals(zone)).findFirst().orElse(null);
    }

    @Override
    List<String> firstChoices(DesignRun run) {
        return run.enlargements().stream().map(ZoneEnlargement::zoneName).toList();
    }

    @Override
    ChartSpec chart(DesignRun run, String zone, String unused, UnitDisplay units) {
        ZoneEnlargement e = enlargement(run, zone);
        return e == null || project() == null || project().getSite() == null ? null
                : ResultFigures.section(project(), e, units.figureUnits());
    }

    @Override
    String noChartReason(DesignRun run, String zone, String unused) {
        ZoneEnlargement e = enlargement(run, zone);
        return e == null ? Messages.Section_noZone : Messages.bind(Messages.Section_unavailable, e.unavailableReason());
    }

    @Override
    String notes(DesignRun run, String zone, String unused) {
        ZoneEnlargement e = enlargement(run, zone);
        if (e == null || !e.available() || e.envelope().isEmpty()) {
            return "";
        }
        UnitDisplay u = new UnitDisplay(eluvia.ui.internal.preferences.UiPreferences.unitSystem());
        EnlargementPoint last = e.envelope().get(e.envelope().size() - 1);
        return Messages.bind(Messages.Section_notes, new Object[] { Numbers.format(last.delayYears(), 3),
                u.format(last.volumeAboveLevelCubicMetres(), Dimension.VOLUME, 3),
                u.format(e.sourceVolumeCubicMetres(), Dimension.VOLUME, 3), Numbers.format(last.ratio(), 3),
                ZoneEnlargement.METHOD });
    }
}
