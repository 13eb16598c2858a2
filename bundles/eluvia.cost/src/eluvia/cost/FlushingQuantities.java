package eluvia.cost;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

import eluvia.cost.internal.Checks;
import eluvia.cost.internal.Counts;

/**
 * The flushing take-off: water volumes, duration, samples and amendment, made by {@link #of}.
 *
 * <p>Definitions (volumes in m3, durations in days):
 * <ul>
 * <li>applied water = pore volumes x one pore volume;</li>
 * <li>operating days = applied / (Darcy flux x area): the applied rate q A runs only on operating
 * days; calendar days = operating days x 7 / operating days per week;</li>
 * <li>captured water = applied x capture efficiency: the flushing water the extraction system gets
 * back; escaping water = applied x (1 - capture efficiency): flushing water, with what it
 * mobilised, that leaves the treated zone uncaptured. It is never costed as a saving: it raises a
 * caution;</li>
 * <li>treated water = applied x extraction-to-injection ratio: what the extraction wells deliver to
 * the treatment plant (the captured flushing water plus the ambient groundwater drawn in with it).
 * <b>The treatment cost uses the treated water</b>, so a poorer capture never makes treatment
 * cheaper;</li>
 * <li>samples from the {@link MonitoringPlan}; amendment mass = dose x applied water;</li>
 * <li>operating years = calendar days / 365.25 rounded up (at least 1), the whole years over which
 * annual O&amp;M is counted; the per-year quantities spread the totals evenly over them.</li>
 * </ul>
 *
 * @param input                     the inputs
 * @param appliedWaterCubicMetres   water applied, m3
 * @param capturedWaterCubicMetres  flushing water captured, m3
 * @param escapingWaterCubicMetres  flushing water escaping uncaptured, m3
 * @param treatedWaterCubicMetres   water extracted and treated, m3 (the treatment cost quantity)
 * @param operatingDays             days of operation
 * @param calendarDays              calendar days from start to end of flushing
 * @param operatingYears            whole years of operation for annual O&amp;M, at least 1
 * @param monitoringSamples         samples over the run
 * @param amendmentMassKilograms    amendment used, kg
 * @param cautions                  cautions to show with the result
 */
public record FlushingQuantities(FlushingInput input, double appliedWaterCubicMetres, double capturedWaterCubicMetres,
        double escapingWaterCubicMetres, double treatedWaterCubicMetres, double operatingDays, double calendarDays,
        int operatingYears, long monitoringSamples, double amendmentMassKilograms, List<Caution> cautions) {

    /** Days per year used to turn calendar days into years (Julian year, common practice). */
    public static final double DAYS_PER_YEAR = 365.25;

    /** Quantity name: water applied, m3. */
    public static final String APPLIED_WATER = "flushing water applied";
    /** Quantity name: flushing water captured, m3. */
    public static final String CAPTURED_WATER = "flushing water captured";
    /** Quantity name: flushing water escaping, m3. */
    public static final String ESCAPING_WATER = "flushing water escaping uncaptured";
    /** Quantity name: water extracted and treated, m3. */
    public static final String TREATED_WATER = "flushing water treated";
    /** Quantity name: water treated per operating year, m3. */
    public static final String TREATED_WATER_PER_YEAR = "flushing water treated per operating year";
    /** Quantity name: operating days. */
    public static final String OPERATING_DAYS = "flushing operating days";
    /** Quantity name: calendar days. */
    public static final String CALENDAR_DAYS = "flushing calendar days";
    /** Quantity name: whole operating years. */
    public static final String OPERATING_YEARS = "flushing operating years";
    /** Quantity name: monitoring samples. */
    public static final String MONITORING_SAMPLES = "monitoring samples";
    /** Quantity name: monitoring samples per operating year. */
    public static final String MONITORING_SAMPLES_PER_YEAR = "monitoring samples per operating year";
    /** Quantity name: amendment mass, kg. */
    public static final String AMENDMENT_MASS = "amendment mass";
    /** Quantity name: amendment mass per operating year, kg. */
    public static final String AMENDMENT_MASS_PER_YEAR = "amendment mass per operating year";

    /** Makes the caution list unmodifiable. */
    public FlushingQuantities {
        cautions = List.copyOf(cautions);
    }

    /** The take-off of {@code input}. */
    public static FlushingQuantities of(FlushingInput input) {
        Checks.notNull("flushing input", input);
        double applied = input.poreVolumes() * input.poreVolumeCubicMetres();
        double captured = applied * input.captureEfficiencyFraction();
        double escaping = applied * (1.0 - input.captureEfficiencyFraction());
        double treated = applied * input.extractionToInjectionRatio();
        double operatingDays = applied / (input.darcyFluxMetresPerDay() * input.areaSquareMetres());
        double calendarDays = operatingDays * 7.0 / input.operatingDaysPerWeek();
        int years = (int) Math.max(1, Counts.roundUp(calendarDays / DAYS_PER_YEAR));
        long samples = input.monitoring().sampleCount(calendarDays, input.poreVolumes());
        double amendment = input.amendmentDoseKilogramsPerCubicMetre() * applied;

        List<Caution> cautions = new ArrayList<>();
        cautions.add(new Caution(Caution.FLUSHING_MOBILISES, "Flushing mobilises contaminants: the flushed water "
                + "must be captured and treated, and groundwater protection and discharge permits apply. Follow the "
                + "rules where the site is."));
        if (escaping > 0) {
            cautions.add(new Caution(Caution.UNCAPTURED_WATER, String.format(Locale.ROOT,
                    "At a capture efficiency of %.1f %% about %.0f m3 of flushing water (%.1f %% of %.0f m3 applied) "
                            + "escapes capture with the contaminants it carries. Show how it is contained or why "
                            + "it is acceptable.",
                    100 * input.captureEfficiencyFraction(), escaping, 100 * (1 - input.captureEfficiencyFraction()),
                    applied)));
        }
        return new FlushingQuantities(input, applied, captured, escaping, treated, operatingDays, calendarDays,
                years, samples, amendment, cautions);
    }

    /** Calendar days as years of {@value #DAYS_PER_YEAR} days (not rounded). */
    public double calendarYears() {
        return calendarDays / DAYS_PER_YEAR;
    }

    /** The take-off as named quantities, each with the method and inputs behind it. */
    public QuantitySet toQuantitySet() {
        FlushingInput in = input;
        String appliedSource = String.format(Locale.ROOT, "%.4f pore volumes x %.3f m3 per pore volume",
                in.poreVolumes(), in.poreVolumeCubicMetres());
        String perYear = " / " + operatingYears + " operating years (spread evenly)";
        List<Quantity> q = new ArrayList<>();
        q.add(new Quantity(APPLIED_WATER, appliedWaterCubicMetres, CostUnit.CUBIC_METRE, appliedSource));
        q.add(new Quantity(CAPTURED_WATER, capturedWaterCubicMetres, CostUnit.CUBIC_METRE,
                "applied x capture efficiency " + in.captureEfficiencyFraction()));
        q.add(new Quantity(ESCAPING_WATER, escapingWaterCubicMetres, CostUnit.CUBIC_METRE,
                "applied x (1 - capture efficiency " + in.captureEfficiencyFraction() + ")"));
        q.add(new Quantity(TREATED_WATER, treatedWaterCubicMetres, CostUnit.CUBIC_METRE,
                "applied x extraction-to-injection ratio " + in.extractionToInjectionRatio()));
        q.add(new Quantity(TREATED_WATER_PER_YEAR, treatedWaterCubicMetres / operatingYears, CostUnit.CUBIC_METRE,
                "treated water" + perYear));
        q.add(new Quantity(OPERATING_DAYS, operatingDays, CostUnit.DAY, String.format(Locale.ROOT,
                "applied / (Darcy flux %.5f m/d x area %.3f m2)", in.darcyFluxMetresPerDay(), in.areaSquareMetres())));
        q.add(new Quantity(CALENDAR_DAYS, calendarDays, CostUnit.DAY,
                "operating days x 7 / " + in.operatingDaysPerWeek() + " operating days per week"));
        q.add(new Quantity(OPERATING_YEARS, operatingYears, CostUnit.YEAR,
                "calendar days / " + DAYS_PER_YEAR + " rounded up, at least 1"));
        q.add(new Quantity(MONITORING_SAMPLES, monitoringSamples, CostUnit.SAMPLE, in.monitoring().description()));
        q.add(new Quantity(MONITORING_SAMPLES_PER_YEAR, (double) monitoringSamples / operatingYears, CostUnit.SAMPLE,
                "monitoring samples" + perYear));
        q.add(new Quantity(AMENDMENT_MASS, amendmentMassKilograms, CostUnit.KILOGRAM,
                "dose " + in.amendmentDoseKilogramsPerCubicMetre() + " kg/m3 x applied water"));
        q.add(new Quantity(AMENDMENT_MASS_PER_YEAR, amendmentMassKilograms / operatingYears, CostUnit.KILOGRAM,
                "amendment mass" + perYear));
        return QuantitySet.of(q);
    }
}
