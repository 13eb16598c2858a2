package eluvia.transport;

import org.apache.commons.math3.analysis.solvers.BrentSolver;
import org.apache.commons.math3.special.Erf;

/**
 * Spreading of an initially rectangular source by dispersion: a block of half-widths a_x, a_y,
 * a_z (metres) at C0 in clean soil, spreading with dispersion coefficients D_x, D_y, D_z
 * (m2/day) and retardation factor R, and moving with the pore water along z at v / R (v in
 * m/day, 0 for no flow). An infinite half-width leaves that direction uniform, so a source is
 * spread in 1, 2 or 3 dimensions by giving one, two or three finite half-widths.
 *
 * <p>Method (Crank 1975, The Mathematics of Diffusion, 2nd ed., eq. 2.15 for the slab; Hunt 1978,
 * J. Hydraul. Div. ASCE 104:75 for the product in 2-D and 3-D):
 * C/C0 = prod_i 1/2 [erf((a_i - xi_i)/(2 sqrt(D_i t/R))) + erf((a_i + xi_i)/(2 sqrt(D_i t/R)))],
 * xi = coordinate from the source centre, xi_z = z - v t / R. Each factor is largest at xi = 0 and
 * falls with |xi|, so the region above a threshold is star-shaped about the centre.
 *
 * <p>Length, area or volume above a threshold: in 1-D twice the half-width where the factor
 * meets the threshold (Brent's method, Commons Math {@link BrentSolver}, absolute accuracy
 * 1e-12 of the extent). In 2-D and 3-D the outer directions are integrated by Gauss-Legendre
 * quadrature with {@value #PANELS} panels of {@value #NODES} nodes per direction, after the
 * substitution xi = X (1 - u^2) that removes the square-root behaviour at the edge of the
 * region, and the innermost direction is the 1-D half-width; the tests find this within 1e-6
 * (relative) of a fine independent grid count and of the 1-D closed forms.
 */
public final class SourceSpreading {
    static final int PANELS = 4;
    static final int NODES = 8;
    private static final double[] GL_NODES = {
        -0.9602898564975363, -0.7966664774136267, -0.5255324099163290, -0.1834346424956498,
        0.1834346424956498, 0.5255324099163290, 0.7966664774136267, 0.9602898564975363 };
    private static final double[] GL_WEIGHTS = {
        0.1012285362903763, 0.2223810344533745, 0.3137066458778873, 0.3626837833783620,
        0.3626837833783620, 0.3137066458778873, 0.2223810344533745, 0.1012285362903763 };

    private final double[] halfWidthsMetres;
    private final double[] dispersionSquareMetresPerDay;
    private final double retardation;
    private final double velocityZMetresPerDay;

    /**
     * @param halfWidthXMetres a_x, m, greater than 0 (positive infinity: uniform in x)
     * @param halfWidthYMetres a_y, m, greater than 0 (positive infinity: uniform in y)
     * @param halfWidthZMetres a_z, m, greater than 0 (positive infinity: uniform in z)
     * @param dispersionXSquareMetresPerDay D_x, m2/day, 0 or more
     * @param dispersionYSquareMetresPerDay D_y, m2/day, 0 or more
     * @param dispersionZSquareMetresPerDay D_z, m2/day, 0 or more
     * @param retardation R, 1 or more
     * @param velocityZMetresPerDay pore-water velocity along z, m/day (any sign, 0 for none)
     */
    public SourceSpreading(double halfWidthXMetres, double halfWidthYMetres, double halfWidthZMetres,
            double dispersionXSquareMetresPerDay, double dispersionYSquareMetresPerDay,
            double dispersionZSquareMetresPerDay, double retardation, double velocityZMetresPerDay) {
        String[] axes = {"x", "y", "z"};
        double[] a = {halfWidthXMetres, halfWidthYMetres, halfWidthZMetres};
        double[] d = {dispersionXSquareMetresPerDay, dispersionYSquareMetresPerDay, dispersionZSquareMetresPerDay};
        int finite = 0;
        for (int i = 0; i < 3; i++) {
            if (!(a[i] > 0)) {
                throw new TransportInputException("source half-width in " + axes[i] + " (m)", a[i],
                        "greater than 0 (positive infinity for a direction without spreading)");
            }
            if (!Double.isInfinite(a[i])) {
                finite++;
            }
            TransportInputException.requireNonNegative("dispersion coefficient in " + axes[i] + " (m2/day)", d[i]);
        }
        if (finite == 0) {
            throw new TransportInputException("number of finite half-widths", 0, "1, 2 or 3");
        }
        if (!(retardation >= 1) || Double.isInfinite(retardation)) {
            throw new TransportInputException("retardation factor (-)", retardation, "1 or more and finite");
        }
        if (Double.isNaN(velocityZMetresPerDay) || Double.isInfinite(velocityZMetresPerDay)) {
            throw new TransportInputException("pore-water velocity along z (m/day)", velocityZMetresPerDay, "finite");
        }
        this.halfWidthsMetres = a;
        this.dispersionSquareMetresPerDay = d;
        this.retardation = retardation;
        this.velocityZMetresPerDay = velocityZMetresPerDay;
    }

    /** Number of directions with a finite half-width (1, 2 or 3). */
    public int dimensions() {
        int n = 0;
        for (double a : halfWidthsMetres) {
            if (!Double.isInfinite(a)) {
                n++;
            }
        }
        return n;
    }

    /** Displacement of the source centre along z after a time, v t / R, m. */
    public double centreShiftMetres(double timeDays) {
        TransportInputException.requireNonNegative("time (days)", timeDays);
        return velocityZMetresPerDay * timeDays / retardation;
    }

    /**
     * C/C0 (dimensionless) at a point given relative to the initial source centre, m, after a time
     * in days.
     */
    public double concentration(double xMetres, double yMetres, double zMetres, double timeDays) {
        TransportInputException.requireNonNegative("time (days)", timeDays);
        double[] xi = {xMetres, yMetres, zMetres - centreShiftMetres(timeDays)};
        double c = 1;
        for (int i = 0; i < 3; i++) {
            c *= factor(i, xi[i], timeDays);
        }
        return c;
    }

    /** Largest C/C0 (at the moving centre) after a time in days. */
    public double peakConcentration(double timeDays) {
        TransportInputException.requireNonNegative("time (days)", timeDays);
        double c = 1;
        for (int i = 0; i < 3; i++) {
            c *= factor(i, 0, timeDays);
        }
        return c;
    }

    /**
     * Extent of the region with C/C0 above a threshold after a time: a length in m (1-D), an area
     * in m2 (2-D) or a volume in m3 (3-D), over the directions with finite half-widths.
     *
     * @param thresholdFraction C/C0 threshold, between 0 and 1 (both excluded)
     */
    public SpreadingResult extentAbove(double thresholdFraction, double timeDays) {
        if (!(thresholdFraction > 0 && thresholdFraction < 1)) {
            throw new TransportInputException("threshold fraction C/C0", thresholdFraction, "between 0 and 1, both excluded");
        }
        TransportInputException.requireNonNegative("time (days)", timeDays);
        int[] axes = new int[dimensions()];
        int k = 0;
        for (int i = 0; i < 3; i++) {
            if (!Double.isInfinite(halfWidthsMetres[i])) {
                axes[k++] = i;
            }
        }
        double peak = peakConcentration(timeDays);
        double[] half = new double[3];
        double measure = 0;
        if (peak > thresholdFraction) {
            for (int i : axes) {
                half[i] = halfExtent(i, thresholdFraction / (peak / factor(i, 0, timeDays)), timeDays);
            }
            measure = Math.pow(2, axes.length) * nested(axes, 0, thresholdFraction, timeDays);
        }
        double initial = 1;
        for (int i : axes) {
            initial *= 2 * halfWidthsMetres[i];
        }
        return new SpreadingResult(axes.length, timeDays, thresholdFraction, peak, measure, initial,
                half[0], half[1], half[2], centreShiftMetres(timeDays));
    }

    /** The positive-quadrant measure of {prod of factors axes[level..] > g}. */
    private double nested(int[] axes, int level, double g, double t) {
        int axis = axes[level];
        if (level == axes.length - 1) {
            return halfExtent(axis, g, t);
        }
        double rest = 1;
        for (int l = level + 1; l < axes.length; l++) {
            rest *= factor(axes[l], 0, t);
        }
        // outer extent: where factor(axis) * (peak of the rest) = g
        double outer = halfExtent(axis, g / rest, t);
        if (outer == 0) {
            return 0;
        }
        double sum = 0;
        double width = 1.0 / PANELS;
        for (int p = 0; p < PANELS; p++) {
            double mid = (p + 0.5) * width;
            for (int n = 0; n < NODES; n++) {
                double u = mid + 0.5 * width * GL_NODES[n];
                double xi = outer * (1 - u * u);
                double f = factor(axis, xi, t);
                double inner = f > 0 ? nested(axes, level + 1, g / f, t) : 0;
                sum += 0.5 * width * GL_WEIGHTS[n] * inner * 2 * outer * u;
            }
        }
        return sum;
    }

    /** The half-width where one factor falls to g (0 if its peak is not above g), m. */
    private double halfExtent(int axis, double g, double t) {
        double top = factor(axis, 0, t);
        if (!(top > g)) {
            return 0;
        }
        double a = halfWidthsMetres[axis];
        double s = spread(axis, t);
        if (s == 0) {
            return a;
        }
        double hi = a + s;
        while (factor(axis, hi, t) > g) {
            hi = a + 2 * (hi - a);
        }
        return new BrentSolver(1e-15, 1e-12 * (a + s)).solve(500, xi -> factor(axis, xi, t) - g, 0, hi);
    }

    /** 2 sqrt(D t / R), m. */
    private double spread(int axis, double t) {
        return 2 * Math.sqrt(dispersionSquareMetresPerDay[axis] * t / retardation);
    }

    private double factor(int axis, double xi, double t) {
        double a = halfWidthsMetres[axis];
        if (Double.isInfinite(a)) {
            return 1;
        }
        double s = spread(axis, t);
        double x = Math.abs(xi);
        if (s == 0) {
            return x < a ? 1 : x == a ? 0.5 : 0;
        }
        // erf((a - x)/s) + erf((a + x)/s) = erfc((x - a)/s) - erfc((a + x)/s), accurate in the far tail
        return 0.5 * (Erf.erfc((x - a) / s) - Erf.erfc((x + a) / s));
    }
}
