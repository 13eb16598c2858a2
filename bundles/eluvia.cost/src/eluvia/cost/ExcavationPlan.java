package eluvia.cost;

import eluvia.cost.internal.Checks;

/**
 * Everything the excavation take-off needs: geometry, soil factors, borrow factors, truck, and
 * whether the clean overburden goes back in the pit.
 *
 * <p>Assumptions (see {@link ExcavationSizing}): the clean overburden is the part of the pit above
 * the zone top; when {@code reuseOverburdenAsBackfill} is true it is stockpiled on site and all of it
 * goes back in as backfill, otherwise it is hauled off site like the contaminated soil (as clean
 * soil). The pit is backfilled to grade at the in-place density.
 *
 * @param design                    pit geometry
 * @param excavatedSoil             factors of the soil dug (overburden and contaminated alike)
 * @param borrowSoil                factors of the imported backfill at its source
 * @param truck                     truck for all hauls
 * @param reuseOverburdenAsBackfill whether the clean overburden is reused as backfill
 */
public record ExcavationPlan(ExcavationDesign design, EarthworkFactors excavatedSoil, EarthworkFactors borrowSoil,
        HaulTruck truck, boolean reuseOverburdenAsBackfill) {

    /** Checks the fields. */
    public ExcavationPlan {
        Checks.notNull("excavation design", design);
        Checks.notNull("excavated soil factors", excavatedSoil);
        Checks.notNull("borrow soil factors", borrowSoil);
        Checks.notNull("haul truck", truck);
    }
}
