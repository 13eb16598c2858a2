package eluvia.design.internal;

import java.util.ArrayList;
import java.util.EnumSet;
import java.util.List;
import java.util.Locale;
import java.util.Set;

import eluvia.cost.AlternativeKind;
import eluvia.cost.CapitalMarkups;
import eluvia.cost.CostCategory;
import eluvia.cost.CostUnit;
import eluvia.cost.EstimateRecipe;
import eluvia.cost.ExamplePriceBook;
import eluvia.cost.ExcavationQuantities;
import eluvia.cost.FlushingQuantities;
import eluvia.cost.OperatingMarkups;
import eluvia.cost.OperatingPeriod;
import eluvia.cost.PriceBook;
import eluvia.cost.PresentValue;
import eluvia.cost.PriceItem;
import eluvia.cost.Quantity;
import eluvia.cost.QuantitySet;
import eluvia.design.DesignInputException;
import eluvia.design.DesignSettings;
import eluvia.site.model.Project;

/**
 * Price books and estimate recipes of the pipeline.
 *
 * <p>The site model's price books map onto eluvia.cost {@link PriceBook}s item by item (code as the
 * id, the unit by its symbol). A cost line of an alternative looks its rate up by the code of its
 * {@link Role}: the dotted code (e.g. {@code excavation.bank}) or the id of the same item in the
 * example book ({@code excavate-bank}); a line whose rate the book lacks is left out and listed as
 * unpriced. Rates are marked invented when their source note or the book's reference says
 * "invented". Without a price book the invented example book of eluvia.cost prices everything,
 * marked invented in every output.
 *
 * <p>Markups and the discount rate: a project's price book carries its own contingency and
 * professional-services percentages (EPA 540-R-00-002 layout: contingency on the subtotal,
 * services on the subtotal plus contingency) and its real discount rate with the rule it follows;
 * they price every alternative costed from that book unless {@link DesignSettings} sets markups or
 * a rate for the run. The invented example book keeps its own invented markups and the default
 * rate. Every estimate's notes state which applied.
 */
public final class CostRecipes {

    /**
     * One cost line an alternative needs.
     *
     * @param code the dotted code the site model's price items use
     * @param exampleId the id of the same rate in the example book
     * @param unit the unit of the rate
     * @param category capital or annual O&amp;M
     * @param quantityName the take-off quantity it prices
     * @param what plain words
     * @param kinds the alternatives that need it
     */
    public record Role(String code, String exampleId, CostUnit unit, CostCategory category, String quantityName,
            String what, Set<AlternativeKind> kinds) {
    }

    private static final Set<AlternativeKind> ALL = EnumSet.allOf(AlternativeKind.class);
    private static final Set<AlternativeKind> DIG = EnumSet.of(AlternativeKind.EXCAVATION, AlternativeKind.HYBRID);
    private static final Set<AlternativeKind> FLUSH = EnumSet.of(AlternativeKind.FLUSHING, AlternativeKind.HYBRID);

    /** Every cost line, in estimate order. */
    public static final List<Role> ROLES = List.of(
            new Role("mobilisation", "mobilisation", CostUnit.LUMP_SUM, CostCategory.CAPITAL, ExamplePriceBook.MOBILISATION,
                    "mobilisation and demobilisation", ALL),
            new Role("excavation.bank", "excavate-bank", CostUnit.CUBIC_METRE, CostCategory.CAPITAL,
                    ExcavationQuantities.PIT_BANK_VOLUME, "excavate and load, per bank m3", DIG),
            new Role("haul.load", "haul-load", CostUnit.LOAD, CostCategory.CAPITAL, ExcavationQuantities.CONTAMINATED_LOADS,
                    "haul contaminated soil, per load", DIG),
            new Role("disposal.contaminated", "dispose-contaminated", CostUnit.TONNE, CostCategory.CAPITAL,
                    ExcavationQuantities.CONTAMINATED_MASS, "dispose of contaminated soil, per t", DIG),
            new Role("stockpile.overburden", "stockpile-overburden", CostUnit.CUBIC_METRE, CostCategory.CAPITAL,
                    ExcavationQuantities.OVERBURDEN_LOOSE_VOLUME, "stockpile clean overburden, per loose m3", DIG),
            new Role("haul.load", "haul-load", CostUnit.LOAD, CostCategory.CAPITAL,
                    ExcavationQuantities.OVERBURDEN_OFF_SITE_LOADS, "haul overburden off site, per load", DIG),
            new Role("borrow.purchase", "borrow-purchase", CostUnit.CUBIC_METRE, CostCategory.CAPITAL,
                    ExcavationQuantities.IMPORT_BANK_VOLUME, "borrow fill at the source, per bank m3", DIG),
            new Role("haul.load", "haul-load", CostUnit.LOAD, CostCategory.CAPITAL, ExcavationQuantities.IMPORT_LOADS,
                    "haul borrow fill, per load", DIG),
            new Role("backfill.place", "place-compact", CostUnit.CUBIC_METRE, CostCategory.CAPITAL,
                    ExcavationQuantities.BACKFILL_COMPACTED_VOLUME, "place and compact backfill, per compacted m3", DIG),
            new Role("site.restoration", "site-restoration", CostUnit.SQUARE_METRE, CostCategory.CAPITAL,
                    ExcavationQuantities.PIT_TOP_AREA, "grade, topsoil and seed, per m2", DIG),
            new Role("flushing.system", "flushing-system", CostUnit.LUMP_SUM, CostCategory.CAPITAL,
                    ExamplePriceBook.FLUSHING_SYSTEM, "flushing wells, piping and treatment plant, installed", FLUSH),
            new Role("system.operation", "system-operation", CostUnit.LUMP_SUM, CostCategory.ANNUAL_OPERATION_AND_MAINTENANCE,
                    ExamplePriceBook.SYSTEM_OPERATION_PER_YEAR, "system operation for one year", FLUSH),
            new Role("water.treatment", "water-treatment", CostUnit.CUBIC_METRE,
                    CostCategory.ANNUAL_OPERATION_AND_MAINTENANCE, FlushingQuantities.TREATED_WATER_PER_YEAR,
                    "treat extracted water, per m3", FLUSH),
            new Role("amendment", "amendment", CostUnit.KILOGRAM, CostCategory.ANNUAL_OPERATION_AND_MAINTENANCE,
                    FlushingQuantities.AMENDMENT_MASS_PER_YEAR, "flushing amendment, per kg", FLUSH),
            new Role("monitoring.sample", "monitoring-sample", CostUnit.SAMPLE, CostCategory.ANNUAL_OPERATION_AND_MAINTENANCE,
                    FlushingQuantities.MONITORING_SAMPLES_PER_YEAR, "collect and analyse one sample", FLUSH));

    private CostRecipes() {
    }

    /**
     * The price book of an alternative.
     *
     * @param book the eluvia.cost book
     * @param example whether it is the invented example book of eluvia.cost (the project has none)
     * @param invented whether any of its rates is invented
     * @param source where it comes from, for results
     * @param capitalMarkups the book's capital markups (the example book's invented ones for the example)
     * @param operatingMarkups the book's O&amp;M markups (the example book's invented ones for the example)
     * @param discountRatePercent the book's real discount rate, % per year (the default 7 for the example)
     * @param discountRateBasis which rule the book's rate follows, in words (never null)
     */
    public record BookChoice(PriceBook book, boolean example, boolean invented, String source,
            CapitalMarkups capitalMarkups, OperatingMarkups operatingMarkups, double discountRatePercent,
            String discountRateBasis) {

        /** A book with no markups and the default rate (for callers that build one by hand). */
        public BookChoice(PriceBook book, boolean example, boolean invented, String source) {
            this(book, example, invented, source, example ? ExamplePriceBook.capitalMarkups() : CapitalMarkups.none(),
                    example ? ExamplePriceBook.operatingMarkups() : OperatingMarkups.none(),
                    PresentValue.DEFAULT_REAL_DISCOUNT_RATE_PERCENT, PresentValue.DEFAULT_RATE_RULE);
        }
    }

    /**
     * The book for an alternative: the design's own, else the project's first, else the invented
     * example book.
     */
    public static BookChoice bookFor(Project project, eluvia.site.model.PriceBook designBook) {
        eluvia.site.model.PriceBook emf = designBook != null ? designBook
                : project.getPriceBooks().isEmpty() ? null : project.getPriceBooks().get(0);
        if (emf == null) {
            return new BookChoice(ExamplePriceBook.create(), true, true,
                    "the INVENTED example price book of Eluvia (the project has no price book): its rates are not market "
                            + "rates; supply your own");
        }
        return map(emf);
    }

    /** The site model's price book as an eluvia.cost price book. */
    public static BookChoice map(eluvia.site.model.PriceBook emf) {
        String label = "Price book '" + emf.getName() + "'";
        String currency = emf.getCurrency() == null ? "" : emf.getCurrency().trim();
        if (currency.isEmpty()) {
            throw DesignInputException.of(emf, label, "currency", "(empty)", "an ISO 4217 currency code, e.g. USD or EUR",
                    "enter the currency of the rates");
        }
        if (emf.getName() == null || emf.getName().isBlank()) {
            throw DesignInputException.of(emf, "Price book", "name", "(empty)", "not empty", "name the price book");
        }
        boolean bookInvented = contains(emf.getReference(), "invented");
        boolean anyInvented = false;
        List<PriceItem> items = new ArrayList<>();
        List<String> ids = new ArrayList<>();
        for (eluvia.site.model.PriceItem i : emf.getItems()) {
            String code = i.getCode() == null ? "" : i.getCode().trim();
            String itemLabel = "Price item '" + (code.isEmpty() ? i.getName() : code) + "' of " + label.toLowerCase(Locale.ROOT);
            if (code.isEmpty()) {
                throw DesignInputException.of(i, itemLabel, "code", "(empty)", "a code no other item of the book has",
                        "enter the item's code, e.g. excavation.bank");
            }
            if (ids.contains(code)) {
                throw DesignInputException.of(i, itemLabel, "code", code, "a code no other item of the book has",
                        "remove or rename the duplicate");
            }
            ids.add(code);
            CostUnit unit = unitOf(i.getUnit());
            if (unit == null) {
                throw DesignInputException.of(i, itemLabel, "unit", i.getUnit() == null ? "(empty)" : i.getUnit(),
                        "one of m3, m2, m, t, kg, load, sample, d, yr, ea, LS", "enter the unit the rate is per");
            }
            if (!(i.getRatePerUnit() >= 0) || Double.isInfinite(i.getRatePerUnit())) {
                throw DesignInputException.of(i, itemLabel, "ratePerUnit", i.getRatePerUnit(), "0 or more, finite",
                        "enter the rate per " + unit.symbol());
            }
            String itemCurrency = i.getCurrency() == null || i.getCurrency().isBlank() ? currency : i.getCurrency().trim();
            if (!itemCurrency.equals(currency)) {
                throw DesignInputException.of(i, itemLabel, "currency", itemCurrency, "the book's currency " + currency
                        + " (or empty)", "one book holds one currency: convert the rate or move it to another book");
            }
            String note = i.getSourceNote() == null || i.getSourceNote().isBlank() ? "no source given" : i.getSourceNote();
            boolean invented = bookInvented || contains(note, "invented");
            anyInvented |= invented;
            String description = i.getName() == null || i.getName().isBlank() ? code : i.getName();
            items.add(new PriceItem(code, description, unit, i.getRatePerUnit(), currency, note, invented));
        }
        String source = "the project's price book '" + emf.getName() + "'"
                + (emf.getReference() == null || emf.getReference().isBlank() ? "" : " (" + emf.getReference() + ")")
                + (anyInvented ? ": its rates are marked INVENTED" : "");
        CapitalMarkups capital = new CapitalMarkups(percent(emf, label, "scopeContingencyPercent", emf.getScopeContingencyPercent()),
                percent(emf, label, "bidContingencyPercent", emf.getBidContingencyPercent()),
                percent(emf, label, "projectManagementPercent", emf.getProjectManagementPercent()),
                percent(emf, label, "remedialDesignPercent", emf.getRemedialDesignPercent()),
                percent(emf, label, "constructionManagementPercent", emf.getConstructionManagementPercent()));
        OperatingMarkups operating = new OperatingMarkups(
                percent(emf, label, "operatingContingencyPercent", emf.getOperatingContingencyPercent()),
                percent(emf, label, "operatingProjectManagementPercent", emf.getOperatingProjectManagementPercent()),
                percent(emf, label, "technicalSupportPercent", emf.getTechnicalSupportPercent()));
        double ratePercent = emf.getDiscountRatePercent();
        if (!(ratePercent >= -5 && ratePercent <= 30)) {
            throw DesignInputException.of(emf, label, "discountRatePercent", ratePercent, "-5 to 30 % per year",
                    "enter the real discount rate in % per year (7 for 7 %)");
        }
        String basis = emf.getDiscountRateBasis() == null || emf.getDiscountRateBasis().isBlank()
                ? (ratePercent == PresentValue.DEFAULT_REAL_DISCOUNT_RATE_PERCENT ? PresentValue.DEFAULT_RATE_RULE
                        : "no basis stated in the price book")
                : emf.getDiscountRateBasis().trim();
        return new BookChoice(new PriceBook(emf.getName(), currency, items), false, anyInvented, source, capital, operating,
                ratePercent, basis);
    }

    private static double percent(eluvia.site.model.PriceBook emf, String label, String field, double valuePercent) {
        if (!(valuePercent >= 0 && valuePercent <= 100)) {
            throw DesignInputException.of(emf, label, field, valuePercent, "0 to 100 %", "enter per cent (15 for 15 %), 0 for none");
        }
        return valuePercent;
    }

    private static boolean contains(String text, String word) {
        return text != null && text.toLowerCase(Locale.ROOT).contains(word);
    }

    /** The cost unit of a price item's unit text, or null when it is not one. */
    static CostUnit unitOf(String text) {
        if (text == null) {
            return null;
        }
        String t = text.trim().toLowerCase(Locale.ROOT);
        for (CostUnit u : CostUnit.values()) {
            if (u.symbol().toLowerCase(Locale.ROOT).equals(t)) {
                return u;
            }
        }
        switch (t) {
            case "m\u00b3":
            case "cubic metre":
            case "cubic meter":
                return CostUnit.CUBIC_METRE;
            case "m\u00b2":
            case "square metre":
            case "square meter":
                return CostUnit.SQUARE_METRE;
            case "tonne":
            case "tonnes":
                return CostUnit.TONNE;
            case "each":
                return CostUnit.EACH;
            case "lump sum":
            case "lumpsum":
                return CostUnit.LUMP_SUM;
            case "day":
            case "days":
                return CostUnit.DAY;
            case "year":
            case "years":
                return CostUnit.YEAR;
            case "loads":
                return CostUnit.LOAD;
            case "samples":
                return CostUnit.SAMPLE;
            default:
                return null;
        }
    }

    /** The lump-sum quantities every alternative's take-off carries. */
    public static QuantitySet lumpSums(boolean example) {
        if (example) {
            return ExamplePriceBook.lumpSums();
        }
        return QuantitySet.of(Quantity.lumpSum(ExamplePriceBook.MOBILISATION, "one per alternative (lump sum)"),
                Quantity.lumpSum(ExamplePriceBook.FLUSHING_SYSTEM, "one flushing system (lump sum)"),
                Quantity.lumpSum(ExamplePriceBook.SYSTEM_OPERATION_PER_YEAR, "one per operating year (lump sum)"));
    }

    /**
     * A recipe and what it could not price.
     *
     * @param recipe the recipe, or null when no line could be priced
     * @param unpriced lines left out, in words
     * @param notes bases (markups)
     */
    public record Priced(EstimateRecipe recipe, List<String> unpriced, List<String> notes) {
    }

    /** The recipe of an alternative. */
    public static Priced recipe(String name, AlternativeKind kind, BookChoice choice, DesignSettings settings) {
        EstimateRecipe.Builder b = EstimateRecipe.builder(name, choice.book());
        List<String> unpriced = new ArrayList<>();
        List<String> notes = new ArrayList<>();
        int lines = 0;
        for (Role role : ROLES) {
            if (!role.kinds().contains(kind)) {
                continue;
            }
            PriceItem item = find(choice.book(), role);
            if (item == null) {
                unpriced.add(role.what() + " (quantity '" + role.quantityName() + "'): price book '" + choice.book().name()
                        + "' has no item with code '" + role.code() + "' or '" + role.exampleId() + "'");
                continue;
            }
            if (item.unit() != role.unit()) {
                throw DesignInputException.of(null, "Price item '" + item.id() + "' of price book '" + choice.book().name()
                        + "'", "unit", item.unit().symbol(), role.unit().symbol() + " (it prices " + role.what() + ")",
                        "enter the rate per " + role.unit().symbol());
            }
            switch (role.category()) {
                case CAPITAL -> b.capital(item.id(), role.quantityName());
                default -> b.annual(item.id(), role.quantityName());
            }
            lines++;
        }
        CapitalMarkups cm = settings.capitalMarkups();
        OperatingMarkups om = settings.operatingMarkups();
        String bookName = "price book '" + choice.book().name() + "'";
        if (cm == null) {
            cm = choice.example() ? ExamplePriceBook.capitalMarkups() : choice.capitalMarkups();
            notes.add(choice.example() ? "Capital markups: the example's INVENTED markups (" + cm + ")."
                    : cm.equals(CapitalMarkups.none())
                            ? "Capital markups: none (" + bookName + " enters no contingency or professional-services "
                                    + "percentages; the estimate understates the capital cost unless that is intended)."
                            : "Capital markups: from " + bookName + " (" + cm + ").");
        } else {
            notes.add("Capital markups: set for this run (" + cm + "), not the price book's.");
        }
        if (om == null) {
            om = choice.example() ? ExamplePriceBook.operatingMarkups() : choice.operatingMarkups();
            notes.add(choice.example() ? "O&M markups: the example's INVENTED markups (" + om + ")."
                    : om.equals(OperatingMarkups.none())
                            ? "O&M markups: none (" + bookName + " enters no O&M contingency or support percentages)."
                            : "O&M markups: from " + bookName + " (" + om + ").");
        } else {
            notes.add("O&M markups: set for this run (" + om + "), not the price book's.");
        }
        double ratePercent;
        if (settings.discountRateEntered()) {
            ratePercent = settings.discountRatePercent();
            notes.add("Discount rate: " + ratePercent + " % per year (real), set for this run"
                    + (choice.example() ? "." : ", not the rate of " + bookName + "."));
        } else if (choice.example()) {
            ratePercent = settings.discountRatePercent();
            notes.add(sentence("Discount rate: " + ratePercent + " % per year (real): " + PresentValue.DEFAULT_RATE_RULE));
        } else {
            ratePercent = choice.discountRatePercent();
            notes.add(sentence("Discount rate: " + ratePercent + " % per year (real) from " + bookName + ": "
                    + choice.discountRateBasis()));
        }
        if (!unpriced.isEmpty()) {
            notes.add(unpriced.size() + " cost item(s) are not in the price book and are left out: the estimate "
                    + "understates the cost.");
        }
        if (lines == 0) {
            return new Priced(null, unpriced, notes);
        }
        b.capitalMarkups(cm).operatingMarkups(om).discountRatePercent(ratePercent)
                .accuracy(settings.accuracy()).operatingPeriod(kind == AlternativeKind.EXCAVATION ? OperatingPeriod.fixed(0)
                        : OperatingPeriod.fromQuantity(FlushingQuantities.OPERATING_YEARS));
        return new Priced(b.build(), unpriced, notes);
    }

    private static String sentence(String text) {
        return text.endsWith(".") ? text : text + ".";
    }

    private static PriceItem find(PriceBook book, Role role) {
        for (PriceItem i : book.items()) {
            if (i.id().equals(role.code()) || i.id().equals(role.exampleId())) {
                return i;
            }
        }
        return null;
    }
}
