package eluvia.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.time.LocalDate;
import java.time.ZoneOffset;
import java.util.List;

import org.eclipse.emf.ecore.util.EcoreUtil;
import org.junit.jupiter.api.Test;

import eluvia.design.DesignPipeline;
import eluvia.design.DesignRun;
import eluvia.design.DesignSettings;
import eluvia.design.UncertaintyAnalysis;
import eluvia.design.UncertaintyHeadline;
import eluvia.design.UncertaintyResults;
import eluvia.design.uncertainty.ProgressSink;
import eluvia.design.uncertainty.SamplingMethod;
import eluvia.design.uncertainty.SimulationSettings;
import eluvia.report.chart.Histogram;
import eluvia.report.chart.Marker;
import eluvia.report.chart.Tornado;
import eluvia.report.document.Document;
import eluvia.report.document.Figure;
import eluvia.site.model.Project;

/** Uncertainty results, when given, appear as percentiles, histograms and tornado charts of the same numbers. */
final class UncertaintyContentTest {

    @Test
    void histogramsAndTornadosShowTheMonteCarloNumbers() {
        // the invented example reduced to one uncertain input and a few runs, to keep the test fast
        Project p = EcoreUtil.copy(ExampleRun.PROJECT);
        p.getUncertainty().getRankCorrelations().clear();
        while (p.getUncertainty().getInputs().size() > 1) {
            p.getUncertainty().getInputs().remove(1);
        }
        DesignRun run = DesignPipeline.run(p);
        UncertaintyResults u = UncertaintyAnalysis.run(p, DesignSettings.defaults(),
                new SimulationSettings(4, SamplingMethod.LATIN_HYPERCUBE, 11, 1, 0), ProgressSink.NONE);
        Document d = DesignReport.build(p, run, null, "test", LocalDate.ofInstant(run.startedAt(), ZoneOffset.UTC),
                PackageOptions.defaults().withUncertainty(u), VerificationAppendix.runStandard());
        List<Figure> histograms = d.figures().stream().filter(f -> f.chart() instanceof Histogram).toList();
        List<Figure> tornados = d.figures().stream().filter(f -> f.chart() instanceof Tornado).toList();
        assertFalse(histograms.isEmpty());
        assertFalse(tornados.isEmpty());
        for (Figure f : histograms) {
            Histogram h = (Histogram) f.chart();
            UncertaintyHeadline x = u.headlines().stream().filter(y -> f.caption().contains(y.quantity() + ", "
                    + y.subjectName())).findFirst().orElseThrow();
            // the histogram holds exactly the completed runs' values of its headline
            assertEquals(u.simulation().runs().completedOutputValues(x.outputName()).length, h.samples().length);
            List<Double> marks = h.markers().stream().map(Marker::value).toList();
            assertEquals(List.of(x.statistics().p10(), x.statistics().p50(), x.statistics().p90()), marks);
        }
        for (Figure f : tornados) {
            Tornado t = (Tornado) f.chart();
            assertTrue(u.headlines().stream().anyMatch(y -> y.tornado() != null
                    && y.tornado().baseOutputValue() == t.baseResult()), f.id());
        }
        assertTrue(d.sections().stream().anyMatch(s -> s.heading().equals("Uncertainty")));
    }
}
