package eluvia.report.document;

import java.util.List;

/**
 * The block a licensed engineer fills in by hand: a statement, then one blank line per field
 * (name, licence number, signature, date...). Renderers draw the fields as labelled blank lines,
 * never with a value in them.
 *
 * @param statement what the signature stands for
 * @param fields    the labels of the blank lines (1 to 10)
 */
public record SignOffBlock(String statement, List<String> fields) implements Block {

    /** The fields of {@link #licensedEngineer(String)}. */
    public static final List<String> ENGINEER_FIELDS = List.of("Name", "Licence number", "Signature", "Date");

    public SignOffBlock {
        ReportContentException.requireText("sign-off statement", statement);
        ReportContentException.requireNonNull("sign-off fields", fields);
        fields = List.copyOf(fields);
        if (fields.isEmpty() || fields.size() > 10) {
            throw new ReportContentException("number of sign-off fields", Integer.toString(fields.size()), "1 to 10", null);
        }
        for (String f : fields) {
            ReportContentException.requireText("sign-off field label", f);
        }
    }

    /** The block for the licensed engineer of record: name, licence number, signature and date. */
    public static SignOffBlock licensedEngineer(String statement) {
        return new SignOffBlock(statement, ENGINEER_FIELDS);
    }
}
