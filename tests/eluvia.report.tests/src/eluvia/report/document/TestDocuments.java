package eluvia.report.document;

import java.time.LocalDate;
import java.util.ArrayList;
import java.util.List;

import eluvia.report.chart.Axis;
import eluvia.report.chart.LineChart;
import eluvia.report.chart.Marker;
import eluvia.report.chart.Outline;
import eluvia.report.chart.PlanView;
import eluvia.report.chart.ValuePoint;
import eluvia.report.chart.XySeries;

/** Documents for the writer tests. Every number in them is invented. */
public final class TestDocuments {

    public static final String SHA = "0123456789abcdef0123456789abcdef0123456789abcdef0123456789abcdef";
    public static final DocumentMetadata META = new DocumentMetadata("Invented test site", "B (for review)",
            LocalDate.of(2026, 3, 14), "0.1.0.test", SHA);

    private TestDocuments() {
    }

    public static LineChart residualChart() {
        double[] pv = { 0, 2, 4, 6, 8, 10 };
        double[] c = new double[pv.length];
        for (int i = 0; i < pv.length; i++) {
            c[i] = Math.exp(-pv[i] / 2);
        }
        return LineChart.of(Axis.dimensionless("Pore volumes flushed"), Axis.dimensionless("Residual fraction C/C0"), true,
                new XySeries("Invented solute", pv, c)).withXMarkers(new Marker(9.2, "design"));
    }

    public static PlanView planChart() {
        return new PlanView("", new Axis("Easting", "m"), new Axis("Northing", "m"), new Axis("Soil concentration", "mg/kg"),
                List.of(new ValuePoint("S-1", 2, 3, 12), new ValuePoint("S-2", 8, 4, 0.8), new ValuePoint("S-3", 5, 9, 40)),
                List.of(new Outline("Zone A", new double[] { 3, 7, 7, 3 }, new double[] { 2, 2, 8, 8 })), true);
    }

    /** One block of every kind, with text that must be escaped in HTML. */
    public static Document everyBlock() {
        return Document.builder("Design package <test> & check", META)
                .subtitle("Subtitle of the invented scenario")
                .coverSignOff(SignOffBlock.licensedEngineer("Cover statement for the engineer of record."))
                .section("Summary & scope", 1,
                        Paragraph.marked("Flushing needs **14.2 pore volumes** for the *invented* solute."),
                        KeyFigures.of(new KeyFigure("Pore volumes to target", "14.2", "-", "P10 to P90: 11.0 to 19.5"),
                                new KeyFigure("Duration", "183", "d", null)),
                        Caution.of("Capture the flushed water", "Flushed water must be captured and treated."))
                .section("Inputs", 1, BulletList.of("Layer one: silty sand", "Layer two: clay < 1 m"),
                        Table.with(Column.text("Layer"), Column.number("Thickness", "m"), Column.number("Porosity", "-"))
                                .row("Silty sand", "2.40", "0.38").row("Clay <lens>", "0.60", "0.45")
                                .caption("Soil layers as used (invented).").build())
                .section("Results", 2, new Figure("residual-fraction", residualChart(), "Residual fraction against pore volumes."),
                        PageBreak.HINT, new Figure("plan-view", planChart(), "Plan view of the zone, to scale."))
                .section("Sign-off", 1, SignOffBlock.licensedEngineer("Body statement for the checker."))
                .build();
    }

    /** A cover, then {@code pages} short sections, each ended by a page-break hint but the last. */
    public static Document pagesApart(int pages) {
        Document.Builder b = Document.builder("Paged", META).coverSignOff(SignOffBlock.licensedEngineer("Sign here."));
        for (int i = 1; i <= pages; i++) {
            List<Block> blocks = new ArrayList<>();
            blocks.add(Paragraph.of("Text of section " + i + "."));
            if (i < pages) {
                blocks.add(PageBreak.HINT);
            }
            b.section(new Section("Section " + i, 1, blocks));
        }
        return b.build();
    }

    /** A table of {@code rows} rows labelled ..., too long for one page. */
    public static Document longTable(int rows) {
        Table.Builder t = Table.with(Column.text("Sample label"), Column.number("Depth", "m"),
                Column.number("Concentration", "mg/kg")).caption("Invented samples.");
        for (int i = 1; i <= rows; i++) {
            t.row(String.format("R-%03d", i), String.format("%.2f", 0.05 * i), String.format("%.1f", 3.0 * i));
        }
        return Document.builder("Long table", META).section("Samples", 1, t.build()).build();
    }
}
