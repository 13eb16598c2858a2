package eluvia.report.content;

import java.util.List;

import eluvia.design.FlushingMethod;
import eluvia.design.ZoneEnlargement;
import eluvia.design.ZoneEstimator;
import eluvia.report.document.Column;
import eluvia.report.document.Table;

/**
 * The methods a design package's results rest on, each with its published source (or "common
 * practice" where there is none), as the methods table of the package.
 */
public final class Methods {

    /**
     * One method.
     *
     * @param what what the method computes
     * @param method the formula or procedure, in words
     * @param source the published source
     */
    public record Method(String what, String method, String source) {
    }

    /** The methods, in the order of the data flow (site properties, flushing, zone, excavation, cost). */
    public static final List<Method> METHODS = List.of(
            new Method("Retardation factor", "R = 1 + \u03c1b Kd / \u03b8; Kd = Koc foc for organic compounds",
                    "Karickhoff, Brown and Scott (1979), Water Res. 13:241"),
            new Method("Tortuosity", "\u03c4 = \u03b8^(7/3) / n\u00b2", "Millington and Quirk (1961), Trans. Faraday Soc. 57:1200"),
            new Method("Dispersion", "D = \u03b1L v + \u03c4 D0; pore-water velocity v = q / \u03b8; Peclet number P = v L / D",
                    "common practice (van Genuchten and Alves 1982)"),
            new Method("Dispersivity by a scale rule", "\u03b1L = 0.1 L, or \u03b1L = 0.83 (log10 L)^2.414 with L in metres",
                    "0.1 L: common practice, no published source; Xu and Eckstein (1995), Ground Water 33:905"),
            new Method("Pore volumes", "T = q t / (\u03b8 L)", "definition"),
            new Method("Finite-layer flushing (" + FlushingMethod.EQUILIBRIUM.label() + ")",
                    "flux inlet, zero-gradient outlet, layer initially at C0 flushed with clean water",
                    "Brenner (1962), Chem. Eng. Sci. 17:229; initial-value form after van Genuchten and Alves (1982), "
                            + "USDA Tech. Bull. 1661"),
            new Method("Semi-infinite solutions", "first-type and flux inlet step input",
                    "Ogata and Banks (1961), USGS Prof. Paper 411-A; Lindstrom et al. (1967), Environ. Sci. Technol. 1:561"),
            new Method("Flux-averaged effluent", "effluent concentration of the flux-inlet solution",
                    "Parker and van Genuchten (1984), Water Resour. Res. 20:866"),
            new Method("Well-mixed estimate", "T = -R ln(C/C0), the P \u2192 0 limit of the finite layer",
                    "US EPA pump-and-treat guidance; Zheng, Bennett and Andrews (1991), Ground Water 29:838"),
            new Method("Two-region nonequilibrium (" + FlushingMethod.TWO_REGION.label() + ")",
                    "mobile-immobile or two-site model in dimensionless form (\u03b2, \u03c9), exact in the Laplace "
                            + "domain, inverted numerically",
                    "van Genuchten and Wierenga (1976), Soil Sci. Soc. Am. J. 40:473; Nkedi-Kizza et al. (1984), "
                            + "Water Resour. Res. 20:1123; de Hoog, Knight and Stokes (1982)"),
            new Method("Numerical solver", "cell-centred finite volumes over the layered profile, implicit in time, "
                    + "nonlinear sorption by Newton iteration, mass balance reported", "general numerical method "
                            + "(checked against the Brenner series in the verification appendix)"),
            new Method("Spectral-element check", "the numerical run's layered profile with linear equilibrium sorption "
                    + "solved again by spectral elements (Gauss-Lobatto-Legendre points), exact in time by its modes",
                    "Patera (1984), J. Comput. Phys. 54:468; points and weights after Abramowitz and Stegun (1964), 25.4.32"),
            new Method("Zone enlargement by dispersion", ZoneEnlargement.METHOD,
                    "Crank (1975), The Mathematics of Diffusion, 2nd ed.; Hunt (1978), J. Hydraul. Div. ASCE 104:75"),
            new Method("Zone from samples: " + ZoneEstimator.INVERSE_DISTANCE.label(),
                    "power 2, nearest samples, on a block model", "Shepard (1968)"),
            new Method("Zone from samples: " + ZoneEstimator.ORDINARY_KRIGING.label(), "on a block model with a variogram model",
                    "Matheron (1963); Isaaks and Srivastava (1989)"),
            new Method("Excavation volume", "prismoidal formula h/6 (A1 + 4 Am + A2) for a sloped pit; loose = bank (1 + swell), "
                    + "compacted = bank (1 - shrinkage)", "prismoidal formula; Peurifoy, Construction Planning, "
                            + "Equipment and Methods, Table 4-1 (swell)"),
            new Method("Side slopes", "maximum allowable slopes by soil type", "US OSHA 29 CFR 1926 Subpart P, App. B, Table B-1"),
            new Method("Cost estimate", "capital, annual O&M and periodic costs; scope and bid contingency; professional "
                    + "and technical services", "US EPA/USACE (2000), EPA 540-R-00-002"),
            new Method("Present value", "P/A = [(1 + i)^n - 1] / [i (1 + i)^n], P/F = (1 + i)^-n at a real discount rate",
                    "US EPA/USACE (2000), EPA 540-R-00-002; OMB Circular A-94 (1992) for the 7 % default"),
            new Method("Estimate class and accuracy range", "class by maturity of project definition; feasibility-study "
                    + "range -30 % / +50 %", "AACE International Recommended Practice 18R-97; EPA 540-R-00-002"));

    private Methods() {
    }

    /** The methods as a table. */
    public static Table table() {
        Table.Builder t = Table.with(Column.text("What"), Column.text("Method"), Column.text("Published source"));
        for (Method m : METHODS) {
            t.row(m.what(), m.method(), m.source());
        }
        return t.caption("Methods the results rest on, with their published sources.").build();
    }
}
