package eluvia.report.content;

import java.math.BigDecimal;
import java.math.MathContext;
import java.util.Objects;

import eluvia.report.chart.Axis;
import eluvia.site.model.UnitSystem;
import eluvia.site.units.Dimension;
import eluvia.site.units.DisplayUnit;
import eluvia.site.units.Units;

/**
 * The units a figure is drawn in: lengths, areas and volumes in the unit of a {@link UnitSystem}
 * (SI: m, m², m³; US customary: ft, ft², yd³, as {@link Units#displayUnit} chooses for the editor
 * and the tables), converted from the SI values the design computes by the exact factors of
 * {@link DisplayUnit}. Concentrations (mg/kg), times, pore volumes and money have no
 * {@link Dimension} and are drawn as computed under both systems.
 *
 * <p>The design package is drawn in {@link #SI}, where every conversion is a division by exactly 1,
 * so its numbers are those of the design; the workbench passes the user's choice.
 */
public final class FigureUnits {

    /** SI: metres, square metres, cubic metres (the design package). */
    public static final FigureUnits SI = new FigureUnits(UnitSystem.SI);
    /** US customary: feet, square feet, cubic yards. */
    public static final FigureUnits US_CUSTOMARY = new FigureUnits(UnitSystem.US_CUSTOMARY);

    private final UnitSystem system;

    private FigureUnits(UnitSystem system) {
        this.system = system;
    }

    /** The units of a unit system; SI for null. */
    public static FigureUnits of(UnitSystem system) {
        return system == UnitSystem.US_CUSTOMARY ? US_CUSTOMARY : SI;
    }

    /** The unit system. */
    public UnitSystem system() {
        return system;
    }

    /** The unit a dimension is drawn in. */
    public DisplayUnit unit(Dimension dimension) {
        return Units.displayUnit(Objects.requireNonNull(dimension, "dimension"), system);
    }

    /** The symbol drawn for a dimension, exponents as superscripts, e.g. {@code m³}, {@code ft}. */
    public String symbol(Dimension dimension) {
        return pretty(unit(dimension).symbol());
    }

    /** A value computed in the SI unit of its dimension ({@link Dimension#storageSymbol()}), in the unit drawn. */
    public double value(double siValue, Dimension dimension) {
        return Units.fromStorage(siValue, unit(dimension));
    }

    /** Values computed in SI, in the unit drawn (a new array). */
    public double[] values(double[] siValues, Dimension dimension) {
        DisplayUnit u = unit(dimension);
        double[] out = new double[siValues.length];
        for (int i = 0; i < out.length; i++) {
            out[i] = Units.fromStorage(siValues[i], u);
        }
        return out;
    }

    /** An axis of a quantity of this dimension, e.g. "Easting (ft)". */
    public Axis axis(String label, Dimension dimension) {
        return new Axis(label, symbol(dimension));
    }

    /** An SI value in the unit drawn, to three significant figures, with its symbol, e.g. "4.04 ft". */
    public String format(double siValue, Dimension dimension) {
        if (!Double.isFinite(siValue)) {
            return siValue + " " + symbol(dimension);
        }
        return new BigDecimal(value(siValue, dimension)).round(new MathContext(3)).stripTrailingZeros().toPlainString() + " "
                + symbol(dimension);
    }

    /** A unit symbol with the exponents 2 and 3 written as superscripts ({@code m3} to {@code m³}). */
    public static String pretty(String symbol) {
        return symbol.replaceAll("([a-zA-Z])2(?![0-9])", "$1\u00b2").replaceAll("([a-zA-Z])3(?![0-9])", "$1\u00b3");
    }

    @Override
    public String toString() {
        return "FigureUnits[" + system.getName() + "]";
    }
}
