package eluvia.transport;

/**
 * One measured point of a column test.
 *
 * @param poreVolumes pore volumes passed through the column at the sample, T = q t / (theta L), dimensionless, &ge; 0
 * @param relativeConcentration effluent concentration over the feed (breakthrough) or the initial
 *        (elution) concentration, dimensionless; measured values may stray a little outside 0..1
 *        with analytical noise, so -0.5 to 1.5 is accepted
 */
public record ColumnObservation(double poreVolumes, double relativeConcentration) {
    public ColumnObservation {
        TransportInputException.requireNonNegative("pore volumes of a column sample (-)", poreVolumes);
        if (!(relativeConcentration >= -0.5 && relativeConcentration <= 1.5)) {
            throw new TransportInputException("relative concentration C/C0 of a column sample (-)",
                    relativeConcentration, "-0.5 to 1.5 (a fraction of the feed or initial concentration, not mg/L)");
        }
    }
}
