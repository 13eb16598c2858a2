package eluvia.design;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.atomic.AtomicInteger;

import org.junit.jupiter.api.Test;

import eluvia.site.model.ComplianceCriterion;
import eluvia.site.model.Project;
import eluvia.site.model.SolutionMethod;

final class ProgressTest {

    private static final DesignSettings FAST = DesignSettings.builder().pushDownBelowColumn(false)
            .blockPlanSizeMetres(2).blockDepthMetres(0.5).build();

    @Test
    void progressRisesToOneThroughTheStages() {
        List<Double> fractions = new ArrayList<>();
        List<String> stages = new ArrayList<>();
        DesignPipeline.run(TestProjects.sampledField(0.2), FAST, (stage, f) -> {
            fractions.add(f);
            stages.add(stage);
        });
        for (int i = 1; i < fractions.size(); i++) {
            assertTrue(fractions.get(i) >= fractions.get(i - 1), "progress goes back at " + stages.get(i));
        }
        assertTrue(fractions.get(fractions.size() - 1) <= 1.0);
        assertTrue(stages.stream().anyMatch(s -> s.contains("zone analysis")));
        assertTrue(stages.stream().anyMatch(s -> s.contains("flushing design")));
    }

    @Test
    void aCancelStopsTheNumericalSolverMidRun() {
        Project p = TestProjects.singleLayer(0.2, 1, ComplianceCriterion.EFFLUENT);
        p.getFlushingDesigns().get(0).setSolutionMethod(SolutionMethod.NUMERICAL);
        AtomicInteger reports = new AtomicInteger();
        DesignProgress cancelInsideTheSolver = new DesignProgress() {
            @Override
            public void advanced(String stage, double fractionDone) {
                if (stage.contains("flushing design")) {
                    reports.incrementAndGet();
                }
            }

            @Override
            public boolean cancelRequested() {
                return reports.get() >= 3; // the stage report, then two reports from inside the solver
            }
        };
        DesignCancelledException e = assertThrows(DesignCancelledException.class,
                () -> DesignPipeline.run(p, FAST, cancelInsideTheSolver));
        assertTrue(e.stage().contains("flushing design 'flush A'"), e.stage());
        assertEquals(3, reports.get());
    }

    @Test
    void aCancelStopsTheZoneAnalysis() {
        DesignProgress cancelAtTheZones = new DesignProgress() {
            private boolean zones;

            @Override
            public void advanced(String stage, double fractionDone) {
                zones |= stage.contains("zone analysis");
            }

            @Override
            public boolean cancelRequested() {
                return zones;
            }
        };
        DesignCancelledException e = assertThrows(DesignCancelledException.class,
                () -> DesignPipeline.run(TestProjects.sampledField(0.2), FAST, cancelAtTheZones));
        assertTrue(e.stage().contains("zone analysis"), e.stage());
    }
}
