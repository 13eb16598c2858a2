package eluvia.ui.internal.views;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.List;

import org.eclipse.swt.SWT;
import org.eclipse.swt.custom.CTabFolder;
import org.eclipse.swt.custom.CTabItem;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import eluvia.report.chart.DepthProfile;
import eluvia.report.chart.LineChart;
import eluvia.report.chart.ValuePoint;
import eluvia.site.model.UnitSystem;
import eluvia.ui.internal.Gui;
import eluvia.ui.internal.ProjectFixture;
import eluvia.ui.internal.document.ResultState;
import eluvia.ui.internal.preferences.UiPreferences;

/**
 * The result views draw their charts in the user's unit system and draw them again when it
 * changes, with no new design run: lengths in feet, volumes in cubic yards, concentrations as they are.
 */
final class UnitSystemChartsTest {

    /** 1 ft = 0.3048 m exactly (the international foot of 1959; NIST SP 811, 2008, Appendix B.8). */
    private static final double METRES_PER_FOOT = 0.3048;
    /** 1 yd = 3 ft exactly (NIST SP 811, 2008, Appendix B.8), so 1 yd3 = (0.9144 m)^3. */
    private static final double CUBIC_METRES_PER_CUBIC_YARD = Math.pow(3 * METRES_PER_FOOT, 3);

    @TempDir
    Path dir;

    @Test
    void chartsFollowTheUnitPreferenceAndRedrawWhenItChanges() throws Exception {
        try (ProjectFixture f = ProjectFixture.example(dir, UnitSystem.SI); Gui viewShell = Gui.open(1100, 760)) {
            CTabFolder tabs = new CTabFolder(viewShell.shell, SWT.TOP);
            String[] kinds = { "plan", "section", "enlargement", "depthProfiles" };
            Object[] views = new Object[kinds.length];
            for (int i = 0; i < kinds.length; i++) {
                CTabItem item = new CTabItem(tabs, SWT.NONE);
                item.setText(kinds[i]);
                var v = ResultPart.create(kinds[i], tabs, f.documents);
                item.setControl(v);
                views[i] = v;
            }
            tabs.setSelection(0);
            viewShell.show();
            ResultState state = f.awaitResults();
            assertEquals(ResultState.Status.READY, state.status(), state.failure());
            DepthProfilesView depthView = (DepthProfilesView) views[3];
            f.gui.waitUntil("the depth profiles", () -> !depthView.busy() && depthView.canvas().chart() != null);
            eluvia.report.chart.PlanView planSi = (eluvia.report.chart.PlanView) ((PlanView) views[0]).canvas().chart();
            eluvia.report.chart.SectionView sectionSi = (eluvia.report.chart.SectionView) ((SectionView) views[1]).canvas().chart();
            LineChart volumeSi = (LineChart) ((EnlargementView) views[2]).canvas().chart();
            DepthProfile depthSi = (DepthProfile) depthView.canvas().chart();
            assertNotNull(planSi);
            assertEquals("m", planSi.eastingAxis().unit());
            assertEquals("m", depthSi.depthAxis().unit());
            String notesSi = ((PlanView) views[0]).notesText();
            var run = ((PlanView) views[0]).shownRun();

            UiPreferences.setUnitSystem(UnitSystem.US_CUSTOMARY);
            viewShell.flush();
            eluvia.report.chart.PlanView planUs = (eluvia.report.chart.PlanView) ((PlanView) views[0]).canvas().chart();
            eluvia.report.chart.SectionView sectionUs = (eluvia.report.chart.SectionView) ((SectionView) views[1]).canvas().chart();
            LineChart volumeUs = (LineChart) ((EnlargementView) views[2]).canvas().chart();
            DepthProfile depthUs = (DepthProfile) depthView.canvas().chart();
            assertEquals(run, ((PlanView) views[0]).shownRun(), "redrawn from the same run");

            assertEquals("ft", planUs.eastingAxis().unit());
            assertEquals("ft", planUs.northingAxis().unit());
            assertEquals("mg/kg", planUs.valueAxis().unit(), "concentrations are shown as computed");
            List<ValuePoint> si = planSi.points();
            List<ValuePoint> us = planUs.points();
            assertEquals(si.size(), us.size());
            for (int i = 0; i < si.size(); i++) {
                // the US value times the exact factor is the SI value
                assertEquals(si.get(i).x(), us.get(i).x() * METRES_PER_FOOT, 1e-12 * Math.abs(si.get(i).x()));
                assertEquals(si.get(i).y(), us.get(i).y() * METRES_PER_FOOT, 1e-12 * Math.abs(si.get(i).y()));
                assertEquals(si.get(i).value(), us.get(i).value(), 0.0);
            }
            assertEquals(planSi.grid().originX(), planUs.grid().originX() * METRES_PER_FOOT, 1e-12);
            assertEquals(planSi.grid().cellWidth(), planUs.grid().cellWidth() * METRES_PER_FOOT, 1e-12);
            assertTrue(((PlanView) views[0]).notesText().contains(" ft"),
                    "the notes follow too: " + ((PlanView) views[0]).notesText());
            assertTrue(!notesSi.contains(" ft"), notesSi);

            assertEquals("ft", sectionUs.depthAxis().unit());
            double[] sy = sectionSi.outlines().get(0).y();
            double[] uy = sectionUs.outlines().get(0).y();
            for (int i = 0; i < sy.length; i++) {
                assertEquals(sy[i], uy[i] * METRES_PER_FOOT, 1e-12 * Math.max(1, Math.abs(sy[i])));
            }

            assertEquals("yd\u00b3", volumeUs.yAxis().unit());
            double[] m3 = volumeSi.series().get(0).y();
            double[] yd3 = volumeUs.series().get(0).y();
            for (int i = 0; i < m3.length; i++) {
                assertEquals(m3[i], yd3[i] * CUBIC_METRES_PER_CUBIC_YARD, 1e-12 * Math.max(1, m3[i]));
            }

            assertEquals("ft", depthUs.depthAxis().unit());
            double[] dz = depthSi.profiles().get(0).y();
            double[] uz = depthUs.profiles().get(0).y();
            for (int i = 0; i < dz.length; i++) {
                assertEquals(dz[i], uz[i] * METRES_PER_FOOT, 1e-12 * Math.max(1, dz[i]));
            }
            assertTrue(java.util.Arrays.equals(depthSi.profiles().get(0).x(), depthUs.profiles().get(0).x()),
                    "concentrations are not converted");

            viewShell.idle(50);
            viewShell.screenshot("view-plan-us-customary");

            UiPreferences.setUnitSystem(UnitSystem.SI);
            viewShell.flush();
            assertEquals(planSi.data(), ((eluvia.report.chart.PlanView) ((PlanView) views[0]).canvas().chart()).data(),
                    "back in SI: the same chart as before");
        }
    }
}
