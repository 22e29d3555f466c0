package dev.odetab.series;

import dev.odetab.expr.Poly;
import dev.odetab.numeric.Rational;
import dev.odetab.ode.Equation;
import java.math.BigInteger;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

/**
 * Detection of polynomial solutions: a terminating Taylor series, found from the recurrence
 * in exact rational arithmetic.
 *
 * <p>Trust level: Exact. With exact y(alpha) and y'(alpha), the coefficients c_m of METHODS §1
 * are computed as rationals. The recurrence expresses c_m through c_(m−1) … c_(m−J) only, so
 * once J consecutive coefficients vanish every later one does too, and the solution is exactly
 * the polynomial Σ c_m (x − alpha)^m (METHODS §5, "the exact path"). Detection gives up (empty
 * result, never a wrong one) when no such run of zeros appears up to {@code maxDegree} or the
 * coefficients grow past a size limit; the caller then uses the series with balls.
 */
public final class ExactPolynomial {
    /** Numerator and denominator sizes past which a series is taken not to terminate soon. */
    private static final int MAX_COEFFICIENT_BITS = 1 << 16;

    private ExactPolynomial() {
    }

    /**
     * The solution with y(alpha) = y0, y'(alpha) = y1 as an exact polynomial in x, when it is one
     * of degree at most {@code maxDegree}.
     */
    public static Optional<Poly> detect(Equation equation, Rational alpha, Rational y0, Rational y1, int maxDegree) {
        Recurrence rec = new Recurrence(equation, alpha);
        int order = rec.order();
        List<Rational> c = new ArrayList<>();
        c.add(y0);
        c.add(y1);
        int zerosInARow = (y1.isZero() ? 1 : 0) + (y1.isZero() && y0.isZero() ? 1 : 0);
        for (int m = 2; m <= maxDegree + order; m++) {
            if (zerosInARow >= order) {
                int degree = c.size() - 1;
                while (degree >= 0 && c.get(degree).isZero()) {
                    degree--;
                }
                Poly inT = Poly.of(c.subList(0, degree + 1));
                return Optional.of(inT.taylorShift(alpha.negate()));
            }
            Rational s = Rational.ZERO;
            for (int j = 1; j <= order && j <= m; j++) {
                Rational prev = c.get(m - j);
                if (!prev.isZero()) {
                    s = s.add(prev.multiply(Rational.of(rec.numerator(j, m))));
                }
            }
            Rational cm = s.divide(Rational.of(rec.denominator(m)));
            if (bits(cm) > MAX_COEFFICIENT_BITS) {
                return Optional.empty();
            }
            c.add(cm);
            zerosInARow = cm.isZero() ? zerosInARow + 1 : 0;
        }
        return Optional.empty();
    }

    private static int bits(Rational r) {
        BigInteger n = r.numerator();
        return n.bitLength() + r.denominator().bitLength();
    }
}
