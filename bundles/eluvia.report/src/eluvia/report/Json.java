package eluvia.report;

import java.util.Locale;

/**
 * A minimal streaming JSON writer (RFC 8259): objects, arrays, strings, numbers, booleans and
 * null. Non-finite numbers are written as null, since JSON has no NaN or infinity.
 */
public final class Json {
    private final StringBuilder out = new StringBuilder();
    private final boolean[] first = new boolean[64];
    private int depth;
    private boolean afterName;

    public Json beginObject() {
        value();
        out.append('{');
        first[++depth] = true;
        return this;
    }

    public Json endObject() {
        depth--;
        newline();
        out.append('}');
        return this;
    }

    public Json beginArray() {
        value();
        out.append('[');
        first[++depth] = true;
        return this;
    }

    public Json endArray() {
        depth--;
        newline();
        out.append(']');
        return this;
    }

    public Json name(String name) {
        separator();
        string(name);
        out.append(": ");
        afterName = true;
        return this;
    }

    public Json value(String s) {
        value();
        if (s == null) {
            out.append("null");
        } else {
            string(s);
        }
        return this;
    }

    public Json value(double d) {
        value();
        if (Double.isFinite(d)) {
            if (d == Math.rint(d) && Math.abs(d) < 1e15) {
                out.append((long) d);
            } else {
                out.append(String.format(Locale.ROOT, "%.10g", d).replaceFirst("0+(e|$)", "$1").replaceFirst("\\.(e|$)", "$1"));
            }
        } else {
            out.append("null");
        }
        return this;
    }

    public Json value(boolean b) {
        value();
        out.append(b);
        return this;
    }

    public Json nullValue() {
        value();
        out.append("null");
        return this;
    }

    public Json field(String name, String v) {
        return name(name).value(v);
    }

    public Json field(String name, double v) {
        return name(name).value(v);
    }

    public Json field(String name, boolean v) {
        return name(name).value(v);
    }

    @Override
    public String toString() {
        return out.toString() + "\n";
    }

    private void value() {
        if (afterName) {
            afterName = false;
            return;
        }
        if (depth > 0) {
            separator();
        }
    }

    private void separator() {
        if (!first[depth]) {
            out.append(',');
        }
        first[depth] = false;
        newline();
    }

    private void newline() {
        out.append('\n');
        for (int i = 0; i < depth; i++) {
            out.append("  ");
        }
    }

    private void string(String s) {
        out.append('"');
        for (int i = 0; i < s.length(); i++) {
            char c = s.charAt(i);
            switch (c) {
            case '"' -> out.append("\\\"");
            case '\\' -> out.append("\\\\");
            case '\n' -> out.append("\\n");
            case '\r' -> out.append("\\r");
            case '\t' -> out.append("\\t");
            default -> {
                if (c < 0x20) {
                    out.append(String.format("\\u%04x", (int) c));
                } else {
                    out.append(c);
                }
            }
            }
        }
        out.append('"');
    }
}
