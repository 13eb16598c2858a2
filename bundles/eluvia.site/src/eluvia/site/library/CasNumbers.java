package eluvia.site.library;

/**
 * CAS registry numbers: form {@code NNNNNNN-NN-N} (2 to 7 digits, 2 digits, a check digit). The
 * check digit is the sum of the other digits, each times its position counted from the right,
 * modulo 10 (the registry's published rule).
 */
public final class CasNumbers {

    private CasNumbers() {
    }

    /** True when the text is a CAS number with a correct check digit. */
    public static boolean isValid(String cas) {
        if (cas == null || !cas.matches("\\d{2,7}-\\d{2}-\\d")) {
            return false;
        }
        String digits = cas.replace("-", "");
        int check = digits.charAt(digits.length() - 1) - '0';
        int sum = 0;
        for (int i = digits.length() - 2, position = 1; i >= 0; i--, position++) {
            sum += (digits.charAt(i) - '0') * position;
        }
        return sum % 10 == check;
    }
}
