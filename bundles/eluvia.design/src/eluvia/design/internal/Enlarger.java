package eluvia.design.internal;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

import eluvia.design.ContaminantSpreading;
import eluvia.design.DesignSettings;
import eluvia.design.EffectiveLayer;
import eluvia.design.EnlargementPoint;
import eluvia.design.ZoneEnlargement;
import eluvia.site.derived.ZoneGeometry;
import eluvia.site.model.Contaminant;
import eluvia.site.model.Project;
import eluvia.site.model.SourceConcentration;
import eluvia.site.model.TreatmentZone;
import eluvia.site.model.Vertex;
import eluvia.transport.SourceSpreading;
import eluvia.transport.TransportProperties;

/**
 * Enlargement of the entered zones by dispersion while the remedy waits ({@link ZoneEnlargement}).
 */
public final class Enlarger {
    /** Days per year (Julian year, common practice). */
    static final double DAYS_PER_YEAR = 365.25;
    /** Points of the depth table per half-extent (linear inverse interpolation between them). */
    static final int DEPTH_TABLE = 4096;

    private Enlarger() {
    }

    /**
     * The box a zone is taken as: half-widths in easting, northing and depth, m, and the depth of
     * its centre, m below ground.
     *
     * @param halfWidthEastingMetres a_x, m
     * @param halfWidthNorthingMetres a_y, m
     * @param halfWidthDepthMetres a_z, m
     * @param centreDepthMetres depth of the centre, m
     * @param basis how it was obtained
     */
    public record SourceBox(double halfWidthEastingMetres, double halfWidthNorthingMetres, double halfWidthDepthMetres,
            double centreDepthMetres, String basis) {
        /** The box's volume, m3. */
        public double volumeCubicMetres() {
            return 8 * halfWidthEastingMetres * halfWidthNorthingMetres * halfWidthDepthMetres;
        }
    }

    /** The box of an entered zone: its effective area as a rectangle of its footprint's bounding-box proportions. */
    public static SourceBox boxOf(TreatmentZone zone) {
        double area = ZoneGeometry.effectiveAreaSquareMetres(zone);
        double sideE;
        double sideN;
        String basis;
        if (zone.getFootprint().size() >= 3) {
            double minE = Double.POSITIVE_INFINITY;
            double maxE = Double.NEGATIVE_INFINITY;
            double minN = Double.POSITIVE_INFINITY;
            double maxN = Double.NEGATIVE_INFINITY;
            for (Vertex v : zone.getFootprint()) {
                minE = Math.min(minE, v.getEastingMetres());
                maxE = Math.max(maxE, v.getEastingMetres());
                minN = Math.min(minN, v.getNorthingMetres());
                maxN = Math.max(maxN, v.getNorthingMetres());
            }
            double scale = Math.sqrt(area / ((maxE - minE) * (maxN - minN)));
            sideE = (maxE - minE) * scale;
            sideN = (maxN - minN) * scale;
            basis = String.format(Locale.ROOT, "rectangle %.4g m x %.4g m of the footprint's area %.4g m2 in the "
                    + "proportions of its bounding box", sideE, sideN, area);
        } else {
            sideE = Math.sqrt(area);
            sideN = sideE;
            basis = String.format(Locale.ROOT, "square %.4g m x %.4g m of the zone's area %.4g m2 (no footprint polygon)",
                    sideE, sideN, area);
        }
        double top = zone.getTopDepthMetres();
        double bottom = zone.getBottomDepthMetres();
        basis += String.format(Locale.ROOT, ", %.4g to %.4g m deep", top, bottom);
        return new SourceBox(sideE / 2, sideN / 2, (bottom - top) / 2, (top + bottom) / 2, basis);
    }

    /** The enlargement of one entered zone. */
    public static ZoneEnlargement enlarge(Project project, TreatmentZone zone, EffectiveLayer layer, DesignSettings settings) {
        List<String> notes = new ArrayList<>();
        SourceBox box = boxOf(zone);
        double theta = layer.waterContent();
        double v = settings.delayDarcyFluxMetresPerDay() / theta;
        double tau = TransportProperties.millingtonQuirkTortuosity(theta, layer.porosity());
        double alphaL = layer.dispersivityMetres();
        double alphaT = settings.transverseDispersivityFraction() * alphaL;
        List<ContaminantSpreading> spreads = new ArrayList<>();
        double[] delays = settings.delayYears();
        for (SourceConcentration sc : zone.getSourceConcentrations()) {
            Contaminant c = sc.getContaminant();
            double level = ZoneAnalyser.levelOf(project, c);
            double c0 = sc.getSoilConcentrationMilligramsPerKg();
            if (level <= 0 || c0 <= level) {
                continue;
            }
            double kd = c.isKdEntered() ? c.getKdLitresPerKg()
                    : TransportProperties.kdFromKoc(c.getKocLitresPerKg(), layer.organicCarbonFraction());
            double r = TransportProperties.retardation(layer.bulkDensityKgPerCubicMetre(), kd, theta);
            double dz = TransportProperties.dispersionSquareMetresPerDay(alphaL, v, tau, c.getDiffusionSquareMetresPerSecond());
            double dh = TransportProperties.dispersionSquareMetresPerDay(alphaT, v, tau, c.getDiffusionSquareMetresPerSecond());
            SourceSpreading spreading = new SourceSpreading(box.halfWidthEastingMetres(), box.halfWidthNorthingMetres(),
                    box.halfWidthDepthMetres(), dh, dh, dz, r, v);
            List<EnlargementPoint> curve = new ArrayList<>();
            for (double d : delays) {
                curve.add(point(spreading, box, level / c0, d, settings.enlargementCellsPerAxis()));
            }
            spreads.add(new ContaminantSpreading(c.getName(), c0, level, r, v, dz, dh, curve));
            if (c.getHalfLifeDays() > 0) {
                notes.add(c.getName() + ": decay (half-life " + c.getHalfLifeDays() + " d) is ignored while the zone "
                        + "spreads, which errs on the large side.");
            }
        }
        if (spreads.isEmpty()) {
            return ZoneEnlargement.notAvailable(zone.getName(),
                    "no contaminant of the zone starts above a soil cleanup level");
        }
        List<EnlargementPoint> envelope = new ArrayList<>();
        for (int i = 0; i < delays.length; i++) {
            EnlargementPoint best = null;
            double growth = 0;
            double top = Double.POSITIVE_INFINITY;
            double bottom = 0;
            double area = 0;
            for (ContaminantSpreading s : spreads) {
                EnlargementPoint p = s.curve().get(i);
                if (best == null || p.volumeAboveLevelCubicMetres() > best.volumeAboveLevelCubicMetres()) {
                    best = p;
                }
                if (p.volumeAboveLevelCubicMetres() > 0) {
                    growth = Math.max(growth, p.planGrowthMetres());
                    top = Math.min(top, p.topDepthMetres());
                    bottom = Math.max(bottom, p.bottomDepthMetres());
                    area = Math.max(area, p.footprintAreaSquareMetres());
                }
            }
            envelope.add(new EnlargementPoint(delays[i], best.volumeAboveLevelCubicMetres(),
                    best.unboundedVolumeCubicMetres(), best.ratio(), best.peakFraction(), area, growth,
                    Double.isInfinite(top) ? Double.NaN : top, bottom > 0 ? bottom : Double.NaN));
        }
        notes.add(String.format(Locale.ROOT, "Net infiltration %.3g m/d while nothing is done (pore-water velocity "
                + "%.3g m/d downwards); transverse dispersivity %.3g x the longitudinal %.3g m; tortuosity %.3g "
                + "(Millington and Quirk 1961).", settings.delayDarcyFluxMetresPerDay(), v,
                settings.transverseDispersivityFraction(), alphaL, tau));
        notes.add("The envelope is, at each delay, the largest volume of any one contaminant, with the largest plan "
                + "growth and depth range of all.");
        return new ZoneEnlargement(zone.getName(), true, "", ZoneGeometry.volumeCubicMetres(zone), box.basis(), spreads,
                envelope, notes);
    }

    /** The zone above {@code threshold} (C/C0) after {@code delayYears}. */
    static EnlargementPoint point(SourceSpreading s, SourceBox box, double threshold, double delayYears, int cells) {
        double t = delayYears * DAYS_PER_YEAR;
        if (t == 0) {
            // the source itself (the tabulated step would cost its exactness)
            return new EnlargementPoint(0, box.volumeCubicMetres(), box.volumeCubicMetres(), 1, 1,
                    4 * box.halfWidthEastingMetres() * box.halfWidthNorthingMetres(), 0,
                    box.centreDepthMetres() - box.halfWidthDepthMetres(), box.centreDepthMetres() + box.halfWidthDepthMetres());
        }
        double shift = s.centreShiftMetres(t);
        double peak = s.peakConcentration(t);
        if (!(peak > threshold)) {
            return new EnlargementPoint(delayYears, 0, 0, 0, peak, 0, 0, Double.NaN, Double.NaN);
        }
        double hx = axialExtent(x -> s.concentration(x, 0, shift, t), box.halfWidthEastingMetres(), threshold);
        double hy = axialExtent(y -> s.concentration(0, y, shift, t), box.halfWidthNorthingMetres(), threshold);
        double hz = axialExtent(z -> s.concentration(0, 0, shift + z, t), box.halfWidthDepthMetres(), threshold);
        // The solution is a product of one factor per direction, each largest at the centre, so
        // C(x, y, z) = peak gx(x) gy(y) gz(z) with g = factor / factor at the centre, and the region
        // lies in the box of its axial half-extents. gz is tabulated on a fine grid and inverted per column.
        double cellX = hx / cells;
        double cellY = hy / cells;
        double[] gx = new double[cells];
        double[] gy = new double[cells];
        for (int i = 0; i < cells; i++) {
            gx[i] = s.concentration((i + 0.5) * cellX, 0, shift, t) / peak;
            gy[i] = s.concentration(0, (i + 0.5) * cellY, shift, t) / peak;
        }
        double[] gz = new double[DEPTH_TABLE + 1];
        for (int m = 0; m <= DEPTH_TABLE; m++) {
            gz[m] = s.concentration(0, 0, shift + hz * m / DEPTH_TABLE, t) / peak;
        }
        double ground = -(box.centreDepthMetres() + shift); // ground surface relative to the moving centre
        double volume = 0;
        double unbounded = 0;
        int columns = 0;
        double topRel = Double.POSITIVE_INFINITY;
        for (int i = 0; i < cells; i++) {
            for (int j = 0; j < cells; j++) {
                double g = threshold / (peak * gx[i] * gy[j]);
                if (!(g < 1)) {
                    continue;
                }
                double up = halfLength(gz, hz, g);
                unbounded += 2 * up;
                double lo = Math.max(-up, ground);
                double length = up - lo;
                if (length > 0) {
                    volume += length;
                    columns++;
                    topRel = Math.min(topRel, lo);
                }
            }
        }
        volume *= 4 * cellX * cellY;
        unbounded *= 4 * cellX * cellY;
        double area = 4 * columns * cellX * cellY;
        double growth = Math.max(hx - box.halfWidthEastingMetres(), hy - box.halfWidthNorthingMetres());
        double top = Double.isInfinite(topRel) ? Double.NaN : box.centreDepthMetres() + shift + topRel;
        double bottom = box.centreDepthMetres() + shift + hz;
        return new EnlargementPoint(delayYears, volume, unbounded, volume / box.volumeCubicMetres(),
                peak, area, Math.max(0, growth), Math.max(0, top), bottom);
    }

    /**
     * The distance from the centre, m, where a factor that falls with distance meets the threshold:
     * the bracket grows from the source half-width until the value is below the threshold, then
     * bisection to 1e-12 of the bracket.
     */
    private static double axialExtent(java.util.function.DoubleUnaryOperator c, double halfWidthMetres, double threshold) {
        double lo = 0;
        double hi = halfWidthMetres;
        while (c.applyAsDouble(hi) > threshold) {
            lo = hi;
            hi *= 2;
        }
        for (int k = 0; k < 200 && hi - lo > 1e-12 * hi; k++) {
            double mid = 0.5 * (lo + hi);
            if (c.applyAsDouble(mid) > threshold) {
                lo = mid;
            } else {
                hi = mid;
            }
        }
        return 0.5 * (lo + hi);
    }

    /**
     * The half-length where the decreasing table {@code gz} (over 0 to {@code hz}) falls to {@code g},
     * by binary search and linear interpolation between the table points.
     */
    private static double halfLength(double[] gz, double hz, double g) {
        int n = gz.length - 1;
        if (gz[n] > g) {
            return hz;
        }
        int lo = 0;
        int hi = n;
        while (hi - lo > 1) {
            int mid = (lo + hi) >>> 1;
            if (gz[mid] > g) {
                lo = mid;
            } else {
                hi = mid;
            }
        }
        double f = (gz[lo] - g) / (gz[lo] - gz[hi]);
        return hz * (lo + (Double.isFinite(f) ? f : 0.5)) / n;
    }
}
