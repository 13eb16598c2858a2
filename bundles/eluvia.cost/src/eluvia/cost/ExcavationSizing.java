package eluvia.cost;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

import eluvia.cost.internal.Checks;

/**
 * Excavation take-off: pit volume, contaminated / overburden split, loose volumes, masses, loads,
 * backfill and import, with the protective-system cautions.
 *
 * <p>Method. The pit bottom is the zone outline offset by the overdig, at depth
 * H = zone bottom + overdig; the bank volume of a pit of depth h on that bottom is the exact
 * prismoidal volume of {@link PitFootprint#pitVolumeCubicMetres} (for a rectangle
 * V = h [L W + m h (L + W) + (4/3) m^2 h^2]). Volumes then follow the usual earthwork relations:
 * loose = bank (1 + swell); compacted = bank (1 - shrinkage); mass = bank x bank density;
 * loads = larger of loose / heaped capacity and mass / legal payload, rounded up.
 *
 * <p>Assumptions (also returned in {@link ExcavationQuantities#assumptions()}):
 * <ol>
 * <li>The clean/contaminated split is the horizontal plane at the zone top: everything dug below it
 * (the zone, the overdig and the wedges between the zone and the sloped sides) is handled as
 * contaminated, because it is dug and loaded together; everything above it is clean overburden. To
 * keep a margin above the zone, pass a shallower zone top.</li>
 * <li>Backfill brings the pit back to grade at the in-place density: compacted backfill = pit bank
 * volume.</li>
 * <li>With {@code reuseOverburdenAsBackfill}, all clean overburden is stockpiled and placed back; it
 * fills overburden bank x (1 - shrinkage) compacted. The rest is imported:
 * import compacted = pit bank - reused compacted; import bank (at the borrow source) =
 * import compacted / (1 - borrow shrinkage); import loose = import bank (1 + borrow swell).
 * Without reuse, the overburden is hauled off site and the whole backfill is imported.</li>
 * <li>One set of factors for all excavated soil (overburden and contaminated).</li>
 * </ol>
 *
 * <p>Cautions: deeper than 1.52 m (5 ft), US OSHA 29 CFR 1926 Subpart P requires a protective system
 * unless the excavation is in stable rock; Table B-1 slopes apply under 20 ft (6.1 m), deeper pits
 * need a design by a registered professional engineer; a side slope steeper than the Table B-1
 * maximum for the soil class is flagged. Each caution defers to the rules where the site is.
 */
public final class ExcavationSizing {
    /** 5 ft = 1.524 m, taken as 1.52 m so that the caution errs on the safe side. */
    public static final double PROTECTIVE_SYSTEM_DEPTH_METRES = 1.52;
    /** 20 ft = 6.096 m, taken as 6.09 m so that the caution errs on the safe side. */
    public static final double TABLE_SLOPE_DEPTH_LIMIT_METRES = 6.09;

    private ExcavationSizing() {
    }

    /** The take-off of {@code plan}. */
    public static ExcavationQuantities size(ExcavationPlan plan) {
        Checks.notNull("excavation plan", plan);
        ExcavationDesign d = plan.design();
        EarthworkFactors soil = plan.excavatedSoil();
        EarthworkFactors borrow = plan.borrowSoil();
        HaulTruck truck = plan.truck();
        double m = d.sideSlopeHorizontalPerVertical();
        double depth = d.pitDepthMetres();
        double top = d.zoneTopDepthMetres();

        PitFootprint bottom = d.zoneFootprint().offset(d.overdigMetres());
        PitFootprint pitTop = bottom.offset(m * depth);
        double zone = d.zoneFootprint().areaSquareMetres() * (d.zoneBottomDepthMetres() - top);
        double pitBank = bottom.pitVolumeCubicMetres(depth, m);
        double contaminatedBank = bottom.pitVolumeCubicMetres(depth - top, m);
        // The overburden as a pit of its own (bottom = pit outline at the zone top): no cancellation
        // when it is thin, and a check on pitBank = contaminated + overburden for the tests.
        double overburdenBank = top == 0 ? 0.0 : bottom.offset(m * (depth - top)).pitVolumeCubicMetres(top, m);

        double contaminatedLoose = soil.looseCubicMetres(contaminatedBank);
        double contaminatedMass = soil.massTonnes(contaminatedBank);
        long contaminatedLoads = truck.loadsFor(contaminatedLoose, contaminatedMass);
        double overburdenLoose = soil.looseCubicMetres(overburdenBank);
        double overburdenMass = soil.massTonnes(overburdenBank);
        boolean reuse = plan.reuseOverburdenAsBackfill();
        long overburdenLoads = reuse ? 0 : truck.loadsFor(overburdenLoose, overburdenMass);

        double backfill = pitBank;
        double reused = reuse ? soil.compactedCubicMetres(overburdenBank) : 0.0;
        double importCompacted = backfill - reused;
        double importBank = borrow.bankForCompactedCubicMetres(importCompacted);
        double importLoose = borrow.looseCubicMetres(importBank);
        double importMass = borrow.massTonnes(importBank);
        long importLoads = truck.loadsFor(importLoose, importMass);

        List<String> assumptions = new ArrayList<>();
        assumptions.add("Soil dug below the zone top (zone, overdig and side wedges) is handled as contaminated; "
                + "soil above it is clean overburden.");
        assumptions.add("The pit is backfilled to grade at the in-place density: compacted backfill = pit bank volume.");
        assumptions.add(reuse
                ? "All clean overburden is stockpiled on site and reused as backfill; the rest is imported borrow."
                : "Clean overburden is hauled off site; all backfill is imported borrow.");
        assumptions.add("One set of swell, shrinkage and density factors applies to all excavated soil.");

        return new ExcavationQuantities(plan, depth, bottom, pitTop, zone, pitBank, contaminatedBank,
                contaminatedLoose, contaminatedMass, contaminatedLoads, overburdenBank, overburdenLoose,
                overburdenMass, overburdenLoads, backfill, reused, importCompacted, importBank, importLoose,
                importMass, importLoads, cautions(d), assumptions);
    }

    /** The cautions for this pit geometry. */
    public static List<Caution> cautions(ExcavationDesign design) {
        Checks.notNull("excavation design", design);
        List<Caution> list = new ArrayList<>();
        double depth = design.pitDepthMetres();
        SoilSlopeClass soil = design.soilClass();
        if (depth > PROTECTIVE_SYSTEM_DEPTH_METRES) {
            list.add(new Caution(Caution.PROTECTIVE_SYSTEM, String.format(Locale.ROOT,
                    "The excavation is %.2f m deep, more than 1.52 m (5 ft). Under US OSHA 29 CFR 1926 Subpart P a "
                            + "protective system (sloping, benching, shoring or shielding) is required unless the "
                            + "excavation is entirely in stable rock%s; most jurisdictions have similar rules. A competent "
                            + "person must classify the soil and inspect the excavation. Follow the rules where the "
                            + "site is.",
                    depth, soil == SoilSlopeClass.STABLE_ROCK ? " (stable rock is assumed here: have it confirmed)" : "")));
        }
        if (depth > TABLE_SLOPE_DEPTH_LIMIT_METRES) {
            list.add(new Caution(Caution.ENGINEERED_PROTECTIVE_SYSTEM, String.format(Locale.ROOT,
                    "The excavation is %.2f m deep, 20 ft (6.1 m) or more. The maximum slopes of "
                            + "29 CFR 1926 Subpart P App. B Table B-1 apply only to shallower excavations; the sloping "
                            + "or other protective system must be designed by a registered professional engineer. "
                            + "Follow the rules where the site is.", depth)));
        }
        double published = soil.publishedMaximumSlopeHorizontalPerVertical();
        if (design.sideSlopeHorizontalPerVertical() < published) {
            list.add(new Caution(Caution.SLOPE_STEEPER_THAN_TABLE, String.format(Locale.ROOT,
                    "The side slope %.3f H:1V is steeper than the maximum %.3f H:1V that %s allows for %s. A "
                            + "steeper slope needs an engineered design or a support system under those rules. Follow "
                            + "the rules where the site is.",
                    design.sideSlopeHorizontalPerVertical(), published, SoilSlopeClass.SOURCE, soil.label())));
        }
        return list;
    }
}
