package eluvia.design.uncertainty;

/**
 * How a Monte Carlo simulation runs.
 *
 * <p>The sample matrix (every input value of every run) is drawn in advance from one
 * Well19937c generator (Commons Math 3.6.1) started from {@code seed}, so the same seed gives
 * identical results whatever the number of threads.
 *
 * @param runCount          the number of Monte Carlo runs, {@value #MIN_RUNS} to {@value #MAX_RUNS}
 * @param samplingMethod    plain Monte Carlo or Latin hypercube
 * @param seed              the seed of the random generator
 * @param threadCount       the number of worker threads, 1 to {@value #MAX_THREADS}
 * @param histogramBinCount the number of histogram bins per output, 1 to {@value #MAX_BINS}, or 0
 *                          for Sturges' rule, ceil(log2 n) + 1 bins for n runs (Sturges 1926,
 *                          J. Am. Stat. Assoc. 21:65)
 */
public record SimulationSettings(int runCount, SamplingMethod samplingMethod, long seed, int threadCount,
        int histogramBinCount) {

    /** The default number of runs. */
    public static final int DEFAULT_RUNS = 2_000;
    /** The default seed. */
    public static final long DEFAULT_SEED = 20_261_201L;
    /** The fewest runs a simulation may have. */
    public static final int MIN_RUNS = 2;
    /** The most runs a simulation may have (the sample matrix is held in memory). */
    public static final int MAX_RUNS = 10_000_000;
    /** The most worker threads. */
    public static final int MAX_THREADS = 256;
    /** The most histogram bins. */
    public static final int MAX_BINS = 10_000;

    /** Checks every setting. */
    public SimulationSettings {
        if (runCount < MIN_RUNS || runCount > MAX_RUNS) {
            throw new UncertaintyInputException("number of Monte Carlo runs", runCount,
                    MIN_RUNS + " to " + MAX_RUNS + " (1,000 to 10,000 is usual)");
        }
        UncertaintyInputException.requireNonNull("sampling method", samplingMethod);
        if (threadCount < 1 || threadCount > MAX_THREADS) {
            throw new UncertaintyInputException("number of worker threads", threadCount,
                    "1 to " + MAX_THREADS + " (usually the number of processor cores)");
        }
        if (histogramBinCount < 0 || histogramBinCount > MAX_BINS) {
            throw new UncertaintyInputException("number of histogram bins", histogramBinCount,
                    "0 (Sturges' rule) or 1 to " + MAX_BINS);
        }
    }

    /**
     * {@value #DEFAULT_RUNS} Latin hypercube runs, seed {@value #DEFAULT_SEED}, one thread per
     * available processor, histogram bins by Sturges' rule.
     */
    public static SimulationSettings defaults() {
        return new SimulationSettings(DEFAULT_RUNS, SamplingMethod.LATIN_HYPERCUBE, DEFAULT_SEED,
                Math.min(MAX_THREADS, Runtime.getRuntime().availableProcessors()), 0);
    }

    /** These settings with another number of runs. */
    public SimulationSettings withRunCount(int runs) {
        return new SimulationSettings(runs, samplingMethod, seed, threadCount, histogramBinCount);
    }

    /** These settings with another sampling method. */
    public SimulationSettings withSamplingMethod(SamplingMethod method) {
        return new SimulationSettings(runCount, method, seed, threadCount, histogramBinCount);
    }

    /** These settings with another seed. */
    public SimulationSettings withSeed(long newSeed) {
        return new SimulationSettings(runCount, samplingMethod, newSeed, threadCount, histogramBinCount);
    }

    /** These settings with another number of worker threads. */
    public SimulationSettings withThreadCount(int threads) {
        return new SimulationSettings(runCount, samplingMethod, seed, threads, histogramBinCount);
    }

    /** These settings with another number of histogram bins (0 for Sturges' rule). */
    public SimulationSettings withHistogramBinCount(int bins) {
        return new SimulationSettings(runCount, samplingMethod, seed, threadCount, bins);
    }

    /** The number of histogram bins for {@code sampleCount} values: the setting, or Sturges' rule. */
    public int binsFor(int sampleCount) {
        if (histogramBinCount > 0) {
            return histogramBinCount;
        }
        if (sampleCount < 1) {
            return 1;
        }
        int ceilLog2 = 32 - Integer.numberOfLeadingZeros(sampleCount - 1);
        return ceilLog2 + 1;
    }
}
