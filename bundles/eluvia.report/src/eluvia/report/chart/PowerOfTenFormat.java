package eluvia.report.chart;

import java.math.BigDecimal;
import java.text.FieldPosition;
import java.text.NumberFormat;
import java.text.ParsePosition;

/**
 * Formats an exponent x as the number 10^x, for an axis drawn in log10 space: 0 gives "1", -2
 * gives "0.01", 3 gives "1000"; exponents outside -4 to 5 give "1E-6", "1E7"; non-integer
 * exponents give three significant figures.
 */
final class PowerOfTenFormat extends NumberFormat {

    private static final long serialVersionUID = 1L;

    @Override
    public StringBuffer format(double exponent, StringBuffer to, FieldPosition pos) {
        double rounded = Math.rint(exponent);
        if (Math.abs(exponent - rounded) < 1e-9) {
            int n = (int) rounded;
            if (n >= -4 && n <= 5) {
                return to.append(BigDecimal.ONE.scaleByPowerOfTen(n).toPlainString());
            }
            return to.append("1E").append(n);
        }
        return to.append(new BigDecimal(Math.pow(10, exponent)).round(new java.math.MathContext(3)).stripTrailingZeros()
                .toString());
    }

    @Override
    public StringBuffer format(long exponent, StringBuffer to, FieldPosition pos) {
        return format((double) exponent, to, pos);
    }

    @Override
    public Number parse(String source, ParsePosition pos) {
        throw new UnsupportedOperationException("axis labels are only written");
    }
}
