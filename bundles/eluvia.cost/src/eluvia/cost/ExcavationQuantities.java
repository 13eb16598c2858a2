package eluvia.cost;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/**
 * The excavation take-off of one {@link ExcavationPlan}, made by {@link ExcavationSizing#size}.
 *
 * <p>Bank volumes are in place, loose volumes as hauled or stockpiled, compacted volumes as placed
 * in the pit; all in m3, masses in t, loads in whole truckloads. {@link #toQuantitySet()} turns the
 * take-off into named {@link Quantity} values with their sources, for an {@link EstimateRecipe}.
 *
 * @param plan                                   the inputs
 * @param pitDepthMetres                         depth of the pit bottom, m (zone bottom + overdig)
 * @param pitBottom                              pit bottom outline (zone outline offset by the overdig)
 * @param pitTop                                 pit outline at the ground surface
 * @param zoneVolumeCubicMetres                  the contaminated zone itself in place (prism), m3
 * @param pitBankVolumeCubicMetres               all soil dug, bank m3 (prismoidal formula)
 * @param contaminatedBankVolumeCubicMetres      soil dug below the zone top, bank m3
 * @param contaminatedLooseVolumeCubicMetres     the same loose, m3
 * @param contaminatedMassTonnes                 the same, t
 * @param contaminatedLoads                      loads to haul it off site
 * @param overburdenBankVolumeCubicMetres        clean soil dug above the zone top, bank m3
 * @param overburdenLooseVolumeCubicMetres       the same loose (stockpile or haul), m3
 * @param overburdenMassTonnes                   the same, t
 * @param overburdenOffSiteLoads                 loads to haul it off site (0 when reused)
 * @param backfillCompactedVolumeCubicMetres     compacted fill to bring the pit back to grade, m3
 * @param reusedOverburdenCompactedVolumeCubicMetres compacted volume the reused overburden fills, m3
 * @param importCompactedVolumeCubicMetres       compacted volume of imported (borrow) fill, m3
 * @param importBankVolumeCubicMetres            borrow to dig at its source, bank m3
 * @param importLooseVolumeCubicMetres           borrow as hauled, loose m3
 * @param importMassTonnes                       borrow mass, t
 * @param importLoads                            loads to haul the borrow in
 * @param cautions                               cautions to show with the result
 * @param assumptions                            the assumptions behind the split and the backfill
 */
public record ExcavationQuantities(ExcavationPlan plan, double pitDepthMetres, PitFootprint pitBottom,
        PitFootprint pitTop, double zoneVolumeCubicMetres, double pitBankVolumeCubicMetres,
        double contaminatedBankVolumeCubicMetres, double contaminatedLooseVolumeCubicMetres,
        double contaminatedMassTonnes, long contaminatedLoads, double overburdenBankVolumeCubicMetres,
        double overburdenLooseVolumeCubicMetres, double overburdenMassTonnes, long overburdenOffSiteLoads,
        double backfillCompactedVolumeCubicMetres, double reusedOverburdenCompactedVolumeCubicMetres,
        double importCompactedVolumeCubicMetres, double importBankVolumeCubicMetres,
        double importLooseVolumeCubicMetres, double importMassTonnes, long importLoads, List<Caution> cautions,
        List<String> assumptions) {

    /** Quantity name: plan area of the pit at the surface, m2. */
    public static final String PIT_TOP_AREA = "pit top area";
    /** Quantity name: contaminated zone in place, m3. */
    public static final String ZONE_VOLUME = "zone volume in place";
    /** Quantity name: all soil dug, bank m3. */
    public static final String PIT_BANK_VOLUME = "pit bank volume";
    /** Quantity name: contaminated soil dug, bank m3. */
    public static final String CONTAMINATED_BANK_VOLUME = "contaminated bank volume";
    /** Quantity name: contaminated soil, loose m3. */
    public static final String CONTAMINATED_LOOSE_VOLUME = "contaminated loose volume";
    /** Quantity name: contaminated soil, t. */
    public static final String CONTAMINATED_MASS = "contaminated mass";
    /** Quantity name: loads of contaminated soil. */
    public static final String CONTAMINATED_LOADS = "contaminated loads";
    /** Quantity name: clean overburden dug, bank m3. */
    public static final String OVERBURDEN_BANK_VOLUME = "overburden bank volume";
    /** Quantity name: clean overburden, loose m3. */
    public static final String OVERBURDEN_LOOSE_VOLUME = "overburden loose volume";
    /** Quantity name: clean overburden, t. */
    public static final String OVERBURDEN_MASS = "overburden mass";
    /** Quantity name: loads of clean overburden hauled off site. */
    public static final String OVERBURDEN_OFF_SITE_LOADS = "overburden off-site loads";
    /** Quantity name: compacted backfill, m3. */
    public static final String BACKFILL_COMPACTED_VOLUME = "backfill compacted volume";
    /** Quantity name: compacted volume filled with reused overburden, m3. */
    public static final String REUSED_OVERBURDEN_COMPACTED_VOLUME = "reused overburden compacted volume";
    /** Quantity name: compacted imported fill, m3. */
    public static final String IMPORT_COMPACTED_VOLUME = "import compacted volume";
    /** Quantity name: imported fill at its source, bank m3. */
    public static final String IMPORT_BANK_VOLUME = "import bank volume";
    /** Quantity name: imported fill as hauled, loose m3. */
    public static final String IMPORT_LOOSE_VOLUME = "import loose volume";
    /** Quantity name: imported fill, t. */
    public static final String IMPORT_MASS = "import mass";
    /** Quantity name: loads of imported fill. */
    public static final String IMPORT_LOADS = "import loads";

    /** Makes the lists unmodifiable. */
    public ExcavationQuantities {
        cautions = List.copyOf(cautions);
        assumptions = List.copyOf(assumptions);
    }

    /** The take-off as named quantities, each with the method and inputs behind it. */
    public QuantitySet toQuantitySet() {
        ExcavationDesign d = plan.design();
        EarthworkFactors s = plan.excavatedSoil();
        EarthworkFactors b = plan.borrowSoil();
        HaulTruck t = plan.truck();
        String pit = String.format(Locale.ROOT,
                "prismoidal pit formula, bottom %s, %.3f m deep, side slope %.3f H:1V",
                pitBottom.description(), pitDepthMetres, d.sideSlopeHorizontalPerVertical());
        String split = String.format(Locale.ROOT, "split at the zone top, %.3f m deep", d.zoneTopDepthMetres());
        String swell = String.format(Locale.ROOT, "loose = bank x (1 + swell %.4f), %s", s.swellFraction(), s.source());
        String density = String.format(Locale.ROOT, "mass = bank x %.4f t/m3, %s", s.bankDensityTonnesPerCubicMetre(),
                s.source());
        String loads = String.format(Locale.ROOT,
                "larger of loose / %.3f m3 heaped capacity and mass / %.3f t legal payload, rounded up",
                t.heapedCapacityCubicMetres(), t.legalPayloadTonnes());
        List<Quantity> q = new ArrayList<>();
        q.add(new Quantity(PIT_TOP_AREA, pitTop.areaSquareMetres(), CostUnit.SQUARE_METRE,
                "pit outline at the surface: " + pitTop.description()));
        q.add(new Quantity(ZONE_VOLUME, zoneVolumeCubicMetres, CostUnit.CUBIC_METRE,
                String.format(Locale.ROOT, "zone area x thickness, %s from %.3f m to %.3f m deep",
                        d.zoneFootprint().description(), d.zoneTopDepthMetres(), d.zoneBottomDepthMetres())));
        q.add(new Quantity(PIT_BANK_VOLUME, pitBankVolumeCubicMetres, CostUnit.CUBIC_METRE, "bank volume, " + pit));
        q.add(new Quantity(CONTAMINATED_BANK_VOLUME, contaminatedBankVolumeCubicMetres, CostUnit.CUBIC_METRE,
                "bank volume below the zone top, " + pit + ", " + split));
        q.add(new Quantity(CONTAMINATED_LOOSE_VOLUME, contaminatedLooseVolumeCubicMetres, CostUnit.CUBIC_METRE,
                swell));
        q.add(new Quantity(CONTAMINATED_MASS, contaminatedMassTonnes, CostUnit.TONNE, density));
        q.add(new Quantity(CONTAMINATED_LOADS, contaminatedLoads, CostUnit.LOAD, loads));
        q.add(new Quantity(OVERBURDEN_BANK_VOLUME, overburdenBankVolumeCubicMetres, CostUnit.CUBIC_METRE,
                "bank volume above the zone top, " + pit + ", " + split));
        q.add(new Quantity(OVERBURDEN_LOOSE_VOLUME, overburdenLooseVolumeCubicMetres, CostUnit.CUBIC_METRE, swell));
        q.add(new Quantity(OVERBURDEN_MASS, overburdenMassTonnes, CostUnit.TONNE, density));
        q.add(new Quantity(OVERBURDEN_OFF_SITE_LOADS, overburdenOffSiteLoads, CostUnit.LOAD,
                plan.reuseOverburdenAsBackfill() ? "0: overburden stockpiled on site and reused as backfill" : loads));
        q.add(new Quantity(BACKFILL_COMPACTED_VOLUME, backfillCompactedVolumeCubicMetres, CostUnit.CUBIC_METRE,
                "compacted fill equal to the pit bank volume (back to grade at in-place density)"));
        q.add(new Quantity(REUSED_OVERBURDEN_COMPACTED_VOLUME, reusedOverburdenCompactedVolumeCubicMetres,
                CostUnit.CUBIC_METRE, plan.reuseOverburdenAsBackfill()
                        ? String.format(Locale.ROOT, "overburden bank x (1 - shrinkage %.4f)", s.shrinkageFraction())
                        : "0: overburden not reused"));
        q.add(new Quantity(IMPORT_COMPACTED_VOLUME, importCompactedVolumeCubicMetres, CostUnit.CUBIC_METRE,
                "backfill compacted volume - reused overburden compacted volume"));
        q.add(new Quantity(IMPORT_BANK_VOLUME, importBankVolumeCubicMetres, CostUnit.CUBIC_METRE,
                String.format(Locale.ROOT, "import compacted / (1 - borrow shrinkage %.4f), %s", b.shrinkageFraction(),
                        b.source())));
        q.add(new Quantity(IMPORT_LOOSE_VOLUME, importLooseVolumeCubicMetres, CostUnit.CUBIC_METRE,
                String.format(Locale.ROOT, "import bank x (1 + borrow swell %.4f), %s", b.swellFraction(), b.source())));
        q.add(new Quantity(IMPORT_MASS, importMassTonnes, CostUnit.TONNE,
                String.format(Locale.ROOT, "import bank x %.4f t/m3, %s", b.bankDensityTonnesPerCubicMetre(),
                        b.source())));
        q.add(new Quantity(IMPORT_LOADS, importLoads, CostUnit.LOAD, loads));
        return QuantitySet.of(q);
    }
}
