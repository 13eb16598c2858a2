package eluvia.report.pdf;

import java.awt.Color;
import java.util.ArrayDeque;
import java.util.Deque;
import java.util.List;

import com.lowagie.text.Element;
import com.lowagie.text.Phrase;
import com.lowagie.text.Rectangle;
import com.lowagie.text.pdf.BaseFont;
import com.lowagie.text.pdf.ColumnText;
import com.lowagie.text.pdf.PdfContentByte;
import com.lowagie.text.pdf.PdfDestination;
import com.lowagie.text.pdf.PdfOutline;
import com.lowagie.text.pdf.PdfPageEventHelper;
import com.lowagie.text.pdf.PdfTemplate;
import com.lowagie.text.pdf.PdfWriter;

import eluvia.report.chart.Palette;

/**
 * What every page but the cover carries: a running header (project name, document title, a rule)
 * and a footer (revision and date, "Page n of N", with N filled in when the document closes). Also
 * turns each section heading into a bookmark at the place it lands (headings carry a generic tag
 * "section:&lt;index&gt;").
 */
final class PageDecorations extends PdfPageEventHelper {

    static final String SECTION_TAG = "section:";

    private final String left;
    private final String right;
    private final String footerLeft;
    private final List<String> bookmarkTitles;
    private final List<Integer> bookmarkLevels;
    private final BaseFont font;
    private final Deque<PdfOutline> parents = new ArrayDeque<>();
    private final Deque<Integer> parentLevels = new ArrayDeque<>();
    private final int[] sectionPages;
    private PdfTemplate totalPages;

    PageDecorations(String projectName, String title, String footerLeft, List<String> bookmarkTitles,
            List<Integer> bookmarkLevels, BaseFont font) {
        this.left = PdfText.map(projectName);
        this.right = PdfText.map(title);
        this.footerLeft = PdfText.map(footerLeft);
        this.bookmarkTitles = bookmarkTitles;
        this.bookmarkLevels = bookmarkLevels;
        this.font = font;
        this.sectionPages = new int[bookmarkTitles.size()];
    }

    /** The page on which section {@code index} starts (1-based), or 0 if it has not been laid out. */
    int sectionPage(int index) {
        return sectionPages[index];
    }

    @Override
    public void onOpenDocument(PdfWriter writer, com.lowagie.text.Document document) {
        totalPages = writer.getDirectContent().createTemplate(40, 12);
    }

    @Override
    public void onEndPage(PdfWriter writer, com.lowagie.text.Document document) {
        int page = writer.getPageNumber();
        if (page == 1) {
            return; // the cover
        }
        PdfContentByte cb = writer.getDirectContent();
        float l = document.left();
        float r = document.right();
        float headerY = document.top() + 22;
        cb.saveState();
        text(cb, left, l, headerY, Element.ALIGN_LEFT, 8, Palette.MUTED);
        text(cb, right, r, headerY, Element.ALIGN_RIGHT, 8, Palette.MUTED);
        cb.setColorStroke(Palette.RULE);
        cb.setLineWidth(0.6f);
        cb.moveTo(l, headerY - 6);
        cb.lineTo(r, headerY - 6);
        cb.stroke();

        float footerY = document.bottom() - 28;
        cb.moveTo(l, footerY + 12);
        cb.lineTo(r, footerY + 12);
        cb.stroke();
        text(cb, footerLeft, l, footerY, Element.ALIGN_LEFT, 8, Palette.MUTED);
        String pageText = "Page " + page + " of ";
        float totalWidth = font.getWidthPoint("0000", 8);
        float pageTextWidth = font.getWidthPoint(pageText, 8);
        text(cb, pageText, r - totalWidth - pageTextWidth, footerY, Element.ALIGN_LEFT, 8, Palette.MUTED);
        cb.addTemplate(totalPages, r - totalWidth, footerY);
        cb.restoreState();
    }

    @Override
    public void onCloseDocument(PdfWriter writer, com.lowagie.text.Document document) {
        // called after the last page is closed: the page number is one past it
        int total = writer.getPageNumber() - 1;
        totalPages.beginText();
        totalPages.setFontAndSize(font, 8);
        totalPages.setColorFill(Palette.MUTED);
        totalPages.setTextMatrix(0, 0);
        totalPages.showText(Integer.toString(total));
        totalPages.endText();
    }

    @Override
    public void onGenericTag(PdfWriter writer, com.lowagie.text.Document document, Rectangle rect, String tag) {
        if (!tag.startsWith(SECTION_TAG)) {
            return;
        }
        int index = Integer.parseInt(tag.substring(SECTION_TAG.length()));
        if (sectionPages[index] != 0) {
            return; // a heading that wrapped onto two lines reports each line
        }
        sectionPages[index] = writer.getPageNumber();
        int level = bookmarkLevels.get(index);
        while (!parentLevels.isEmpty() && parentLevels.peek() >= level) {
            parentLevels.pop();
            parents.pop();
        }
        PdfOutline parent = parents.isEmpty() ? writer.getRootOutline() : parents.peek();
        PdfDestination where = new PdfDestination(PdfDestination.XYZ, rect.getLeft(), rect.getTop() + 14, 0);
        PdfOutline outline = new PdfOutline(parent, where, PdfText.map(bookmarkTitles.get(index)), level < 2);
        parents.push(outline);
        parentLevels.push(level);
    }

    private void text(PdfContentByte cb, String s, float x, float y, int align, float size, Color colour) {
        com.lowagie.text.Font f = new com.lowagie.text.Font(font, size, com.lowagie.text.Font.NORMAL, colour);
        ColumnText.showTextAligned(cb, align, new Phrase(s, f), x, y, 0);
    }
}
