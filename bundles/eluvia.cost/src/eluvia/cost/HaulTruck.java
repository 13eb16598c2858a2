package eluvia.cost;

import eluvia.cost.internal.Checks;
import eluvia.cost.internal.Counts;

/**
 * A haul truck: heaped (loose) capacity and legal payload.
 *
 * <p>The number of loads for a quantity is the larger of loose volume / heaped capacity and
 * mass / legal payload, rounded up to a whole load (volume-limited for light soil, mass-limited for
 * dense soil).
 *
 * @param heapedCapacityCubicMetres loose volume one load holds, m3, in (0, 100]
 * @param legalPayloadTonnes        mass one load may carry on the road, t, in (0, 100]
 */
public record HaulTruck(double heapedCapacityCubicMetres, double legalPayloadTonnes) {

    /** Checks the fields. */
    public HaulTruck {
        Checks.openClosed("heapedCapacityCubicMetres", heapedCapacityCubicMetres, 0.0, 100.0,
                "enter the heaped body capacity in cubic metres (about 10 to 20 for a road truck)");
        Checks.openClosed("legalPayloadTonnes", legalPayloadTonnes, 0.0, 100.0,
                "enter tonnes, not kg (about 15 to 30 t for a road truck)");
    }

    /** Loads needed for this loose volume (m3) and mass (t): the larger count, rounded up. */
    public long loadsFor(double looseCubicMetres, double massTonnes) {
        Checks.nonNegative("loose volume to haul (m3)", looseCubicMetres);
        Checks.nonNegative("mass to haul (t)", massTonnes);
        return Math.max(Counts.roundUp(looseCubicMetres / heapedCapacityCubicMetres),
                Counts.roundUp(massTonnes / legalPayloadTonnes));
    }
}
