package eluvia.app.cli;

/**
 * A bad command-line value: names the option, the value given and the allowed range. The command
 * prints the message and exits with code 2.
 */
final class OptionCheck extends RuntimeException {
    private static final long serialVersionUID = 1L;

    OptionCheck(String option, Object value, String allowed) {
        super("option " + option + ": " + value + " is not allowed; allowed: " + allowed);
    }

    static double positive(String option, double v) {
        if (!(v > 0) || Double.isInfinite(v)) {
            throw new OptionCheck(option, v, "a number greater than 0");
        }
        return v;
    }

    static double nonNegative(String option, double v) {
        if (!(v >= 0) || Double.isInfinite(v)) {
            throw new OptionCheck(option, v, "a number 0 or greater");
        }
        return v;
    }

    static double openUnit(String option, double v) {
        if (!(v > 0 && v < 1)) {
            throw new OptionCheck(option, v, "a fraction between 0 and 1, both excluded");
        }
        return v;
    }
}
