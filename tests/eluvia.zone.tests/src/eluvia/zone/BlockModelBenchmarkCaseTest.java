package eluvia.zone;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/** The benchmark case is the size the benchmark promises and is reproducible; it is not timed here. */
final class BlockModelBenchmarkCaseTest {

    @Test
    void millionBlocksAndThreeHundredSamples_reproducibleBySeed() {
        BlockModelBenchmarkCase first = BlockModelBenchmarkCase.create();
        assertEquals(1_000_000, first.blockModel().blockCount()); // the size the benchmark promises: 10^6 blocks (100 x 100 x 100, hand)
        assertEquals(300, first.samples().size()); // and 300 samples
        assertEquals(300, first.sampleSet().size()); // 30 borings x 10 distinct intervals: nothing merged
        assertEquals(first.samples(), BlockModelBenchmarkCase.create(BlockModelBenchmarkCase.DEFAULT_SEED).samples());
        assertTrue(first.sampleSet().nonDetectCount() > 0, "the invented scenario has non-detects at the edges");
        for (SoilSample s : first.samples()) {
            assertTrue(s.eastingMetres() >= 0 && s.eastingMetres() <= 100, "inside the 100 m model");
            assertTrue(s.bottomDepthMetres() <= 10.0, "within the 10 m model depth");
        }
    }
}
