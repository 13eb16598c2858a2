package eluvia.report.pdf;

import java.awt.Color;
import java.awt.Graphics2D;
import java.awt.geom.Rectangle2D;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.OutputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.format.DateTimeFormatter;
import java.util.ArrayList;
import java.util.List;

import com.lowagie.text.Chunk;
import com.lowagie.text.DocumentException;
import com.lowagie.text.Element;
import com.lowagie.text.Image;
import com.lowagie.text.ListItem;
import com.lowagie.text.PageSize;
import com.lowagie.text.Phrase;
import com.lowagie.text.Rectangle;
import com.lowagie.text.pdf.BaseFont;
import com.lowagie.text.pdf.PdfContentByte;
import com.lowagie.text.pdf.PdfPCell;
import com.lowagie.text.pdf.PdfPTable;
import com.lowagie.text.pdf.PdfTemplate;
import com.lowagie.text.pdf.PdfWriter;

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

/**
 * Writes a {@link Document} as an A4 PDF: a cover page (project, title, subtitle, metadata and the
 * sign-off block), a contents page with the page of every section, then the sections with numbered
 * headings, each page with a running header
 * (project name and title) and footer (revision, date, "Page n of N"). Tables split across pages
 * with their caption and header row repeated; figures are drawn as vector graphics (the chart is
 * painted through OpenPDF's {@code Graphics2D}), kept together with
 * their caption; chart text is drawn as glyph outlines of the font the chart was laid out with.
 * Headings become bookmarks. Body text uses the standard Helvetica fonts (nothing embedded);
 * characters they lack are mapped as {@link PdfText} says.
 */
public final class PdfDocumentWriter {

    /** Page margins in points (1/72 inch): about 20 mm at the sides, room for header and footer. */
    static final float MARGIN_SIDE_POINTS = 56f;
    static final float MARGIN_TOP_POINTS = 74f;
    static final float MARGIN_BOTTOM_POINTS = 68f;
    /** Height of a figure as a fraction of its width, dimensionless. */
    static final float FIGURE_ASPECT = 0.56f;
    /**
     * Page length per layout unit of a chart, dimensionless: charts are laid out larger than they are
     * printed so that their 10 to 11 point labels print near 8 points, a size below the body text.
     */
    static final float CHART_SCALE = 0.78f;
    /** Height of a row of the contents page, in points (fixed, so that the draft and the final layout agree). */
    static final float CONTENTS_ROW_POINTS = 17f;
    /** The least room below a heading for the start of its text, in points; less moves it to the next page. */
    static final float MIN_ROOM_POINTS = 48f;

    private final BaseFont regular;
    private final BaseFont bold;
    private final BaseFont italic;
    private com.lowagie.text.Document pdf;
    private PageDecorations decorations;
    private PdfWriter writer;
    private int figureCount;
    private int tableCount;

    private PdfDocumentWriter() {
        try {
            regular = BaseFont.createFont(BaseFont.HELVETICA, BaseFont.CP1252, BaseFont.NOT_EMBEDDED);
            bold = BaseFont.createFont(BaseFont.HELVETICA_BOLD, BaseFont.CP1252, BaseFont.NOT_EMBEDDED);
            italic = BaseFont.createFont(BaseFont.HELVETICA_OBLIQUE, BaseFont.CP1252, BaseFont.NOT_EMBEDDED);
        } catch (DocumentException | IOException e) {
            throw new IllegalStateException("the PDF standard fonts are missing from the PDF library", e);
        }
    }

    /** Writes the document to {@code file} (replaced if it exists). */
    public static void write(Document document, Path file) throws IOException {
        if (file == null) {
            throw new ReportContentException("PDF file", "missing (null)", "a path to write to", null);
        }
        Path parent = file.toAbsolutePath().getParent();
        if (parent != null) {
            Files.createDirectories(parent);
        }
        try (OutputStream out = Files.newOutputStream(file)) {
            write(document, out);
        }
    }

    /** The document as PDF bytes. */
    public static byte[] toBytes(Document document) {
        ByteArrayOutputStream out = new ByteArrayOutputStream(64 * 1024);
        try {
            write(document, out);
        } catch (IOException e) {
            throw new IllegalStateException("writing to memory failed", e);
        }
        return out.toByteArray();
    }

    /** Writes the document to {@code out} (not closed). */
    public static void write(Document document, OutputStream out) throws IOException {
        if (document == null || out == null) {
            throw new ReportContentException(document == null ? "document" : "output stream", "missing (null)",
                    "a document and a stream to write it to", null);
        }
        // The contents page lists the page of each section, known only once the sections are laid out:
        // lay the document out once with blank page numbers (the contents rows have a fixed height, so
        // the pages break the same way), then again with the numbers found.
        PdfDocumentWriter draft = new PdfDocumentWriter();
        draft.render(document, OutputStream.nullOutputStream(), null);
        int[] pages = new int[document.sections().size()];
        for (int i = 0; i < pages.length; i++) {
            pages[i] = draft.decorations.sectionPage(i);
        }
        new PdfDocumentWriter().render(document, out, pages);
    }

    private void render(Document d, OutputStream out, int[] sectionPages) throws IOException {
        DocumentMetadata m = d.metadata();
        pdf = new com.lowagie.text.Document(PageSize.A4, MARGIN_SIDE_POINTS, MARGIN_SIDE_POINTS, MARGIN_TOP_POINTS,
                MARGIN_BOTTOM_POINTS);
        List<String> numbers = d.sectionNumbers();
        List<String> titles = new ArrayList<>();
        List<Integer> levels = new ArrayList<>();
        for (int i = 0; i < d.sections().size(); i++) {
            titles.add(numbers.get(i) + "  " + d.sections().get(i).heading());
            levels.add(d.sections().get(i).level());
        }
        try {
            writer = PdfWriter.getInstance(pdf, out);
            writer.setCloseStream(false);
            writer.setViewerPreferences(PdfWriter.PageModeUseOutlines);
            decorations = new PageDecorations(m.projectName(), d.title(),
                    "Revision " + m.revision() + "  \u00b7  " + m.date().format(DateTimeFormatter.ISO_LOCAL_DATE),
                    titles, levels, regular);
            writer.setPageEvent(decorations);
            pdf.addTitle(PdfText.map(d.title()));
            pdf.addSubject(PdfText.map(m.projectName()));
            pdf.addCreator("Eluvia " + PdfText.map(m.productVersion()));
            if (m.projectSha256() != null) {
                pdf.addKeywords("project file SHA-256 " + m.projectSha256());
            }
            pdf.open();
            cover(d);
            pdf.newPage();
            contents(d, numbers, sectionPages);
            pdf.newPage();
            for (int i = 0; i < d.sections().size(); i++) {
                section(d.sections().get(i), numbers.get(i), i);
            }
            pdf.close();
        } catch (DocumentException e) {
            throw new IOException("the PDF could not be laid out: " + e.getMessage(), e);
        }
    }

    // --------------------------------------------------------------------------------------- cover

    private void cover(Document d) throws DocumentException {
        DocumentMetadata m = d.metadata();
        com.lowagie.text.Paragraph project = new com.lowagie.text.Paragraph(
                PdfText.map(m.projectName()).toUpperCase(java.util.Locale.ROOT), font(bold, 10, Palette.ACCENT));
        project.setSpacingBefore(70);
        pdf.add(project);
        com.lowagie.text.Paragraph title = new com.lowagie.text.Paragraph(PdfText.map(d.title()),
                font(bold, 26, Palette.INK));
        title.setLeading(31);
        title.setSpacingBefore(8);
        pdf.add(title);
        if (d.subtitle() != null) {
            com.lowagie.text.Paragraph sub = new com.lowagie.text.Paragraph(PdfText.map(d.subtitle()),
                    font(regular, 14, Palette.MUTED));
            sub.setLeading(19);
            sub.setSpacingBefore(6);
            pdf.add(sub);
        }
        PdfPTable rule = new PdfPTable(1);
        rule.setWidthPercentage(100);
        rule.setSpacingBefore(18);
        PdfPCell line = new PdfPCell();
        line.setBorder(Rectangle.TOP);
        line.setBorderColor(Palette.ACCENT);
        line.setBorderWidth(1.5f);
        line.setFixedHeight(4);
        rule.addCell(line);
        pdf.add(rule);

        PdfPTable meta = new PdfPTable(new float[] { 1.1f, 3f });
        meta.setWidthPercentage(100);
        meta.setSpacingBefore(6);
        metaRow(meta, "Project", m.projectName());
        metaRow(meta, "Revision", m.revision());
        metaRow(meta, "Date of issue", m.date().format(DateTimeFormatter.ISO_LOCAL_DATE));
        metaRow(meta, "Written by", "Eluvia " + m.productVersion());
        if (m.projectSha256() != null) {
            metaRow(meta, "Project file SHA-256", m.projectSha256());
        }
        pdf.add(meta);
        if (d.coverSignOff() != null) {
            PdfPTable signOff = signOffTable(d.coverSignOff());
            signOff.setSpacingBefore(60);
            pdf.add(signOff);
        }
    }

    private void metaRow(PdfPTable table, String label, String value) {
        PdfPCell l = new PdfPCell(new Phrase(label, font(regular, 9.5f, Palette.MUTED)));
        PdfPCell v = new PdfPCell(new Phrase(PdfText.map(value), font(regular, 9.5f, Palette.INK)));
        for (PdfPCell c : new PdfPCell[] { l, v }) {
            c.setBorder(Rectangle.NO_BORDER);
            c.setPaddingTop(3);
            c.setPaddingBottom(4);
            c.setPaddingLeft(0);
            table.addCell(c);
        }
    }

    // ------------------------------------------------------------------------------------ contents

    /** Section numbers, headings and pages; {@code pages} null for the draft (no numbers, same layout). */
    private void contents(Document d, List<String> numbers, int[] pages) throws DocumentException {
        com.lowagie.text.Paragraph h = new com.lowagie.text.Paragraph("Contents", font(bold, 15f, Palette.INK));
        h.setSpacingAfter(10);
        pdf.add(h);
        PdfPTable t = new PdfPTable(new float[] { 1f, 10f, 1.2f });
        t.setWidthPercentage(100);
        for (int i = 0; i < d.sections().size(); i++) {
            Section s = d.sections().get(i);
            BaseFont face = s.level() == 1 ? bold : regular;
            float size = s.level() == 1 ? 10f : 9.5f;
            PdfPCell number = new PdfPCell(new Phrase(numbers.get(i), font(face, size, Palette.ACCENT)));
            float indent = 4 + 14 * (s.level() - 1);
            float room = (pdf.right() - pdf.left()) * 10f / 12.2f - indent - 8;
            PdfPCell heading = new PdfPCell(new Phrase(fitted(PdfText.map(s.heading()), face, size, room),
                    font(face, size, Palette.INK)));
            heading.setPaddingLeft(indent);
            heading.setNoWrap(true);
            String page = pages == null || pages[i] == 0 ? "" : Integer.toString(pages[i]);
            PdfPCell pageCell = new PdfPCell(new Phrase(page, font(regular, size, Palette.INK)));
            pageCell.setHorizontalAlignment(Element.ALIGN_RIGHT);
            for (PdfPCell c : new PdfPCell[] { number, heading, pageCell }) {
                c.setBorder(s.level() == 1 ? Rectangle.TOP : Rectangle.NO_BORDER);
                c.setBorderColor(Palette.RULE);
                c.setBorderWidth(0.5f);
                c.setFixedHeight(CONTENTS_ROW_POINTS);
                c.setVerticalAlignment(Element.ALIGN_MIDDLE);
                t.addCell(c);
            }
        }
        pdf.add(t);
    }

    /** The text, shortened with an ellipsis if it is wider than {@code widthPoints} (rows of fixed height do not wrap). */
    private static String fitted(String text, BaseFont face, float size, float widthPoints) {
        if (face.getWidthPoint(text, size) <= widthPoints) {
            return text;
        }
        String t = text;
        while (t.length() > 1 && face.getWidthPoint(t + "\u2026", size) > widthPoints) {
            t = t.substring(0, t.length() - 1);
        }
        return t.stripTrailing() + "\u2026";
    }

    // ------------------------------------------------------------------------------------ sections

    private void section(Section s, String number, int index) throws DocumentException {
        float size = switch (s.level()) {
        case 1 -> 15f;
        case 2 -> 12f;
        default -> 10.5f;
        };
        float room = writer.getVerticalPosition(true) - pdf.bottom();
        if (room < size * 3 + roomForStartOf(s)) {
            pdf.newPage();
        }
        com.lowagie.text.Paragraph h = new com.lowagie.text.Paragraph();
        h.setLeading(size * 1.3f);
        h.setSpacingBefore(s.level() == 1 ? 12 : 8);
        h.setSpacingAfter(s.level() == 1 ? 6 : 4);
        Chunk num = new Chunk(number + "   ", font(bold, size, Palette.ACCENT));
        num.setGenericTag(PageDecorations.SECTION_TAG + index);
        h.add(num);
        h.add(new Chunk(PdfText.map(s.heading()), font(bold, size, Palette.INK)));
        h.setKeepTogether(true);
        pdf.add(h);
        if (s.level() == 1) {
            PdfPTable rule = new PdfPTable(1);
            rule.setWidthPercentage(100);
            rule.setSpacingBefore(5);
            PdfPCell line = new PdfPCell();
            line.setBorder(Rectangle.TOP);
            line.setBorderColor(Palette.ACCENT);
            line.setBorderWidth(1.0f);
            line.setFixedHeight(6);
            rule.addCell(line);
            pdf.add(rule);
        }
        for (Block b : s.blocks()) {
            block(b);
        }
    }

    /**
     * How much of a section's first block must fit below its heading, in points, so that the heading
     * is not left alone at the foot of a page: all of a block that is kept together (figure, key
     * figures, caution, sign-off), the start of anything else.
     */
    private float roomForStartOf(Section s) {
        if (s.blocks().isEmpty()) {
            return MIN_ROOM_POINTS;
        }
        Block first = s.blocks().get(0);
        if (first instanceof Figure) {
            return (pdf.right() - pdf.left()) * FIGURE_ASPECT + 50;
        } else if (first instanceof KeyFigures k) {
            return 75 * ((k.figures().size() + 2) / 3);
        } else if (first instanceof Caution c) {
            return 40 + 30 * c.paragraphs().size();
        } else if (first instanceof SignOffBlock so) {
            return 60 + 30 * so.fields().size();
        } else if (first instanceof Table) {
            return 90;
        }
        return MIN_ROOM_POINTS;
    }

    private void block(Block b) throws DocumentException {
        if (b instanceof Paragraph p) {
            com.lowagie.text.Paragraph para = paragraph(p, 10f);
            para.setSpacingAfter(6);
            pdf.add(para);
        } else if (b instanceof BulletList l) {
            com.lowagie.text.List list = new com.lowagie.text.List(false, 12f);
            list.setListSymbol(new Chunk("\u2022", font(regular, 10f, Palette.ACCENT)));
            for (Paragraph item : l.items()) {
                ListItem li = new ListItem(13.5f, "", font(regular, 10f, Palette.INK));
                for (TextRun r : item.runs()) {
                    li.add(run(r, 10f));
                }
                li.setSpacingAfter(2);
                list.add(li);
            }
            com.lowagie.text.Paragraph wrap = new com.lowagie.text.Paragraph();
            wrap.add(list);
            wrap.setSpacingAfter(6);
            pdf.add(wrap);
        } else if (b instanceof Table t) {
            pdf.add(table(t, ++tableCount));
        } else if (b instanceof Figure f) {
            pdf.add(figure(f, ++figureCount));
        } else if (b instanceof Caution c) {
            pdf.add(caution(c));
        } else if (b instanceof KeyFigures k) {
            pdf.add(keyFigures(k));
        } else if (b instanceof SignOffBlock s) {
            pdf.add(signOffTable(s));
        } else if (b instanceof PageBreak) {
            pdf.newPage();
        } else {
            throw new IllegalStateException("block kind without PDF layout: " + b.getClass().getName());
        }
    }

    private com.lowagie.text.Paragraph paragraph(Paragraph p, float size) {
        com.lowagie.text.Paragraph para = new com.lowagie.text.Paragraph();
        para.setLeading(size * 1.4f);
        for (TextRun r : p.runs()) {
            para.add(run(r, size));
        }
        return para;
    }

    private Chunk run(TextRun r, float size) {
        BaseFont f = switch (r.emphasis()) {
        case PLAIN -> regular;
        case EMPHASIS -> italic;
        case STRONG -> bold;
        };
        return new Chunk(PdfText.map(r.text()), font(f, size, Palette.INK));
    }

    // -------------------------------------------------------------------------------------- tables

    private PdfPTable table(Table t, int number) throws DocumentException {
        int n = t.columns().size();
        PdfPTable table = new PdfPTable(columnWeights(t));
        table.setWidthPercentage(100);
        table.setSpacingBefore(8);
        table.setSpacingAfter(12);
        table.setSplitLate(false);
        table.setSplitRows(true);
        int headerRows = 1;
        if (t.caption() != null) {
            Phrase cap = new Phrase();
            cap.add(new Chunk("Table " + number + ".  ", font(bold, 9f, Palette.ACCENT)));
            cap.add(new Chunk(PdfText.map(t.caption()), font(regular, 9f, Palette.INK)));
            PdfPCell c = new PdfPCell(cap);
            c.setColspan(n);
            c.setBorder(Rectangle.NO_BORDER);
            c.setPaddingLeft(0);
            c.setPaddingBottom(5);
            c.setLeading(0, 1.3f);
            table.addCell(c);
            headerRows = 2;
        }
        for (Column col : t.columns()) {
            Phrase head = new Phrase();
            head.setLeading(10.5f);
            head.add(new Chunk(PdfText.map(col.heading()), font(bold, 8.5f, Palette.INK)));
            if (col.unit() != null) {
                head.add(new Chunk("\n(" + PdfText.map(col.unit()) + ")", font(regular, 8f, Palette.MUTED)));
            }
            PdfPCell c = new PdfPCell(head);
            c.setHorizontalAlignment(align(col.alignment()));
            c.setVerticalAlignment(Element.ALIGN_BOTTOM);
            c.setBackgroundColor(Palette.ACCENT_TINT);
            c.setBorder(Rectangle.BOTTOM);
            c.setBorderColor(Palette.ACCENT);
            c.setBorderWidth(1.2f);
            c.setPadding(4);
            c.setPaddingBottom(5);
            table.addCell(c);
        }
        table.setHeaderRows(headerRows);
        for (int r = 0; r < t.rows().size(); r++) {
            List<String> row = t.rows().get(r);
            for (int i = 0; i < n; i++) {
                PdfPCell c = new PdfPCell(new Phrase(10.5f, PdfText.map(row.get(i)), font(regular, 8.5f, Palette.INK)));
                c.setPaddingLeft(6);
                c.setPaddingRight(6);
                c.setHorizontalAlignment(align(t.columns().get(i).alignment()));
                c.setBorder(Rectangle.BOTTOM);
                c.setBorderColor(Palette.RULE);
                c.setBorderWidth(0.5f);
                c.setPadding(4);
                c.setPaddingTop(3);
                if (r % 2 == 1) {
                    c.setBackgroundColor(Palette.TINT);
                }
                table.addCell(c);
            }
        }
        return table;
    }

    /** Relative column widths from the longest text in each column, limited to 4..36 characters. */
    private static float[] columnWeights(Table t) {
        float[] w = new float[t.columns().size()];
        for (int i = 0; i < w.length; i++) {
            Column c = t.columns().get(i);
            int longestWord = 0;
            for (String word : c.heading().split("\\s+")) {
                longestWord = Math.max(longestWord, word.length());
            }
            int longest = Math.max(longestWord, Math.min(c.heading().length(), 18));
            if (c.unit() != null) {
                longest = Math.max(longest, c.unit().length() + 2);
            }
            for (List<String> row : t.rows()) {
                longest = Math.max(longest, row.get(i).length());
            }
            w[i] = Math.max(4, Math.min(36, longest));
        }
        return w;
    }

    private static int align(Alignment a) {
        return switch (a) {
        case LEFT -> Element.ALIGN_LEFT;
        case CENTRE -> Element.ALIGN_CENTER;
        case RIGHT -> Element.ALIGN_RIGHT;
        };
    }

    // ------------------------------------------------------------------------------------- figures

    private PdfPTable figure(Figure f, int number) throws DocumentException {
        float width = pdf.right() - pdf.left();
        float height = width * FIGURE_ASPECT;
        PdfContentByte cb = writer.getDirectContent();
        PdfTemplate template = cb.createTemplate(width, height);
        // text as glyph outlines of the same font the chart was laid out with: PDF text in a standard font
        // would have other widths, and OpenPDF then stretches its letter spacing to fit
        Graphics2D g2 = template.createGraphicsShapes(width, height);
        try {
            g2.scale(CHART_SCALE, CHART_SCALE);
            Charts.draw(f.chart(), g2, new Rectangle2D.Double(0, 0, width / CHART_SCALE, height / CHART_SCALE));
        } finally {
            g2.dispose();
        }
        Image picture = Image.getInstance(template);
        PdfPTable holder = new PdfPTable(1);
        holder.setWidthPercentage(100);
        holder.setSpacingBefore(8);
        holder.setSpacingAfter(12);
        holder.setKeepTogether(true);
        PdfPCell pic = new PdfPCell(picture, true);
        pic.setBorder(Rectangle.NO_BORDER);
        pic.setPadding(0);
        holder.addCell(pic);
        Phrase cap = new Phrase();
        cap.add(new Chunk("Figure " + number + ".  ", font(bold, 9f, Palette.ACCENT)));
        cap.add(new Chunk(PdfText.map(f.caption()), font(regular, 9f, Palette.INK)));
        cap.add(new Chunk("  Data: " + f.id() + ".csv", font(italic, 8f, Palette.MUTED)));
        PdfPCell c = new PdfPCell(cap);
        c.setBorder(Rectangle.NO_BORDER);
        c.setPaddingLeft(0);
        c.setPaddingTop(4);
        c.setLeading(0, 1.3f);
        holder.addCell(c);
        return holder;
    }

    // ------------------------------------------------------------------------------ boxes and cards

    private PdfPTable caution(Caution c) {
        PdfPTable box = new PdfPTable(1);
        box.setWidthPercentage(100);
        box.setSpacingBefore(4);
        box.setSpacingAfter(8);
        box.setKeepTogether(true);
        PdfPCell cell = new PdfPCell();
        cell.setBackgroundColor(Palette.CAUTION_TINT);
        cell.setBorder(Rectangle.LEFT);
        cell.setBorderColorLeft(Palette.CAUTION);
        cell.setBorderWidthLeft(3.5f);
        cell.setPadding(9);
        cell.setPaddingLeft(12);
        com.lowagie.text.Paragraph title = new com.lowagie.text.Paragraph(PdfText.map(c.title()),
                font(bold, 9.5f, Palette.INK));
        title.setLeading(13);
        cell.addElement(title);
        for (Paragraph p : c.paragraphs()) {
            com.lowagie.text.Paragraph para = paragraph(p, 9.5f);
            para.setSpacingBefore(3);
            cell.addElement(para);
        }
        box.addCell(cell);
        return box;
    }

    private PdfPTable keyFigures(KeyFigures k) throws DocumentException {
        int columns = Math.min(k.figures().size(), k.figures().size() == 4 ? 4 : 3);
        PdfPTable cards = new PdfPTable(columns);
        cards.setWidthPercentage(100);
        cards.setSpacingBefore(6);
        cards.setSpacingAfter(10);
        cards.setKeepTogether(true);
        for (KeyFigure f : k.figures()) {
            PdfPCell cell = new PdfPCell();
            cell.setBackgroundColor(Palette.ACCENT_TINT);
            cell.setBorder(Rectangle.BOX);
            cell.setBorderColor(Color.WHITE);
            cell.setBorderWidth(3f);
            cell.setPadding(8);
            cell.setPaddingTop(6);
            com.lowagie.text.Paragraph label = new com.lowagie.text.Paragraph(PdfText.map(f.label()),
                    font(regular, 8f, Palette.MUTED));
            label.setLeading(10);
            cell.addElement(label);
            com.lowagie.text.Paragraph value = new com.lowagie.text.Paragraph();
            value.setLeading(21);
            value.add(new Chunk(PdfText.map(f.value()), font(bold, 16f, Palette.INK)));
            if (!f.printedUnit().isEmpty()) {
                value.add(new Chunk(" " + PdfText.map(f.printedUnit()), font(regular, 9.5f, Palette.INK)));
            }
            cell.addElement(value);
            if (f.note() != null) {
                com.lowagie.text.Paragraph note = new com.lowagie.text.Paragraph(PdfText.map(f.note()),
                        font(regular, 7.5f, Palette.MUTED));
                note.setLeading(9.5f);
                cell.addElement(note);
            }
            cards.addCell(cell);
        }
        int rest = (columns - k.figures().size() % columns) % columns;
        for (int i = 0; i < rest; i++) {
            PdfPCell empty = new PdfPCell();
            empty.setBorder(Rectangle.NO_BORDER);
            cards.addCell(empty);
        }
        return cards;
    }

    private PdfPTable signOffTable(SignOffBlock s) {
        PdfPTable inner = new PdfPTable(new float[] { 1.2f, 3.4f });
        inner.setWidthPercentage(100);
        PdfPCell statement = new PdfPCell(new Phrase(13f, PdfText.map(s.statement()), font(regular, 9.5f, Palette.INK)));
        statement.setColspan(2);
        statement.setBorder(Rectangle.NO_BORDER);
        statement.setPaddingLeft(0);
        statement.setPaddingBottom(6);
        inner.addCell(statement);
        for (String field : s.fields()) {
            PdfPCell label = new PdfPCell(new Phrase(PdfText.map(field), font(regular, 9f, Palette.MUTED)));
            label.setBorder(Rectangle.NO_BORDER);
            label.setVerticalAlignment(Element.ALIGN_BOTTOM);
            label.setFixedHeight(30);
            label.setPaddingLeft(0);
            inner.addCell(label);
            PdfPCell blank = new PdfPCell(new Phrase(" "));
            blank.setBorder(Rectangle.BOTTOM);
            blank.setBorderColor(Palette.INK);
            blank.setBorderWidth(0.75f);
            blank.setFixedHeight(30);
            inner.addCell(blank);
        }
        PdfPTable box = new PdfPTable(1);
        box.setWidthPercentage(100);
        box.setSpacingBefore(8);
        box.setSpacingAfter(10);
        box.setKeepTogether(true);
        PdfPCell frame = new PdfPCell(inner);
        frame.setBorder(Rectangle.BOX);
        frame.setBorderColor(Palette.RULE);
        frame.setBorderWidth(0.8f);
        frame.setPadding(12);
        frame.setPaddingBottom(16);
        box.addCell(frame);
        return box;
    }

    private static com.lowagie.text.Font font(BaseFont base, float size, Color colour) {
        return new com.lowagie.text.Font(base, size, com.lowagie.text.Font.NORMAL, colour);
    }
}
