package eluvia.ui.internal.views;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;

import org.eclipse.swt.SWT;
import org.eclipse.swt.custom.CTabFolder;
import org.eclipse.swt.custom.CTabItem;
import org.eclipse.swt.widgets.Composite;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import eluvia.design.DesignPipeline;
import eluvia.design.DesignRun;
import eluvia.design.ExcavationResult;
import eluvia.report.chart.LineChart;
import eluvia.report.content.ResultFigures;
import eluvia.site.model.ExcavationDesign;
import eluvia.site.model.UnitSystem;
import eluvia.ui.internal.Gui;
import eluvia.ui.internal.ProjectFixture;
import eluvia.ui.internal.document.ResultState;
import eluvia.ui.internal.fields.Numbers;

/** Every result view of the workbench shows the pipeline's run of the example, drawn as in the design package. */
final class AllResultViewsTest {

    private static final String[] KINDS = { "flushing", "residualCurves", "poreVolumes", "plan", "section", "enlargement",
            "excavation", "alternatives", "uncertainty", "calibration" };

    @TempDir
    Path dir;

    @Test
    void everyViewShowsTheRunOfTheExample() throws Exception {
        try (ProjectFixture f = ProjectFixture.example(dir, UnitSystem.SI); Gui viewShell = Gui.open(1100, 760)) {
            CTabFolder tabs = new CTabFolder(viewShell.shell, SWT.TOP);
            Composite[] views = new Composite[KINDS.length];
            for (int i = 0; i < KINDS.length; i++) {
                CTabItem item = new CTabItem(tabs, SWT.NONE);
                item.setText(KINDS[i]);
                views[i] = ResultPart.create(KINDS[i], tabs, f.documents);
                item.setControl(views[i]);
            }
            viewShell.show();
            ResultState state = f.awaitResults();
            assertEquals(ResultState.Status.READY, state.status(), state.failure());
            DesignRun direct = DesignPipeline.run(f.document.snapshot());

            ResidualCurvesView residual = (ResidualCurvesView) views[1];
            LineChart curves = (LineChart) residual.canvas().chart();
            assertNotNull(curves, residual.notesText());
            assertEquals(ResultFigures.residualCurves(direct.flushing().get(0)).series().size(), curves.series().size(),
                    "the design package's chart of the same run");
            assertTrue(curves.logY(), "remaining fraction on a logarithmic axis");

            PlanView plan = (PlanView) views[3];
            assertNotNull(plan.canvas().chart(), plan.notesText());
            eluvia.report.chart.PlanView map = (eluvia.report.chart.PlanView) plan.canvas().chart();
            // the design package's plan of the same run: block model columns, proposed and grown outlines
            assertEquals(ResultFigures.plan(f.document.project(), f.document.project().getContaminants().get(0),
                    direct.zoneAnalysis(), direct.enlargements()).data(), map.data());
            assertNotNull(map.grid(), "the block model is drawn");
            assertTrue(map.outlines().stream().anyMatch(o -> o.kind() == eluvia.report.chart.Outline.Kind.PROPOSED));
            assertTrue(map.outlines().stream().anyMatch(o -> o.kind() == eluvia.report.chart.Outline.Kind.ENLARGED));
            SectionView section = (SectionView) views[4];
            if (direct.enlargements().stream().anyMatch(e -> e.available())) {
                assertNotNull(section.canvas().chart(), section.notesText());
                assertNotNull(((EnlargementView) views[5]).canvas().chart());
            }

            ExcavationView excavation = (ExcavationView) views[6];
            assertEquals(direct.excavations().size() + 1, excavation.table().getColumnCount());
            ExcavationResult ex = direct.excavations().get(0);
            ExcavationDesign design = f.document.project().getExcavationDesigns().get(0);
            // the pit floor is the zone's bottom plus the overdig (eluvia.cost ExcavationQuantities)
            assertEquals(design.getZone().getBottomDepthMetres() + design.getOverdigMetres(), ex.quantities().pitDepthMetres(), 1e-9);
            assertEquals(Numbers.format(ex.quantities().pitDepthMetres(), Numbers.RESULT_DIGITS + 1),
                    excavation.table().getItem(0).getText(1));
            assertTrue(excavation.notesText().contains("\u26a0") || ex.quantities().cautions().isEmpty(),
                    "the excavation cautions are shown");

            AlternativesView alternatives = (AlternativesView) views[7];
            assertEquals(direct.alternatives().size(), alternatives.alternativesTable().getItemCount());
            var priced = direct.alternatives().stream().filter(a -> a.available() && a.estimate() != null).findFirst();
            if (priced.isPresent()) {
                int row = direct.alternatives().indexOf(priced.get());
                String pv = alternatives.alternativesTable().getItem(row).getText(4);
                assertTrue(pv.startsWith(Numbers.format(priced.get().estimate().presentValue().amount(), 4)), pv);
                assertNotNull(alternatives.chartCanvas().chart(), "cost breakdown");
                alternatives.alternativesTable().select(row);
                alternatives.alternativesTable().notifyListeners(SWT.Selection, null);
                assertEquals(priced.get().estimate().lines().size(), alternatives.linesTable().getItemCount());
            }

            for (int i = 0; i < KINDS.length; i++) {
                tabs.setSelection(i);
                viewShell.flush();
                viewShell.idle(50);
                viewShell.screenshot("view-" + KINDS[i]);
            }
            assertFalse(tabs.isDisposed());
        }
    }
}
