package eluvia.report;

import static eluvia.report.internal.Html.esc;
import static eluvia.report.internal.Html.num;

import java.util.Locale;

import eluvia.cost.Caution;
import eluvia.cost.CostEstimate;
import eluvia.cost.CostOfDelay;
import eluvia.cost.LineItem;
import eluvia.cost.Quantity;
import eluvia.cost.QuantitySet;
import eluvia.design.AlternativeResult;
import eluvia.design.BelowLayerPush;
import eluvia.design.ContaminantFlushing;
import eluvia.design.ContaminantSpreading;
import eluvia.design.ContaminantZone;
import eluvia.design.CostOfDelayResult;
import eluvia.design.DesignRun;
import eluvia.design.EnlargementPoint;
import eluvia.design.EnteredZoneComparison;
import eluvia.design.ExcavationResult;
import eluvia.design.FlushingDesignResult;
import eluvia.design.FlushingMethod;
import eluvia.design.MethodEstimate;
import eluvia.design.ZoneAnalysis;
import eluvia.design.ZoneEnlargement;
import eluvia.site.model.CleanupLevel;
import eluvia.site.model.Contaminant;
import eluvia.site.model.FlushingDesign;
import eluvia.site.model.Project;
import eluvia.site.model.SoilLayer;
import eluvia.site.model.SourceConcentration;
import eluvia.site.model.TreatmentZone;
import eluvia.site.validation.Problem;
import eluvia.transport.CleanupCriterion;
import eluvia.transport.FlushingEstimate;
import eluvia.transport.PoreVolumeResult;

/**
 * The readable {@code index.html} of a design package: cautions, inputs exactly as used, methods
 * with their published sources, and results per design.
 */
public final class SummaryHtml {

    private SummaryHtml() {
    }

    /** The methods the results rest on, with their published sources. */
    public static final String[][] METHODS = {
            { "Retardation factor", "R = 1 + \u03c1b Kd / \u03b8; Kd = Koc foc (Karickhoff, Brown and Scott 1979, Water Res. 13:241)" },
            { "Tortuosity", "\u03c4 = \u03b8^(7/3) / n\u00b2 (Millington and Quirk 1961, Trans. Faraday Soc. 57:1200)" },
            { "Dispersion", "D = \u03b1L v + \u03c4 D0; pore-water velocity v = q / \u03b8; Peclet number P = v L / D" },
            { "Pore volumes", "T = q t / (\u03b8 L)" },
            { "Finite-layer flushing", "flux inlet, zero-gradient outlet: Brenner (1962), Chem. Eng. Sci. 17:229; "
                    + "initial-value form after van Genuchten and Alves (1982), USDA Tech. Bull. 1661" },
            { "Well-mixed estimate", "T = -R ln(C/C0) (US EPA pump-and-treat guidance; Zheng, Bennett and Andrews 1991)" },
            { "Flux-averaged effluent", "Parker and van Genuchten (1984), Water Resour. Res. 20:866" },
            { "Two-region nonequilibrium", "van Genuchten and Wierenga (1976), Soil Sci. Soc. Am. J. 40:473; Nkedi-Kizza et al. "
                    + "(1984), Water Resour. Res. 20:1123; Laplace inversion of de Hoog, Knight and Stokes (1982)" },
            { "Numerical layered flushing", "cell-centred finite volumes (Patankar 1980), variable-step BDF2 (Hairer, "
                    + "Norsett and Wanner 1993), mass balance reported" },
            { "Zone from samples", "inverse-distance weighting (Shepard 1968) or ordinary kriging (Matheron 1963; Isaaks and "
                    + "Srivastava 1989) on a block model; blocks above the cleanup level counted whole" },
            { "Enlargement by dispersion", "Crank (1975), The Mathematics of Diffusion, slab solution; products in three "
                    + "directions (Hunt 1978, J. Hydraul. Div. ASCE 104:75); volume above the level integrated on a grid" },
            { "Excavation", "prismoidal formula h/6 (A1 + 4 Am + A2); swell and shrinkage (Peurifoy, Table 4-1); side slopes "
                    + "US OSHA 29 CFR 1926 Subpart P, App. B, Table B-1" },
            { "Costs", "capital, annual O&M and periodic costs, contingency, professional and technical services, present "
                    + "value P/A = [(1+i)^n - 1]/[i(1+i)^n], accuracy range: US EPA/USACE (2000) EPA 540-R-00-002" }, };

    /** The HTML text. */
    public static String of(Project project, DesignRun run, String projectSha256, String productVersion) {
        StringBuilder h = new StringBuilder(16_384);
        h.append("<!DOCTYPE html>\n<html lang=\"en\"><head><meta charset=\"utf-8\">\n<title>")
                .append(esc(project.getName())).append(" \u2013 Eluvia design summary</title>\n<style>\n")
                .append(CSS).append("</style></head><body>\n");
        h.append("<header><h1>").append(esc(project.getName())).append("</h1><p class=\"sub\">Design summary written by Eluvia ")
                .append(esc(productVersion)).append(" on ").append(esc(run.startedAt().toString())).append("</p>");
        if (projectSha256 != null) {
            h.append("<p class=\"sub\">Project file SHA-256: <code>").append(projectSha256).append("</code></p>");
        }
        h.append("</header>\n");

        h.append("<section class=\"cautions\"><h2>Cautions</h2><ul>");
        for (String c : run.cautions()) {
            h.append("<li>").append(esc(c)).append("</li>");
        }
        h.append("</ul></section>\n");
        if (!run.problems().isEmpty()) {
            h.append("<section><h2>Warnings from validation</h2><ul>");
            for (Problem p : run.problems()) {
                h.append("<li>").append(esc(p.message())).append("</li>");
            }
            h.append("</ul></section>\n");
        }

        h.append("<section><h2>Results</h2>");
        for (FlushingDesignResult r : run.flushing()) {
            results(h, r);
        }
        h.append("</section>\n");
        zones(h, run.zoneAnalysis());
        enlargements(h, run);
        excavations(h, run);
        alternatives(h, run);
        h.append("<section><h2>Settings of this run</h2><ul class=\"notes\">");
        for (String x : run.settings().describe()) {
            h.append("<li>").append(esc(x)).append("</li>");
        }
        for (String x : run.notes()) {
            if (!x.startsWith("Settings of this run")) {
                h.append("<li>").append(esc(x)).append("</li>");
            }
        }
        h.append("</ul></section>\n");

        inputs(h, project);

        h.append("<section><h2>Methods and sources</h2><table><tr><th>What</th><th>Method and source</th></tr>");
        for (String[] m : METHODS) {
            h.append("<tr><td>").append(esc(m[0])).append("</td><td>").append(esc(m[1])).append("</td></tr>");
        }
        h.append("</table></section>\n");
        h.append("<footer>Results are estimates for planning. A licensed professional engineer decides.</footer>\n");
        h.append("</body></html>\n");
        return h.toString();
    }

    private static void results(StringBuilder h, FlushingDesignResult r) {
        h.append("<h3>Flushing design: ").append(esc(r.designName())).append(" (zone ").append(esc(r.zoneName()))
                .append(")</h3>\n");
        h.append("<div class=\"headline\">");
        card(h, "Pore volumes (" + r.criterion().description() + ")", num(r.poreVolumes(), 4), "PV");
        card(h, "Duration", num(r.calendarDays(), 3), "calendar days");
        card(h, "Water applied", num(r.waterAppliedCubicMetres(), 3), "m\u00b3");
        card(h, "Water to capture and treat", num(r.waterCapturedCubicMetres(), 3), "m\u00b3");
        h.append("</div>\n<p>Controlling contaminant: <b>").append(esc(r.controllingContaminant() == null ? "none reaches its target" : r.controllingContaminant()))
                .append("</b>. One pore volume of the zone: ").append(num(r.onePoreVolumeCubicMetres(), 4))
                .append(" m\u00b3. Operating ").append(num(r.operatingDays(), 4)).append(" days at ")
                .append(num(r.operatingDaysPerWeek(), 3)).append(" days per week. Capture efficiency ")
                .append(num(r.captureEfficiency() * 100, 3)).append(" %; water escaping capture ")
                .append(num(r.waterEscapingCubicMetres(), 3)).append(" m\u00b3.</p>\n");
        h.append("<table><tr><th>Contaminant</th><th>C0 (mg/kg)</th><th>Cleanup level (mg/kg)</th><th>Target C/C0</th>"
                + "<th>Kd (L/kg)</th><th>R</th><th>Peclet</th><th>Well-mixed PV</th>");
        for (CleanupCriterion k : CleanupCriterion.values()) {
            h.append("<th>PV by ").append(esc(k.description())).append("</th>");
        }
        h.append("</tr>");
        for (ContaminantFlushing c : r.contaminants()) {
            FlushingEstimate any = c.estimate(CleanupCriterion.EFFLUENT);
            h.append("<tr><td>").append(esc(c.contaminantName())).append("</td><td>")
                    .append(num(c.initialSoilMilligramsPerKg(), 4)).append("</td><td>")
                    .append(num(c.cleanupLevelMilligramsPerKg(), 4)).append("</td><td>")
                    .append(num(c.targetFraction(), 3)).append("</td><td title=\"").append(esc(c.kdBasis())).append("\">")
                    .append(num(c.kdLitresPerKg(), 4)).append("</td><td>").append(num(any.transport().retardation(), 4))
                    .append("</td><td>").append(num(any.transport().peclet(), 4)).append("</td><td>")
                    .append(num(any.wellMixedPoreVolumes(), 4)).append("</td>");
            for (CleanupCriterion k : CleanupCriterion.values()) {
                FlushingEstimate e = c.estimate(k);
                h.append("<td>").append(e.result().reachable() ? num(e.result().poreVolumes(), 4) : "not reached")
                        .append("</td>");
            }
            h.append("</tr>");
        }
        h.append("</table>\n");
        methodTable(h, r);
        if (!r.pushDown().isEmpty()) {
            h.append("<h4>Contamination pushed below the treated column</h4><table><tr><th>Contaminant</th>"
                    + "<th>Pore volumes flushed</th><th>Deepest below the column above the level (m)</th>"
                    + "<th>Still above the level at the end (m)</th></tr>");
            for (BelowLayerPush p : r.pushDown()) {
                h.append("<tr><td>").append(esc(p.contaminantName())).append("</td>");
                if (p.result() == null) {
                    h.append("<td colspan=\"3\">not available: ").append(esc(p.unavailableReason())).append("</td>");
                } else {
                    h.append("<td>").append(num(p.result().poreVolumesFlushed(), 4)).append("</td><td>")
                            .append(num(p.result().deepestBelowLayerMetres(), 3)).append("</td><td>")
                            .append(num(p.result().belowLayerAtEndMetres(), 3)).append("</td>");
                }
                h.append("</tr>");
            }
            h.append("</table>\n");
        }
        if (r.quantities() != null) {
            h.append("<h4>Flushing quantities</h4>");
            quantities(h, r.quantities().toQuantitySet());
        }
        h.append("<ul class=\"notes\">");
        for (String n : r.notes()) {
            h.append("<li>").append(esc(n)).append("</li>");
        }
        h.append("</ul>\n");
    }

    private static void methodTable(StringBuilder h, FlushingDesignResult r) {
        h.append("<h4>Pore volumes by solution (design method: ").append(esc(r.solutionMethod().toLowerCase(Locale.ROOT)))
                .append(")</h4><table><tr><th>Contaminant</th><th>Solution</th>");
        for (CleanupCriterion k : CleanupCriterion.values()) {
            h.append("<th>PV by ").append(esc(k.description())).append("</th>");
        }
        h.append("<th>Note</th></tr>");
        for (ContaminantFlushing c : r.contaminants()) {
            for (MethodEstimate m : c.methods()) {
                h.append("<tr><td>").append(esc(c.contaminantName())).append("</td><td>").append(esc(m.method().label()))
                        .append(m.method() == c.governingMethod() ? " (governs)" : "").append("</td>");
                for (CleanupCriterion k : CleanupCriterion.values()) {
                    PoreVolumeResult x = m.result(k);
                    h.append("<td>").append(x == null ? "\u2013" : x.reachable() ? num(x.poreVolumes(), 4) : "not reached")
                            .append("</td>");
                }
                String note = m.available() ? "" : "not available: " + m.unavailableReason();
                if (m.method() == FlushingMethod.TWO_REGION && c.twoRegion() != null) {
                    note = "beta " + num(c.twoRegion().beta(), 4) + ", omega " + num(c.twoRegion().omega(), 4) + "; "
                            + c.twoRegion().rebound().describe();
                }
                if (m.method() == FlushingMethod.NUMERICAL && c.numerical() != null) {
                    note = c.numerical().cellCount() + " cells, " + c.numerical().acceptedSteps()
                            + " steps, mass-balance error " + num(c.numerical().massBalanceRelativeError(), 2);
                }
                h.append("<td>").append(esc(note)).append("</td></tr>");
            }
        }
        h.append("</table>\n");
    }

    private static void quantities(StringBuilder h, QuantitySet q) {
        h.append("<table><tr><th>Quantity</th><th>Amount</th><th>Unit</th><th>Source</th></tr>");
        for (Quantity x : q.all()) {
            h.append("<tr><td>").append(esc(x.name())).append("</td><td>").append(num(x.amount(), 5)).append("</td><td>")
                    .append(esc(x.unit().symbol())).append("</td><td>").append(esc(x.source())).append("</td></tr>");
        }
        h.append("</table>\n");
    }

    private static void zones(StringBuilder h, ZoneAnalysis z) {
        h.append("<section><h2>Zone above the cleanup level from the samples</h2>");
        if (!z.available()) {
            h.append("<p>Not available: ").append(esc(z.unavailableReason())).append(".</p></section>\n");
            return;
        }
        h.append("<p>").append(esc(z.estimator().label())).append(" on ").append(esc(z.blockModelBasis())).append(".</p>");
        h.append("<p>").append(esc(z.exceedance().description())).append("</p>");
        h.append("<table><tr><th>Contaminant</th><th>Cleanup level (mg/kg)</th><th>Samples</th><th>Non-detects</th>"
                + "<th>Highest sample (mg/kg)</th><th>Blocks above</th><th>Volume above (m\u00b3)</th><th>Variogram</th></tr>");
        for (ContaminantZone c : z.contaminants()) {
            h.append("<tr><td>").append(esc(c.contaminantName())).append("</td><td>")
                    .append(num(c.cleanupLevelMilligramsPerKg(), 4)).append("</td><td>").append(c.sampleCount())
                    .append("</td><td>").append(c.nonDetectCount()).append("</td><td>")
                    .append(num(c.maxSampleMilligramsPerKg(), 4)).append("</td><td>").append(c.exceedance().blockCount())
                    .append("</td><td>").append(num(c.exceedance().volumeCubicMetres(), 4)).append("</td><td>")
                    .append(esc(c.variogramBasis().isEmpty() ? "\u2013" : c.variogramBasis())).append("</td></tr>");
        }
        h.append("</table>");
        if (z.proposedZone() != null) {
            h.append(String.format(Locale.ROOT, "<p>Proposed treatment zone: %s m\u00b2 from %s to %s m deep, %s m\u00b3 (%s).</p>",
                    num(z.proposedZone().footprint().areaSquareMetres(), 4), num(z.proposedZone().topDepthMetres(), 3),
                    num(z.proposedZone().bottomDepthMetres(), 3), num(z.proposedZone().volumeCubicMetres(), 4),
                    esc(z.proposedZone().basis())));
        }
        h.append("<table><tr><th>Entered zone</th><th>Volume (m\u00b3)</th><th>Estimated above, inside (m\u00b3)</th>"
                + "<th>Estimated above, outside (m\u00b3)</th><th>Assessment</th></tr>");
        for (EnteredZoneComparison e : z.enteredZones()) {
            h.append("<tr><td>").append(esc(e.zoneName())).append("</td><td>").append(num(e.enteredVolumeCubicMetres(), 4))
                    .append("</td><td>").append(num(e.estimatedInsideCubicMetres(), 4)).append("</td><td>")
                    .append(num(e.estimatedOutsideCubicMetres(), 4)).append("</td><td>").append(esc(e.assessment()))
                    .append("</td></tr>");
        }
        h.append("</table><ul class=\"notes\">");
        z.notes().forEach(n -> h.append("<li>").append(esc(n)).append("</li>"));
        h.append("</ul></section>\n");
    }

    private static void enlargements(StringBuilder h, DesignRun run) {
        h.append("<section><h2>Enlargement by dispersion while the remedy waits</h2><p>").append(esc(ZoneEnlargement.METHOD))
                .append(".</p>");
        for (ZoneEnlargement e : run.enlargements()) {
            h.append("<h3>Zone ").append(esc(e.zoneName())).append("</h3>");
            if (!e.available()) {
                h.append("<p>Not available: ").append(esc(e.unavailableReason())).append(".</p>");
                continue;
            }
            h.append("<p>Source: ").append(esc(e.sourceBasis())).append(", ").append(num(e.sourceVolumeCubicMetres(), 4))
                    .append(" m\u00b3.</p>");
            h.append("<table><tr><th>Contaminant</th><th>Delay (years)</th><th>Volume above the level (m\u00b3)</th>"
                    + "<th>Ratio to the source</th><th>Peak C/C0</th><th>Plan growth (m)</th><th>Top (m)</th><th>Bottom (m)</th></tr>");
            for (ContaminantSpreading s : e.contaminants()) {
                for (EnlargementPoint p : s.curve()) {
                    point(h, s.contaminantName(), p);
                }
            }
            for (EnlargementPoint p : e.envelope()) {
                point(h, "envelope", p);
            }
            h.append("</table><ul class=\"notes\">");
            e.notes().forEach(n -> h.append("<li>").append(esc(n)).append("</li>"));
            h.append("</ul>");
        }
        h.append("</section>\n");
    }

    private static void point(StringBuilder h, String name, EnlargementPoint p) {
        h.append("<tr><td>").append(esc(name)).append("</td><td>").append(num(p.delayYears(), 3)).append("</td><td>")
                .append(num(p.volumeAboveLevelCubicMetres(), 4)).append("</td><td>").append(num(p.ratio(), 3))
                .append("</td><td>").append(num(p.peakFraction(), 3)).append("</td><td>").append(num(p.planGrowthMetres(), 3))
                .append("</td><td>").append(num(p.topDepthMetres(), 3)).append("</td><td>")
                .append(num(p.bottomDepthMetres(), 3)).append("</td></tr>");
    }

    private static void excavations(StringBuilder h, DesignRun run) {
        if (run.excavations().isEmpty()) {
            return;
        }
        h.append("<section><h2>Excavation quantities</h2>");
        for (ExcavationResult x : run.excavations()) {
            h.append("<h3>Excavation design: ").append(esc(x.designName())).append(" (zone ").append(esc(x.zoneName()))
                    .append(")</h3><p>Outline: ").append(esc(x.footprintBasis())).append(". Side slope: ")
                    .append(esc(x.slopeBasis())).append(". Soil: ").append(esc(x.soilBasis())).append(".</p>");
            quantities(h, x.quantities().toQuantitySet());
            h.append("<ul class=\"notes\">");
            for (Caution c : x.quantities().cautions()) {
                h.append("<li><b>Caution:</b> ").append(esc(c.text())).append("</li>");
            }
            x.quantities().assumptions().forEach(n -> h.append("<li>").append(esc(n)).append("</li>"));
            x.notes().forEach(n -> h.append("<li>").append(esc(n)).append("</li>"));
            h.append("</ul>");
        }
        h.append("</section>\n");
    }

    private static void alternatives(StringBuilder h, DesignRun run) {
        h.append("<section><h2>Alternatives side by side</h2><table><tr><th>Alternative</th><th>Capital</th>"
                + "<th>Annual O&amp;M</th><th>Operating years</th><th>Present value</th><th>Range (low to high)</th>"
                + "<th>Duration (calendar days)</th><th>Price book</th></tr>");
        for (AlternativeResult a : run.alternatives()) {
            h.append("<tr><td>").append(esc(a.name())).append(a.name().equals(run.lowestPresentValue()) ? " (lowest)" : "")
                    .append("</td>");
            if (!a.available()) {
                h.append("<td colspan=\"7\">not available: ").append(esc(a.unavailableReason())).append("</td></tr>");
                continue;
            }
            CostEstimate e = a.estimate();
            h.append("<td>").append(money(e.capital().total().amount(), e.currency())).append("</td><td>")
                    .append(money(e.annual().total().amount(), e.currency())).append("</td><td>").append(e.operatingYears())
                    .append("</td><td>").append(money(e.presentValue().amount(), e.currency())).append("</td><td>")
                    .append(money(e.presentValueLow().amount(), e.currency())).append(" to ")
                    .append(money(e.presentValueHigh().amount(), e.currency())).append("</td><td>")
                    .append(Double.isNaN(a.durationCalendarDays()) ? "not estimated" : num(a.durationCalendarDays(), 4))
                    .append("</td><td>").append(esc(a.priceBookName())).append(a.inventedRates() ? " (INVENTED rates)" : "")
                    .append("</td></tr>");
        }
        h.append("</table>");
        for (AlternativeResult a : run.alternatives()) {
            if (!a.available()) {
                continue;
            }
            CostEstimate e = a.estimate();
            h.append("<h3>").append(esc(a.name())).append("</h3><p>").append(esc(a.basis())).append(".</p>");
            h.append("<table><tr><th>Cost</th><th>Quantity</th><th>Amount</th><th>Unit</th><th>Rate</th><th>Cost ("
                    + esc(e.currency()) + ")</th><th>Quantity source</th></tr>");
            for (LineItem l : e.lines()) {
                h.append("<tr><td>").append(esc(l.spec().category().name().toLowerCase(Locale.ROOT).replace('_', ' ')))
                        .append(": ").append(esc(l.item().description())).append(l.item().invented() ? " (invented)" : "")
                        .append("</td><td>").append(esc(l.quantity().name())).append("</td><td>")
                        .append(num(l.quantity().amount(), 5)).append("</td><td>").append(esc(l.quantity().unit().symbol()))
                        .append("</td><td>").append(num(l.item().ratePerUnit(), 5)).append("</td><td>")
                        .append(num(l.cost().amount(), 6)).append("</td><td>").append(esc(l.quantity().source()))
                        .append("</td></tr>");
            }
            h.append("</table><ul class=\"notes\">");
            // the trace after its per-line entries (shown in the table): markups, present value, accuracy, cautions
            java.util.List<String> trace = e.trace();
            for (String t : trace.subList(Math.min(trace.size(), 1 + e.lines().size()), trace.size())) {
                h.append("<li>").append(esc(t)).append("</li>");
            }
            a.unpriced().forEach(u -> h.append("<li>Not priced: ").append(esc(u)).append("</li>"));
            a.notes().forEach(n -> h.append("<li>").append(esc(n)).append("</li>"));
            h.append("</ul>");
        }
        h.append("<h3>Cost of delay</h3><table><tr><th>Alternative</th><th>Delay (years)</th>"
                + "<th>Present value at the start of work</th><th>Present value today</th><th>Increase today</th></tr>");
        for (CostOfDelayResult c : run.costOfDelay()) {
            if (!c.available()) {
                h.append("<tr><td>").append(esc(c.alternativeName())).append("</td><td colspan=\"4\">not available: ")
                        .append(esc(c.unavailableReason())).append("</td></tr>");
                continue;
            }
            String cur = c.costOfDelay().baseline().estimate().currency();
            for (CostOfDelay.Point p : c.points()) {
                h.append("<tr><td>").append(esc(c.alternativeName())).append("</td><td>").append(num(p.delayYears(), 3))
                        .append("</td><td>").append(money(p.presentValueAtStartOfWork().amount(), cur)).append("</td><td>")
                        .append(money(p.presentValueToday().amount(), cur)).append("</td><td>")
                        .append(money(p.increaseToday().amount(), cur)).append("</td></tr>");
            }
        }
        h.append("</table></section>\n");
    }

    private static String money(double amount, String currency) {
        return esc(String.format(Locale.ROOT, "%,.0f %s", amount, currency));
    }

    private static void card(StringBuilder h, String label, String value, String unit) {
        h.append("<div class=\"card\"><div class=\"label\">").append(esc(label)).append("</div><div class=\"value\">")
                .append(esc(value)).append(" <span class=\"unit\">").append(esc(unit)).append("</span></div></div>");
    }

    private static void inputs(StringBuilder h, Project p) {
        h.append("<section><h2>Inputs as used</h2>");
        h.append("<p>").append(esc(p.getDescription())).append("</p>");
        h.append("<h3>Soil layers</h3><table><tr><th>Layer</th><th>Top (m)</th><th>Bottom (m)</th><th>Texture</th>"
                + "<th>Bulk density (kg/m\u00b3)</th><th>Porosity</th><th>Water content</th><th>foc</th>"
                + "<th>Ks (m/d)</th><th>Dispersivity (m)</th></tr>");
        for (SoilLayer l : p.getSite().getLayers()) {
            h.append("<tr><td>").append(esc(l.getName())).append("</td><td>").append(num(l.getTopDepthMetres(), 4))
                    .append("</td><td>").append(num(l.getBottomDepthMetres(), 4)).append("</td><td>")
                    .append(esc(l.getTextureClass())).append("</td><td>").append(num(l.getBulkDensityKgPerCubicMetre(), 4))
                    .append("</td><td>").append(num(l.getPorosity(), 3)).append("</td><td>")
                    .append(num(l.getWaterContent(), 3)).append("</td><td>").append(num(l.getOrganicCarbonFraction(), 3))
                    .append("</td><td>").append(num(l.getSaturatedConductivityMetresPerDay(), 3)).append("</td><td>")
                    .append(num(l.getDispersivityMetres(), 3)).append("</td></tr>");
        }
        h.append("</table><h3>Contaminants</h3><table><tr><th>Name</th><th>CAS</th><th>Koc (L/kg)</th><th>Kd (L/kg)</th>"
                + "<th>D0 (m\u00b2/s)</th><th>Half-life (d)</th></tr>");
        for (Contaminant c : p.getContaminants()) {
            h.append("<tr><td>").append(esc(c.getName())).append("</td><td>").append(esc(c.getCasNumber()))
                    .append("</td><td>").append(num(c.getKocLitresPerKg(), 4)).append("</td><td>")
                    .append(c.isKdEntered() ? num(c.getKdLitresPerKg(), 4) : "from Koc").append("</td><td>")
                    .append(num(c.getDiffusionSquareMetresPerSecond(), 3)).append("</td><td>")
                    .append(c.getHalfLifeDays() > 0 ? num(c.getHalfLifeDays(), 4) : "no decay").append("</td></tr>");
        }
        h.append("</table><h3>Cleanup levels</h3><table><tr><th>Contaminant</th><th>Soil (mg/kg)</th><th>Basis</th></tr>");
        for (CleanupLevel c : p.getCleanupLevels()) {
            h.append("<tr><td>").append(esc(c.getContaminant() == null ? "?" : c.getContaminant().getName()))
                    .append("</td><td>").append(num(c.getSoilLevelMilligramsPerKg(), 4)).append("</td><td>")
                    .append(esc(c.getBasis())).append("</td></tr>");
        }
        h.append("</table><h3>Treatment zones</h3><table><tr><th>Zone</th><th>Area (m\u00b2)</th><th>Top (m)</th>"
                + "<th>Bottom (m)</th><th>Source concentrations (mg/kg)</th></tr>");
        for (TreatmentZone z : p.getSite().getZones()) {
            StringBuilder src = new StringBuilder();
            for (SourceConcentration s : z.getSourceConcentrations()) {
                if (src.length() > 0) {
                    src.append("; ");
                }
                src.append(s.getContaminant() == null ? "?" : s.getContaminant().getName()).append(' ')
                        .append(num(s.getSoilConcentrationMilligramsPerKg(), 4));
            }
            h.append("<tr><td>").append(esc(z.getName())).append("</td><td>").append(num(z.getAreaSquareMetres(), 4))
                    .append("</td><td>").append(num(z.getTopDepthMetres(), 4)).append("</td><td>")
                    .append(num(z.getBottomDepthMetres(), 4)).append("</td><td>").append(esc(src.toString()))
                    .append("</td></tr>");
        }
        h.append("</table><h3>Flushing designs</h3><table><tr><th>Design</th><th>Zone</th><th>Darcy flux (m/d)</th>"
                + "<th>Operating days per week</th><th>Capture efficiency</th><th>Criterion</th><th>Pore-volume limit</th></tr>");
        for (FlushingDesign d : p.getFlushingDesigns()) {
            h.append("<tr><td>").append(esc(d.getName())).append("</td><td>")
                    .append(esc(d.getZone() == null ? "?" : d.getZone().getName())).append("</td><td>")
                    .append(num(d.getDarcyFluxMetresPerDay(), 4)).append("</td><td>")
                    .append(num(d.getOperatingDaysPerWeek(), 3)).append("</td><td>")
                    .append(num(d.getCaptureEfficiency(), 3)).append("</td><td>")
                    .append(esc(CleanupCriterion.valueOf(d.getCriterion().getName()).description())).append("</td><td>")
                    .append(num(d.getMaxPoreVolumes(), 4)).append("</td></tr>");
        }
        h.append("</table></section>\n");
    }

    private static final String CSS = """
            body { font-family: 'DejaVu Sans', Arial, sans-serif; color: #1d2a33; max-width: 1100px; margin: 2em auto; padding: 0 1em; line-height: 1.45; }
            header { border-bottom: 3px solid #2f6f73; margin-bottom: 1em; }
            h1 { margin-bottom: 0.1em; color: #22474a; } h2 { color: #2f6f73; border-bottom: 1px solid #c9d6d6; padding-bottom: 0.2em; }
            .sub { color: #5b6b73; margin: 0.2em 0; font-size: 0.9em; }
            .cautions { background: #fff6e5; border-left: 5px solid #d08a1a; padding: 0.3em 1em; }
            table { border-collapse: collapse; margin: 0.6em 0 1.2em; font-size: 0.9em; }
            th, td { border: 1px solid #c9d6d6; padding: 0.25em 0.6em; text-align: right; vertical-align: top; }
            th { background: #e8f0f0; text-align: center; } td:first-child { text-align: left; }
            .headline { display: flex; flex-wrap: wrap; gap: 0.8em; margin: 0.6em 0; }
            .card { border: 1px solid #c9d6d6; border-radius: 6px; padding: 0.5em 0.9em; min-width: 12em; background: #f6fafa; }
            .card .label { font-size: 0.8em; color: #5b6b73; } .card .value { font-size: 1.4em; font-weight: bold; color: #22474a; }
            .unit { font-size: 0.6em; font-weight: normal; color: #5b6b73; }
            .notes { font-size: 0.9em; color: #3b4b53; } footer { margin-top: 2em; font-size: 0.85em; color: #5b6b73; }
            """;
}
