package eluvia.zone;

/**
 * A proposed treatment (or excavation) zone: a footprint polygon extruded over a depth interval.
 * It contains every block above the cleanup level it was drawn from, and is larger than their
 * total volume wherever the footprint is not full or the blocks do not fill the whole depth
 * interval.
 *
 * @param footprint         the plan footprint
 * @param topDepthMetres    depth of the top of the zone below ground, m
 * @param bottomDepthMetres depth of the bottom of the zone below ground, m
 * @param basis             what the zone was drawn from, for results
 */
public record TreatmentZone(FootprintPolygon footprint, double topDepthMetres, double bottomDepthMetres,
        String basis) {

    /** The thickness of the zone, m. */
    public double thicknessMetres() {
        return bottomDepthMetres - topDepthMetres;
    }

    /** The in-place (bank) volume of the zone, footprint area times thickness, m3. */
    public double volumeCubicMetres() {
        return footprint.areaSquareMetres() * thicknessMetres();
    }
}
