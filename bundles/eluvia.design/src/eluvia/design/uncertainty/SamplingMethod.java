package eluvia.design.uncertainty;

/** How the engine draws the values of the uncertain inputs. */
public enum SamplingMethod {
    /** Independent uniform numbers through each input's inverse cumulative distribution. */
    PLAIN_MONTE_CARLO,
    /**
     * Latin hypercube sampling (the default): each input's probability range is cut into as many
     * equal strata as there are runs and every stratum is sampled exactly once, in a random order
     * per input (McKay, Beckman and Conover 1979, Technometrics 21:239). For the same number of
     * runs it estimates means and percentiles with less sampling error than plain Monte Carlo.
     */
    LATIN_HYPERCUBE
}
