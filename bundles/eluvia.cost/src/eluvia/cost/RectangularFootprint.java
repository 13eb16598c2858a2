package eluvia.cost;

import java.util.Locale;

import eluvia.cost.internal.Checks;

/**
 * A rectangular pit bottom or zone outline, length by width in metres, with sharp (mitred) corners.
 *
 * <p>Its pit volume is the rectangle formula of the excavation references,
 * V = h [L W + m h (L + W) + (4/3) m^2 h^2], for which the prismoidal formula
 * h/6 (A1 + 4 Am + A2) is exact (the average-end-area formula overestimates).
 *
 * @param lengthMetres length L, m, greater than 0
 * @param widthMetres  width W, m, greater than 0
 */
public record RectangularFootprint(double lengthMetres, double widthMetres) implements PitFootprint {

    /** Checks the fields. */
    public RectangularFootprint {
        Checks.positive("footprint lengthMetres", lengthMetres);
        Checks.positive("footprint widthMetres", widthMetres);
    }

    @Override
    public double areaSquareMetres() {
        return lengthMetres * widthMetres;
    }

    @Override
    public double perimeterMetres() {
        return 2.0 * (lengthMetres + widthMetres);
    }

    /** 4: four right-angled mitred corners, tan(45 degrees) each. */
    @Override
    public double cornerCoefficient() {
        return 4.0;
    }

    @Override
    public RectangularFootprint offset(double distanceMetres) {
        Checks.nonNegative("offset distanceMetres", distanceMetres);
        return new RectangularFootprint(lengthMetres + 2.0 * distanceMetres, widthMetres + 2.0 * distanceMetres);
    }

    @Override
    public double pitVolumeCubicMetres(double depthMetres, double sideSlopeHorizontalPerVertical) {
        double h = Checks.nonNegative("pit depthMetres", depthMetres);
        double m = SideSlopeTable.checkSlope("side slope (horizontal per vertical)", sideSlopeHorizontalPerVertical);
        double l = lengthMetres;
        double w = widthMetres;
        return h * (l * w + m * h * (l + w) + (4.0 / 3.0) * m * m * h * h);
    }

    @Override
    public String description() {
        return String.format(Locale.ROOT, "rectangle %.3f m x %.3f m", lengthMetres, widthMetres);
    }
}
