package eluvia.report.html;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.format.DateTimeFormatter;
import java.util.ArrayList;
import java.util.List;

import eluvia.report.chart.Charts;
import eluvia.report.chart.Palette;
import eluvia.report.document.Alignment;
import eluvia.report.document.Block;
import eluvia.report.document.BulletList;
import eluvia.report.document.Caution;
import eluvia.report.document.Column;
import eluvia.report.document.Document;
import eluvia.report.document.DocumentMetadata;
import eluvia.report.document.Figure;
import eluvia.report.document.KeyFigure;
import eluvia.report.document.KeyFigures;
import eluvia.report.document.PageBreak;
import eluvia.report.document.ReportContentException;
import eluvia.report.document.Paragraph;
import eluvia.report.document.Section;
import eluvia.report.document.SignOffBlock;
import eluvia.report.document.Table;
import eluvia.report.document.TextRun;
import eluvia.report.internal.Html;

/**
 * Writes a {@link Document} as one HTML page with its figures beside it: {@code index.html} (style
 * sheet inside, no scripts, no web fonts, nothing fetched from elsewhere), and for every figure
 * {@code <id>.png} (drawn at twice the layout size, sharp on screen and paper) and {@code <id>.csv}
 * (the numbers the figure shows, units in the header). The page prints on A4 with page breaks where
 * the document hints them.
 */
public final class HtmlDocumentWriter {

    /** The name of the page. */
    public static final String INDEX_HTML = "index.html";
    /** Layout width of a figure in CSS pixels; the PNG is {@link #PIXEL_SCALE} times as wide in pixels. */
    public static final int FIGURE_WIDTH_CSS_PX = 760;
    /** Layout height of a figure in CSS pixels; the PNG is {@link #PIXEL_SCALE} times as high in pixels. */
    public static final int FIGURE_HEIGHT_CSS_PX = 470;
    /** PNG pixels per CSS pixel, dimensionless. */
    public static final double PIXEL_SCALE = 2.0;

    private HtmlDocumentWriter() {
    }

    /**
     * Writes the page and the figure files into {@code outDir} (created if missing; files of the same
     * names are replaced).
     *
     * @return the files written: the page first, then a PNG and a CSV per figure in document order
     */
    public static List<Path> write(Document document, Path outDir) throws IOException {
        if (document == null || outDir == null) {
            throw new ReportContentException(document == null ? "document" : "output folder", "missing (null)",
                    "a document and a folder to write it to", null);
        }
        Files.createDirectories(outDir);
        List<Path> written = new ArrayList<>();
        Path page = outDir.resolve(INDEX_HTML);
        Files.writeString(page, html(document), StandardCharsets.UTF_8);
        written.add(page);
        for (Figure f : document.figures()) {
            Path png = outDir.resolve(f.id() + ".png");
            Files.write(png, Charts.png(f.chart(), (int) (FIGURE_WIDTH_CSS_PX * PIXEL_SCALE), (int) (FIGURE_HEIGHT_CSS_PX * PIXEL_SCALE),
                    PIXEL_SCALE));
            written.add(png);
            Path csv = outDir.resolve(f.id() + ".csv");
            Files.writeString(csv, f.chart().data().toCsv(), StandardCharsets.UTF_8);
            written.add(csv);
        }
        return written;
    }

    /** The text of {@code index.html} (the figure files are referenced, not written). */
    public static String html(Document d) {
        StringBuilder h = new StringBuilder(32_768);
        DocumentMetadata m = d.metadata();
        h.append("<!DOCTYPE html>\n<html lang=\"en\">\n<head>\n<meta charset=\"utf-8\">\n");
        h.append("<meta name=\"viewport\" content=\"width=device-width, initial-scale=1\">\n");
        h.append("<meta name=\"generator\" content=\"Eluvia ").append(esc(m.productVersion())).append("\">\n");
        h.append("<title>").append(esc(m.projectName())).append(" \u2013 ").append(esc(d.title())).append("</title>\n");
        h.append("<style>\n").append(css()).append("</style>\n</head>\n<body>\n");

        h.append("<header class=\"cover\">\n<p class=\"project\">").append(esc(m.projectName())).append("</p>\n");
        h.append("<h1>").append(esc(d.title())).append("</h1>\n");
        if (d.subtitle() != null) {
            h.append("<p class=\"subtitle\">").append(esc(d.subtitle())).append("</p>\n");
        }
        h.append("<dl class=\"meta\">\n");
        meta(h, "Project", m.projectName());
        meta(h, "Revision", m.revision());
        meta(h, "Date of issue", m.date().format(DateTimeFormatter.ISO_LOCAL_DATE));
        meta(h, "Written by", "Eluvia " + m.productVersion());
        if (m.projectSha256() != null) {
            h.append("<dt>Project file SHA-256</dt><dd><code>").append(m.projectSha256()).append("</code></dd>\n");
        }
        h.append("</dl>\n");
        if (d.coverSignOff() != null) {
            signOff(h, d.coverSignOff());
        }
        h.append("</header>\n");

        List<String> numbers = d.sectionNumbers();
        h.append("<nav class=\"contents\" aria-label=\"Contents\">\n<h2>Contents</h2>\n<ol>\n");
        for (int i = 0; i < d.sections().size(); i++) {
            Section s = d.sections().get(i);
            h.append("<li class=\"l").append(s.level()).append("\"><a href=\"#").append(anchor(numbers.get(i))).append("\">")
                    .append("<span class=\"num\">").append(numbers.get(i)).append("</span> ").append(esc(s.heading()))
                    .append("</a></li>\n");
        }
        h.append("</ol>\n</nav>\n<main>\n");

        int[] counters = new int[2]; // figures, tables
        for (int i = 0; i < d.sections().size(); i++) {
            Section s = d.sections().get(i);
            int level = s.level() + 1; // h1 is the title
            h.append("<section id=\"").append(anchor(numbers.get(i))).append("\" class=\"level").append(s.level())
                    .append("\">\n");
            h.append("<h").append(level).append("><span class=\"num\">").append(numbers.get(i)).append("</span> ")
                    .append(esc(s.heading())).append("</h").append(level).append(">\n");
            for (Block b : s.blocks()) {
                block(h, b, counters);
            }
            h.append("</section>\n");
        }
        h.append("</main>\n<footer>\n<p>").append(esc(m.projectName())).append(" \u00b7 ").append(esc(d.title()))
                .append(" \u00b7 revision ").append(esc(m.revision())).append(" \u00b7 ")
                .append(m.date().format(DateTimeFormatter.ISO_LOCAL_DATE)).append(" \u00b7 Eluvia ")
                .append(esc(m.productVersion())).append("</p>\n</footer>\n</body>\n</html>\n");
        return h.toString();
    }

    private static void block(StringBuilder h, Block b, int[] counters) {
        if (b instanceof Paragraph p) {
            h.append("<p>");
            runs(h, p);
            h.append("</p>\n");
        } else if (b instanceof BulletList l) {
            h.append("<ul>\n");
            for (Paragraph item : l.items()) {
                h.append("<li>");
                runs(h, item);
                h.append("</li>\n");
            }
            h.append("</ul>\n");
        } else if (b instanceof Table t) {
            table(h, t, ++counters[1]);
        } else if (b instanceof Figure f) {
            int n = ++counters[0];
            h.append("<figure id=\"figure-").append(f.id()).append("\">\n<img src=\"").append(f.id())
                    .append(".png\" width=\"").append(FIGURE_WIDTH_CSS_PX).append("\" height=\"").append(FIGURE_HEIGHT_CSS_PX)
                    .append("\" alt=\"Figure ").append(n).append(": ").append(esc(f.caption())).append("\">\n");
            h.append("<figcaption><span class=\"label\">Figure ").append(n).append(".</span> ").append(esc(f.caption()))
                    .append(" <a class=\"data\" href=\"").append(f.id()).append(".csv\">Data (CSV)</a></figcaption>\n");
            h.append("</figure>\n");
        } else if (b instanceof Caution c) {
            h.append("<aside class=\"caution\" role=\"note\">\n<p class=\"caution-title\">").append(esc(c.title()))
                    .append("</p>\n");
            for (Paragraph p : c.paragraphs()) {
                h.append("<p>");
                runs(h, p);
                h.append("</p>\n");
            }
            h.append("</aside>\n");
        } else if (b instanceof KeyFigures k) {
            h.append("<div class=\"key-figures\">\n");
            for (KeyFigure f : k.figures()) {
                h.append("<div class=\"card\"><p class=\"card-label\">").append(esc(f.label()))
                        .append("</p><p class=\"card-value\">").append(esc(f.value()));
                if (!f.printedUnit().isEmpty()) {
                    h.append(" <span class=\"unit\">").append(esc(f.printedUnit())).append("</span>");
                }
                h.append("</p>");
                if (f.note() != null) {
                    h.append("<p class=\"card-note\">").append(esc(f.note())).append("</p>");
                }
                h.append("</div>\n");
            }
            h.append("</div>\n");
        } else if (b instanceof SignOffBlock s) {
            signOff(h, s);
        } else if (b instanceof PageBreak) {
            h.append("<div class=\"page-break\" aria-hidden=\"true\"></div>\n");
        } else {
            throw new IllegalStateException("block kind without HTML: " + b.getClass().getName());
        }
    }

    private static void table(StringBuilder h, Table t, int number) {
        h.append("<div class=\"table-wrap\">\n<table>\n");
        if (t.caption() != null) {
            h.append("<caption><span class=\"label\">Table ").append(number).append(".</span> ").append(esc(t.caption()))
                    .append("</caption>\n");
        }
        h.append("<thead><tr>");
        for (Column c : t.columns()) {
            h.append("<th scope=\"col\"").append(alignClass(c.alignment())).append(">").append(esc(c.heading()));
            if (c.unit() != null) {
                h.append("<br><span class=\"unit\">(").append(esc(c.unit())).append(")</span>");
            }
            h.append("</th>");
        }
        h.append("</tr></thead>\n<tbody>\n");
        for (List<String> row : t.rows()) {
            h.append("<tr>");
            for (int i = 0; i < row.size(); i++) {
                h.append("<td").append(alignClass(t.columns().get(i).alignment())).append(">").append(esc(row.get(i)))
                        .append("</td>");
            }
            h.append("</tr>\n");
        }
        h.append("</tbody>\n</table>\n</div>\n");
    }

    private static void signOff(StringBuilder h, SignOffBlock s) {
        h.append("<section class=\"sign-off\">\n<p class=\"statement\">").append(esc(s.statement())).append("</p>\n<dl>\n");
        for (String field : s.fields()) {
            h.append("<div class=\"line\"><dt>").append(esc(field)).append("</dt><dd></dd></div>\n");
        }
        h.append("</dl>\n</section>\n");
    }

    private static void runs(StringBuilder h, Paragraph p) {
        for (TextRun r : p.runs()) {
            switch (r.emphasis()) {
            case PLAIN -> h.append(esc(r.text()));
            case EMPHASIS -> h.append("<em>").append(esc(r.text())).append("</em>");
            case STRONG -> h.append("<strong>").append(esc(r.text())).append("</strong>");
            }
        }
    }

    private static void meta(StringBuilder h, String term, String value) {
        h.append("<dt>").append(esc(term)).append("</dt><dd>").append(esc(value)).append("</dd>\n");
    }

    private static String alignClass(Alignment a) {
        return switch (a) {
        case LEFT -> "";
        case CENTRE -> " class=\"c\"";
        case RIGHT -> " class=\"r\"";
        };
    }

    private static String anchor(String number) {
        return "section-" + number.replace('.', '-');
    }

    /** Escapes text for element content and attribute values ({@link Html#esc}). */
    static String esc(String s) {
        return Html.esc(s);
    }

    /** The style sheet: the palette of the charts, a readable measure, tables with rules only, print on A4. */
    static String css() {
        String ink = Palette.hex(Palette.INK);
        String muted = Palette.hex(Palette.MUTED);
        String rule = Palette.hex(Palette.RULE);
        String tint = Palette.hex(Palette.TINT);
        String accent = Palette.hex(Palette.ACCENT);
        String accentTint = Palette.hex(Palette.ACCENT_TINT);
        String caution = Palette.hex(Palette.CAUTION);
        String cautionTint = Palette.hex(Palette.CAUTION_TINT);
        return String.join("\n",
                ":root { --ink: " + ink + "; --muted: " + muted + "; --rule: " + rule + "; --tint: " + tint
                        + "; --accent: " + accent + "; --accent-tint: " + accentTint + "; --caution: " + caution
                        + "; --caution-tint: " + cautionTint + "; }",
                "html { font-size: 16px; }",
                "body { margin: 0 auto; max-width: 52rem; padding: 2.5rem 1.5rem 3rem; color: var(--ink); background: #fff;",
                "  font-family: \"Segoe UI\", \"Helvetica Neue\", Helvetica, Arial, \"DejaVu Sans\", sans-serif;",
                "  line-height: 1.55; font-size: 1rem; }",
                "h1, h2, h3, h4 { line-height: 1.25; color: var(--ink); break-after: avoid; page-break-after: avoid; }",
                "h1 { font-size: 2rem; margin: 0.2rem 0 0.3rem; font-weight: 650; }",
                "h2 { font-size: 1.4rem; margin: 2.4rem 0 0.6rem; padding-bottom: 0.25rem; border-bottom: 2px solid var(--accent); }",
                "h3 { font-size: 1.15rem; margin: 1.8rem 0 0.5rem; }",
                "h4 { font-size: 1rem; margin: 1.4rem 0 0.4rem; }",
                ".num { color: var(--accent); margin-right: 0.35em; font-variant-numeric: tabular-nums; }",
                "p { margin: 0.5rem 0 0.8rem; }",
                "code { font-family: \"DejaVu Sans Mono\", Consolas, monospace; font-size: 0.85em; word-break: break-all; }",
                ".cover { border-bottom: 1px solid var(--rule); padding-bottom: 1.2rem; margin-bottom: 1.5rem; }",
                ".cover .project { text-transform: uppercase; letter-spacing: 0.08em; font-size: 0.8rem; color: var(--accent); margin: 0; font-weight: 600; }",
                ".subtitle { font-size: 1.15rem; color: var(--muted); margin-top: 0; }",
                "dl.meta { display: grid; grid-template-columns: max-content 1fr; gap: 0.2rem 1.2rem; font-size: 0.9rem; margin: 1.2rem 0; }",
                "dl.meta dt { color: var(--muted); }",
                "dl.meta dd { margin: 0; }",
                "nav.contents { background: var(--tint); padding: 0.8rem 1.2rem; border-radius: 4px; font-size: 0.92rem; }",
                "nav.contents h2 { font-size: 1rem; border: 0; margin: 0 0 0.4rem; padding: 0; }",
                "nav.contents ol { list-style: none; margin: 0; padding: 0; }",
                "nav.contents li.l2 { padding-left: 1.4rem; }",
                "nav.contents li.l3 { padding-left: 2.8rem; font-size: 0.95em; }",
                "nav.contents a { color: var(--ink); text-decoration: none; }",
                "nav.contents a:hover { text-decoration: underline; }",
                "ul { padding-left: 1.3rem; }",
                "li { margin: 0.2rem 0; }",
                ".table-wrap { overflow-x: auto; margin: 1rem 0 1.4rem; }",
                "table { border-collapse: collapse; width: 100%; font-size: 0.88rem; line-height: 1.35; font-variant-numeric: tabular-nums; }",
                "caption { caption-side: top; text-align: left; font-size: 0.9rem; color: var(--ink); padding-bottom: 0.4rem; }",
                ".label { font-weight: 650; color: var(--accent); }",
                "th { text-align: left; vertical-align: bottom; font-weight: 600; background: var(--accent-tint);",
                "  border-bottom: 2px solid var(--accent); padding: 0.4rem 0.6rem; }",
                "td { padding: 0.3rem 0.6rem; border-bottom: 1px solid var(--rule); vertical-align: top; }",
                "tbody tr:nth-child(even) td { background: var(--tint); }",
                "th.r, td.r { text-align: right; }",
                "th.c, td.c { text-align: center; }",
                ".unit { font-weight: 400; color: var(--muted); font-size: 0.92em; }",
                "thead { display: table-header-group; }",
                "tr { break-inside: avoid; page-break-inside: avoid; }",
                "figure { margin: 1.2rem 0 1.6rem; break-inside: avoid; page-break-inside: avoid; }",
                "figure img { display: block; width: 100%; height: auto; border: 1px solid var(--rule); }",
                "figcaption { font-size: 0.9rem; margin-top: 0.4rem; }",
                "figcaption a.data { font-size: 0.85em; color: var(--accent); margin-left: 0.4em; white-space: nowrap; }",
                "aside.caution { border-left: 5px solid var(--caution); background: var(--caution-tint); padding: 0.6rem 1rem;",
                "  margin: 1rem 0; border-radius: 0 4px 4px 0; break-inside: avoid; page-break-inside: avoid; }",
                "aside.caution p { margin: 0.3rem 0; }",
                ".caution-title { font-weight: 650; }",
                ".key-figures { display: grid; grid-template-columns: repeat(auto-fit, minmax(11rem, 1fr)); gap: 0.8rem; margin: 1rem 0 1.4rem; }",
                ".card { background: var(--accent-tint); border-radius: 4px; padding: 0.7rem 0.9rem; break-inside: avoid; }",
                ".card p { margin: 0; }",
                ".card-label { font-size: 0.8rem; color: var(--muted); }",
                ".card-value { font-size: 1.6rem; font-weight: 650; font-variant-numeric: tabular-nums; line-height: 1.3; }",
                ".card-value .unit { font-size: 0.95rem; font-weight: 400; }",
                ".card-note { font-size: 0.8rem; color: var(--muted); }",
                ".sign-off { border: 1px solid var(--rule); border-radius: 4px; padding: 0.8rem 1.2rem 1rem; margin: 1.2rem 0; break-inside: avoid; page-break-inside: avoid; }",
                ".sign-off .statement { margin-top: 0; }",
                ".sign-off dl { margin: 0; }",
                ".sign-off .line { display: grid; grid-template-columns: 9rem 1fr; align-items: end; min-height: 2.4rem; }",
                ".sign-off dt { color: var(--muted); font-size: 0.9rem; }",
                ".sign-off dd { margin: 0; border-bottom: 1px solid var(--ink); height: 1.6rem; }",
                ".page-break { break-before: page; page-break-before: always; }",
                "footer { margin-top: 3rem; padding-top: 0.6rem; border-top: 1px solid var(--rule); font-size: 0.8rem; color: var(--muted); }",
                "@page { size: A4; margin: 18mm 16mm 20mm; }",
                "@media print {",
                "  html { font-size: 10.5pt; }",
                "  body { max-width: none; padding: 0; }",
                "  nav.contents { background: none; padding: 0; }",
                "  a { color: inherit; text-decoration: none; }",
                "  figure img { border: 0; }",
                "  .cover { break-after: page; page-break-after: always; border: 0; }",
                "}",
                "");
    }
}
