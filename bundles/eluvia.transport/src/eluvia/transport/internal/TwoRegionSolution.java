package eluvia.transport.internal;

import org.apache.commons.math3.complex.Complex;

/**
 * Two-region (mobile-immobile) or two-site (equilibrium-kinetic) nonequilibrium flushing of a
 * finite layer, exact in the Laplace domain and inverted numerically by {@link DeHoogInversion}.
 *
 * <p>Dimensionless equations (van Genuchten and Wierenga 1976; Nkedi-Kizza et al. 1984), with
 * c1 the mobile-water (equilibrium-site) and c2 the immobile (kinetic-site) concentration over
 * their common initial value, T pore volumes, X = x/L:
 * <pre>
 *   beta R dc1/dT = (1/P) d2c1/dX2 - dc1/dX - omega (c1 - c2)
 *   (1 - beta) R dc2/dT = omega (c1 - c2)
 * </pre>
 * c1 = c2 = 1 at T = 0, clean water through a flux inlet (c1 - (1/P) dc1/dX = 0 at X = 0), zero
 * gradient at X = 1. In the Laplace domain (variable s) the immobile equation gives
 * c2 = (omega c1 + (1 - beta) R) / ((1 - beta) R s + omega), and w = 1/s - c1 solves
 * (1/P) w'' - w' = G(s) w with G = s [beta R + omega (1 - beta) R / ((1 - beta) R s + omega)],
 * the equilibrium problem with R s replaced by G: w = A exp(r1 X) + B exp(r2 X), r = (P -/+ q)/2,
 * q = sqrt(P^2 + 4 P G), B = -A (r1/r2) exp(-q), A = P r2 / (s (r2^2 - r1^2 exp(-q))).
 *
 * <p>Criteria: the effluent is c1 at the outlet (the flux-averaged mobile concentration; at a
 * zero-gradient outlet resident and flux-averaged are equal). The soil criteria use the local
 * total (mobile plus immobile water plus sorbed, over its initial value), beta c1 + (1 - beta) c2:
 * the mean is its layer average (the mass left), the maximum its largest value over depth
 * (profile search, {@link ProfileMaximum}). That total is also the concentration the water
 * returns to when flushing stops and the two regions re-equilibrate in place.
 */
public final class TwoRegionSolution {
    private final double retardation;
    private final double peclet;
    private final double beta;
    private final double omega;

    /**
     * @param retardation R &ge; 1
     * @param peclet P, finite, greater than 0
     * @param beta fraction of the retardation in the mobile (equilibrium) part, 0 &lt; beta &le; 1
     * @param omega dimensionless mass-transfer coefficient, &ge; 0
     */
    public TwoRegionSolution(double retardation, double peclet, double beta, double omega) {
        this.retardation = retardation;
        this.peclet = peclet;
        this.beta = beta;
        this.omega = omega;
    }

    public double beta() {
        return beta;
    }

    public double omega() {
        return omega;
    }

    /** Transform-domain quantities at one s, shared by every depth. */
    private final class Point {
        final Complex s;
        final Complex inverseS;
        final Complex r1;
        final Complex r2;
        final Complex a;
        final Complex bCoefficientAtOutlet; // B exp(r2) = -A (r1/r2) exp(r1)
        final Complex expMinusQ;
        final Complex immobileDenominator;

        Point(Complex s) {
            this.s = s;
            this.inverseS = s.reciprocal();
            double p = peclet;
            Complex g;
            if (beta == 1) {
                g = s.multiply(retardation);
                immobileDenominator = null;
            } else {
                immobileDenominator = s.multiply((1 - beta) * retardation).add(omega);
                g = s.multiply(new Complex(beta * retardation)
                        .add(new Complex(omega * (1 - beta) * retardation).divide(immobileDenominator)));
            }
            Complex q = g.multiply(4 * p).add(p * p).sqrt();
            r1 = q.negate().add(p).divide(2);
            r2 = q.add(p).divide(2);
            expMinusQ = q.negate().exp();
            Complex r1sq = r1.multiply(r1);
            a = r2.multiply(p).divide(s.multiply(r2.multiply(r2).subtract(r1sq.multiply(expMinusQ))));
            bCoefficientAtOutlet = a.multiply(r1).divide(r2).multiply(r1.exp()).negate();
        }

        /** Transform of c1 at depth X. */
        Complex mobile(double depth) {
            // B exp(r2 X) = B exp(r2) exp(r2 (X - 1)), never overflowing
            Complex w = a.multiply(r1.multiply(depth).exp())
                    .add(bCoefficientAtOutlet.multiply(r2.multiply(depth - 1).exp()));
            return inverseS.subtract(w);
        }

        /** Transform of the local total beta c1 + (1 - beta) c2 for a transform of c1. */
        Complex total(Complex mobile) {
            if (beta == 1) {
                return mobile;
            }
            Complex immobile = mobile.multiply(omega).add((1 - beta) * retardation).divide(immobileDenominator);
            return mobile.multiply(beta).add(immobile.multiply(1 - beta));
        }

        /** Transform of the layer integral of c1. */
        Complex mobileIntegral() {
            // integral of w = A [(exp(r1) - 1)/r1 - (r1/r2^2)(exp(r1) - exp(-q))]
            Complex first = expm1Over(r1);
            Complex second = r1.divide(r2.multiply(r2)).multiply(r1.exp().subtract(expMinusQ));
            return inverseS.subtract(a.multiply(first.subtract(second)));
        }
    }

    /** (exp(z) - 1)/z, by its series near 0. */
    private static Complex expm1Over(Complex z) {
        if (z.abs() < 1e-3) {
            // 1 + z/2 + z^2/6 + z^3/24 + z^4/120: truncation below 1e-18
            return Complex.ONE.add(z.multiply(Complex.ONE.add(z.multiply(new Complex(1.0 / 3)
                    .add(z.multiply(new Complex(1.0 / 12).add(z.multiply(1.0 / 60))))).multiply(0.5)).multiply(0.5)));
        }
        return z.exp().subtract(Complex.ONE).divide(z);
    }

    private Point[] points(double poreVolumes) {
        Complex[] s = DeHoogInversion.abscissae(poreVolumes);
        Point[] p = new Point[s.length];
        for (int k = 0; k < s.length; k++) {
            p[k] = new Point(s[k]);
        }
        return p;
    }

    /** Mobile-water concentration at the outlet (the effluent), T pore volumes. */
    public double effluent(double poreVolumes) {
        if (poreVolumes == 0) {
            return 1;
        }
        Point[] p = points(poreVolumes);
        Complex[] v = new Complex[p.length];
        for (int k = 0; k < p.length; k++) {
            // c1(1) = 1/s - A exp(r1) q / r2 = 1/s - (A exp(r1) + B exp(r2))
            v[k] = p[k].mobile(1);
        }
        return DeHoogInversion.fromValues(v, poreVolumes);
    }

    /** Layer mean of the local total (mobile plus immobile), the mass left over the mass at start. */
    public double meanTotal(double poreVolumes) {
        if (poreVolumes == 0) {
            return 1;
        }
        Point[] p = points(poreVolumes);
        Complex[] v = new Complex[p.length];
        for (int k = 0; k < p.length; k++) {
            v[k] = p[k].total(p[k].mobileIntegral());
        }
        return DeHoogInversion.fromValues(v, poreVolumes);
    }

    /** A depth profile at one time: mobile and total concentrations. */
    public final class Profile {
        private final double poreVolumes;
        private final Point[] points;

        Profile(double poreVolumes) {
            this.poreVolumes = poreVolumes;
            this.points = poreVolumes == 0 ? null : points(poreVolumes);
        }

        /** Mobile-water concentration at depth X. */
        public double mobile(double depth) {
            if (points == null) {
                return 1;
            }
            Complex[] v = new Complex[points.length];
            for (int k = 0; k < points.length; k++) {
                v[k] = points[k].mobile(depth);
            }
            return DeHoogInversion.fromValues(v, poreVolumes);
        }

        /** Local total beta c1 + (1 - beta) c2 at depth X. */
        public double total(double depth) {
            if (points == null) {
                return 1;
            }
            Complex[] v = new Complex[points.length];
            for (int k = 0; k < points.length; k++) {
                v[k] = points[k].total(points[k].mobile(depth));
            }
            return DeHoogInversion.fromValues(v, poreVolumes);
        }

        /** Immobile (kinetic-site) concentration at depth X. */
        public double immobile(double depth) {
            if (beta == 1) {
                return mobile(depth);
            }
            return (total(depth) - beta * mobile(depth)) / (1 - beta);
        }
    }

    /** The profile after T pore volumes. */
    public Profile profile(double poreVolumes) {
        return new Profile(poreVolumes);
    }

    /** Largest local total over the layer. */
    public ProfileMaximum maximumTotal(double poreVolumes) {
        Profile pr = profile(poreVolumes);
        return ProfileMaximum.of(pr::total);
    }
}
