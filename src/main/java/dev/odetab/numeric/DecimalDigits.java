package dev.odetab.numeric;

import java.math.BigDecimal;
import java.math.MathContext;
import java.math.RoundingMode;
import java.util.Optional;

/**
 * Correct rounding of an enclosure to N significant decimal digits (round half to even).
 *
 * <p>Trust level: Rigorous. {@link #round} returns a value only when every point of the ball
 * rounds to it, so it is the correctly rounded value of the exact number inside (Ziv's test,
 * docs/methods.md §5); otherwise it returns empty and the caller raises the precision.
 */
public final class DecimalDigits {
    private DecimalDigits() {
    }

    /**
     * The common N-digit rounding of every point of the ball, or empty when the ends round
     * differently (or the ball straddles zero without being exactly zero).
     */
    public static Optional<BigDecimal> round(Ball x, int digits10) {
        MathContext mc = new MathContext(digits10, RoundingMode.HALF_EVEN);
        if (x.isExact()) {
            return Optional.of(x.mid().round(mc));
        }
        if (x.containsZero()) {
            return Optional.empty();
        }
        BigDecimal lo = x.lower().round(mc);
        BigDecimal hi = x.upper().round(mc);
        return lo.compareTo(hi) == 0 ? Optional.of(lo) : Optional.empty();
    }

    /**
     * Rigorous: the most significant digits, at most {@code maxDigits10}, that the ball decides
     * (its {@link #round} to that many digits exists), or 0 when not even one is decided (a ball
     * that straddles zero or a rounding boundary of every length up to the maximum). The
     * decimal {@code round(x, d)} then holds the exact value within half a unit in its last digit.
     */
    public static int decided(Ball x, int maxDigits10) {
        for (int d = maxDigits10; d >= 1; d--) {
            if (round(x, d).isPresent()) {
                return d;
            }
        }
        return 0;
    }

    /**
     * Text with exactly {@code digits10} significant digits: plain notation when the decimal
     * exponent e of the leading digit satisfies −5 &lt;= e &lt; digits10, otherwise
     * {@code d.ddd…e±XX}. Zero prints as {@code 0}. Locale-independent.
     */
    public static String format(BigDecimal rounded, int digits10) {
        if (rounded.signum() == 0) {
            return "0";
        }
        BigDecimal v = rounded.round(new MathContext(digits10, RoundingMode.HALF_EVEN));
        int exponent = v.precision() - v.scale() - 1;
        // force exactly digits10 significant digits
        BigDecimal scaled = v.setScale(digits10 - 1 - exponent, RoundingMode.UNNECESSARY);
        if (exponent >= -5 && exponent < digits10) {
            return scaled.toPlainString();
        }
        String unscaled = scaled.unscaledValue().abs().toString();
        StringBuilder sb = new StringBuilder();
        if (scaled.signum() < 0) {
            sb.append('-');
        }
        sb.append(unscaled.charAt(0));
        if (unscaled.length() > 1) {
            sb.append('.').append(unscaled, 1, unscaled.length());
        }
        sb.append('e').append(exponent < 0 ? '-' : '+').append(Math.abs(exponent));
        return sb.toString();
    }
}
