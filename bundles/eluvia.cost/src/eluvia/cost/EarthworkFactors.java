package eluvia.cost;

import eluvia.cost.internal.Checks;

/**
 * Volume-change factors and density of one soil, for converting between bank, loose and compacted
 * volumes and mass.
 *
 * <p>loose = bank (1 + swell); compacted = bank (1 - shrinkage); mass = bank volume x bank bulk
 * density. Typical swell (Peurifoy, Construction Planning, Equipment and Methods, Table 4-1, as
 * quoted): clean sand and gravel 5-15 %, topsoil 10-25 %, loam 10-35 %, common earth 20-45 %, clay
 * 30-60 %, rock 50-80 %.
 *
 * @param swellFraction                  swell, fraction of bank volume (dimensionless), in [0, 1]
 * @param shrinkageFraction              shrinkage from bank to compacted, fraction of bank volume
 *                                       (dimensionless), in [0, 1)
 * @param bankDensityTonnesPerCubicMetre in-place (bank) bulk density including pore water, t/m3,
 *                                       in (0, 3.5]
 * @param source                         where the factors come from (test, table, assumption)
 */
public record EarthworkFactors(double swellFraction, double shrinkageFraction, double bankDensityTonnesPerCubicMetre,
        String source) {

    /** Checks the fields. */
    public EarthworkFactors {
        Checks.closed("swellFraction", swellFraction, 0.0, 1.0,
                "enter the swell as a fraction of the bank volume (0.25 for 25 %)");
        Checks.closedOpen("shrinkageFraction", shrinkageFraction, 0.0, 1.0,
                "enter the shrinkage as a fraction of the bank volume (0.10 for 10 %)");
        Checks.openClosed("bankDensityTonnesPerCubicMetre", bankDensityTonnesPerCubicMetre, 0.0, 3.5,
                "enter tonnes per cubic metre (about 1.6 to 2.2 for soil), not kg/m3");
        Checks.text("earthwork factors source", source);
    }

    /** Loose volume, m3, of {@code bankCubicMetres} of bank volume: bank (1 + swell). */
    public double looseCubicMetres(double bankCubicMetres) {
        return bankCubicMetres * (1.0 + swellFraction);
    }

    /** Compacted volume, m3, of {@code bankCubicMetres} of bank volume: bank (1 - shrinkage). */
    public double compactedCubicMetres(double bankCubicMetres) {
        return bankCubicMetres * (1.0 - shrinkageFraction);
    }

    /** Bank volume, m3, that compacts to {@code compactedCubicMetres}: compacted / (1 - shrinkage). */
    public double bankForCompactedCubicMetres(double compactedCubicMetres) {
        return compactedCubicMetres / (1.0 - shrinkageFraction);
    }

    /** Mass, t, of {@code bankCubicMetres}: bank volume x bank density. */
    public double massTonnes(double bankCubicMetres) {
        return bankCubicMetres * bankDensityTonnesPerCubicMetre;
    }
}
