package eluvia.report;

import static eluvia.report.internal.Html.esc;
import static eluvia.report.internal.Html.num;

import eluvia.design.ContaminantFlushing;
import eluvia.design.DesignRun;
import eluvia.design.FlushingDesignResult;
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
            { "Flux-averaged effluent", "Parker and van Genuchten (1984), Water Resour. Res. 20:866" }, };

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
        h.append("</table>\n<ul class=\"notes\">");
        for (String n : r.notes()) {
            h.append("<li>").append(esc(n)).append("</li>");
        }
        h.append("</ul>\n");
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
