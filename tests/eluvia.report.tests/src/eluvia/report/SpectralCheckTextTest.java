package eluvia.report;

import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayInputStream;

import org.junit.jupiter.api.Test;

import eluvia.design.DesignPipeline;
import eluvia.design.DesignRun;
import eluvia.design.FlushingDesignResult;
import eluvia.site.files.ProjectFiles;
import eluvia.site.model.Project;
import eluvia.site.model.SolutionMethod;

/** The package states the independent check of every numerical run, or why there is none. */
final class SpectralCheckTextTest {

    @Test
    void numericalRunsOfTheExampleAreCheckedOrSayWhyNot() throws Exception {
        // the invented example with its first design switched to the numerical layered profile
        Project p = ProjectFiles.load(new ByteArrayInputStream(ExampleRun.BYTES), "example");
        p.getFlushingDesigns().get(0).setSolutionMethod(SolutionMethod.NUMERICAL);
        DesignRun run = DesignPipeline.run(p);
        FlushingDesignResult numerical = run.flushing().get(0);
        String text = DesignReport.spectralChecks(numerical);
        // benzene is at local equilibrium: checked; trichloroethylene is two-region: not computed, with the reason
        assertTrue(text.contains("Benzene: spectral elements of degree 8"), text);
        assertTrue(text.contains("(numerical run "), text);
        assertTrue(text.contains("Trichloroethylene: not computed") && text.contains("two-region"), text);
        // a design that does not run the numerical solution has nothing to state
        assertNull(DesignReport.spectralChecks(ExampleRun.RUN.flushing().get(0)));
    }
}
