package eluvia.transport.numerical;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

import org.junit.jupiter.api.Test;

import eluvia.transport.CleanupCriterion;

/** Progress reports, cancellation, early stop and the "not reachable" answer. */
final class ProgressTest {
    private static FlushingColumn column() {
        SoilLayer layer = Columns.sand(1, 0.1).isotherm(SorptionIsotherm.linear(Columns.kdForRetardation(4))).build();
        return FlushingColumn.singleLayer(layer, 0.1, 0, InitialCondition.poreWaterPerLayer(1));
    }

    @Test
    void progressIsReportedInOrderUpToTheEnd() {
        List<Double> seen = new ArrayList<>();
        FlushingProgress p = (done, limit) -> {
            assertEquals(20, limit);
            seen.add(done);
        };
        new NumericalFlushingSolver(column(), SolverSettings.defaults())
                .run(FlushingRunRequest.upToPoreVolumes(20).progress(p).build());
        assertTrue(seen.size() > 20 && seen.size() <= 202, "reports: " + seen.size());
        for (int i = 1; i < seen.size(); i++) {
            assertTrue(seen.get(i) >= seen.get(i - 1));
        }
        assertEquals(20, seen.get(seen.size() - 1), 1e-9);
    }

    @Test
    void cancellationStopsTheRun() {
        double[] last = { 0 };
        FlushingProgress p = new FlushingProgress() {
            @Override
            public void advanced(double poreVolumes, double maximumPoreVolumes) {
                last[0] = poreVolumes;
            }

            @Override
            public boolean cancelRequested() {
                return last[0] >= 5;
            }
        };
        FlushingCancelledException e = assertThrows(FlushingCancelledException.class,
                () -> new NumericalFlushingSolver(column(), SolverSettings.defaults())
                        .run(FlushingRunRequest.upToPoreVolumes(100).progress(p).build()));
        assertTrue(e.poreVolumesReached() >= 5 && e.poreVolumesReached() < 6, "stopped at " + e.poreVolumesReached());
    }

    @Test
    void targetBeyondTheRunIsNotReachable() {
        FlushingRunResult r = new NumericalFlushingSolver(column(), SolverSettings.defaults())
                .run(FlushingRunRequest.upToPoreVolumes(3).target(CleanupCriterion.MAX_RESIDUAL, 1e-3).build());
        TargetOutcome o = r.outcome(CleanupCriterion.MAX_RESIDUAL);
        assertFalse(o.reached());
        assertTrue(Double.isNaN(o.poreVolumes()));
        assertTrue(o.message().contains("does not fall to 0.001000 of the initial concentration within 3.000 pore volumes"),
                o.message());
        assertEquals(3, r.finalPoreVolumes(), 1e-9);
    }

    @Test
    void runStopsOnceAllTargetsAreMet() {
        FlushingRunResult r = new NumericalFlushingSolver(column(), SolverSettings.defaults())
                .run(FlushingRunRequest.upToPoreVolumes(1000).targetForAll(0.1).build());
        double latest = 0;
        for (TargetOutcome o : r.outcomes().values()) {
            assertTrue(o.reached());
            latest = Math.max(latest, o.poreVolumes());
        }
        assertTrue(r.finalPoreVolumes() >= latest && r.finalPoreVolumes() < latest + 0.1,
                "stopped at " + r.finalPoreVolumes() + " after the last crossing " + latest);
        assertThrows(IllegalArgumentException.class, () -> new NumericalFlushingSolver(column(), SolverSettings.defaults())
                .run(FlushingRunRequest.upToPoreVolumes(1).build()).outcome(CleanupCriterion.EFFLUENT));
    }

    @Test
    void profileTimesDoNotDisturbTheResult() {
        FlushingColumn col = column();
        FlushingRunResult plain = new NumericalFlushingSolver(col, SolverSettings.defaults())
                .run(FlushingRunRequest.upToPoreVolumes(100).target(CleanupCriterion.EFFLUENT, 0.01).build());
        // profiles a hundred-millionth of a day apart force a tiny step and then a long one
        double d = col.daysForPoreVolumes(2);
        FlushingRunResult withProfiles = new NumericalFlushingSolver(col, SolverSettings.defaults())
                .run(FlushingRunRequest.upToPoreVolumes(100).target(CleanupCriterion.EFFLUENT, 0.01)
                        .profilesAtDays(d, d + 1e-8, 3 * d, 3 * d + 1e-8).build());
        assertEquals(4, withProfiles.profiles().size());
        assertEquals(d + 1e-8, withProfiles.profiles().get(1).timeDays(), 1e-15);
        double expected = plain.outcome(CleanupCriterion.EFFLUENT).poreVolumes();
        // the default step tolerance gives about 2e-4 (FiniteLayerTest); the disturbance must stay below it
        assertEquals(expected, withProfiles.outcome(CleanupCriterion.EFFLUENT).poreVolumes(), 1e-4 * expected);
        assertTrue(Math.abs(withProfiles.massBalance().relativeError()) < 1e-8);
    }

    @Test
    void effluentThatStartsCleanIsFollowedUntilItFallsAgain() {
        SoilLayer top = Columns.sand(0.5, 0.05).isotherm(SorptionIsotherm.linear(0.5)).build();
        SoilLayer bottom = Columns.sand(0.5, 0.05).isotherm(SorptionIsotherm.linear(0.5)).build();
        FlushingColumn col = new FlushingColumn(List.of(top, bottom), 0.1, 0, InitialCondition.poreWaterPerLayer(1, 0));
        FlushingRunResult r = new NumericalFlushingSolver(col, SolverSettings.defaults())
                .run(FlushingRunRequest.upToPoreVolumes(100).target(CleanupCriterion.EFFLUENT, 0.01).build());
        TargetOutcome o = r.outcome(CleanupCriterion.EFFLUENT);
        assertTrue(o.reached());
        // the effluent starts at 0, rises well above 1 % as the plume arrives, then falls
        double peak = Arrays.stream(r.effluentMilligramsPerLitre()).max().orElse(0);
        assertTrue(peak > 0.1, "peak " + peak);
        // plug flow would bring the plume out after R = 1 + 1.6 x 0.5 / 0.3 = 3.67 pore volumes
        // (REFERENCES.md retardation); the fall to 1 % comes later still
        assertTrue(o.poreVolumes() > 3.67, o.message());
        assertTrue(r.finalPoreVolumes() < 100, "stopped early at " + r.finalPoreVolumes());
    }
}
