package eluvia.report.document;

import java.util.ArrayList;
import java.util.List;

/**
 * A paragraph of plain text with simple emphasis, as a list of {@link TextRun}s.
 * {@link #of(String)} takes text as it is; {@link #marked(String)} reads a light mark-up in which
 * {@code *words*} are emphasised (italic), {@code **words**} are strong (bold) and {@code \*} is a
 * literal asterisk.
 *
 * @param runs the runs in reading order (at least one, not all white space)
 */
public record Paragraph(List<TextRun> runs) implements Block {

    public Paragraph {
        ReportContentException.requireNonNull("runs of a paragraph", runs);
        runs = List.copyOf(runs);
        if (runs.isEmpty() || runs.stream().allMatch(r -> r.text().isBlank())) {
            throw new ReportContentException("paragraph", runs.isEmpty() ? "empty" : "only white space",
                    "at least one run with visible text", null);
        }
    }

    /** A paragraph of plain text, taken literally (asterisks stay asterisks). */
    public static Paragraph of(String plainText) {
        ReportContentException.requireText("paragraph text", plainText);
        return new Paragraph(List.of(new TextRun(plainText, Emphasis.PLAIN)));
    }

    /**
     * A paragraph from text with light mark-up: {@code *emphasis*}, {@code **strong**}, {@code \*}
     * for a literal asterisk. Emphasis does not nest.
     *
     * @throws ReportContentException if a marker is not closed, or strong and emphasis overlap
     */
    public static Paragraph marked(String markedText) {
        ReportContentException.requireText("paragraph text", markedText);
        List<TextRun> runs = new ArrayList<>();
        StringBuilder current = new StringBuilder();
        Emphasis open = Emphasis.PLAIN;
        int i = 0;
        while (i < markedText.length()) {
            char c = markedText.charAt(i);
            if (c == '\\' && i + 1 < markedText.length() && markedText.charAt(i + 1) == '*') {
                current.append('*');
                i += 2;
                continue;
            }
            if (c != '*') {
                current.append(c);
                i++;
                continue;
            }
            boolean doubled = i + 1 < markedText.length() && markedText.charAt(i + 1) == '*';
            Emphasis marker = doubled ? Emphasis.STRONG : Emphasis.EMPHASIS;
            if (open == Emphasis.PLAIN) {
                flush(runs, current, open);
                open = marker;
            } else if (open == marker) {
                if (current.isEmpty()) {
                    throw unbalanced(markedText, "an empty " + marker.name().toLowerCase() + " span at character " + (i + 1));
                }
                flush(runs, current, open);
                open = Emphasis.PLAIN;
            } else {
                throw unbalanced(markedText, "a " + marker.name().toLowerCase() + " marker at character " + (i + 1)
                        + " inside " + open.name().toLowerCase());
            }
            i += doubled ? 2 : 1;
        }
        if (open != Emphasis.PLAIN) {
            throw unbalanced(markedText, "a " + open.name().toLowerCase() + " span that is not closed");
        }
        flush(runs, current, Emphasis.PLAIN);
        return new Paragraph(runs);
    }

    /** The text without emphasis. */
    public String plainText() {
        StringBuilder b = new StringBuilder();
        for (TextRun r : runs) {
            b.append(r.text());
        }
        return b.toString();
    }

    private static void flush(List<TextRun> runs, StringBuilder current, Emphasis emphasis) {
        if (!current.isEmpty()) {
            runs.add(new TextRun(current.toString(), emphasis));
            current.setLength(0);
        }
    }

    private static ReportContentException unbalanced(String text, String what) {
        return new ReportContentException("marked paragraph \"" + text + "\"", "unbalanced: " + what,
                "*emphasis* and **strong** in matching pairs, not nested",
                "close every marker, or write \\* for a literal asterisk");
    }
}
