package eluvia.design;

import java.util.List;

import eluvia.cost.ExcavationQuantities;

/**
 * The excavation take-off of one excavation design of the project (eluvia.cost ExcavationSizing):
 * pit volumes by the prismoidal formula, contaminated and overburden split, loose volumes, masses,
 * loads, backfill and import, with the protective-system cautions.
 *
 * @param designName the excavation design
 * @param zoneName the zone dug out
 * @param footprintBasis how the zone outline was obtained (polygon, its convex hull, or a square of the zone's area)
 * @param slopeBasis where the side slope comes from (the design, or the published table for its soil type)
 * @param soilBasis how swell, shrinkage and bank density were taken from the layers
 * @param quantities the take-off (volumes m3, masses t, loads)
 * @param notes further bases and warnings
 */
public record ExcavationResult(String designName, String zoneName, String footprintBasis, String slopeBasis,
        String soilBasis, ExcavationQuantities quantities, List<String> notes) {

    /** Copies the list. */
    public ExcavationResult {
        notes = List.copyOf(notes);
    }
}
