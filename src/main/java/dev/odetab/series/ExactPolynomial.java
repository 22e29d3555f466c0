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
 * <p>Trust level: Exact. With exact y(alpha) and y'(alpha), the coefficients c_m of docs/methods.md §1
 * are computed as rationals. The recurrence expresses c_m through c_(m−1) … c_(m−J) only, so
 * once J consecutive coefficients vanish every later one does too, and the solution is exactly
 * the polynomial Σ c_m (x − alpha)^m (docs/methods.md §5, "the exact path"). Detection gives up (empty
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
        int possible = largestPossibleDegree(equation.reduced());
        if (possible < 0) {
            return Optional.empty();
        }
        maxDegree = Math.min(maxDegree, possible);
        Recurrence rec = new Recurrence(equation, alpha);
        int order = rec.order();
        List<Rational> c = new ArrayList<>();
        c.add(y0);
        c.add(y1);
        int zerosInARow = (y1.isZero() ? 1 : 0) + (y1.isZero() && y0.isZero() ? 1 : 0);
        for (int m = 2; m <= maxDegree + order + 1; m++) {
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

    /**
     * An upper bound on the degree of any polynomial solution, or −1 when there is none. If
     * y = x^n + … solves the equation, the highest power of x in P2 y'' + P1 y' + P0 y must
     * cancel: with D = max(deg P2 − 2, deg P1 − 1, deg P0), the coefficient of x^(n+D) is
     * I(n) = [deg P2 − 2 = D] lc(P2) n(n−1) + [deg P1 − 1 = D] lc(P1) n + [deg P0 = D] lc(P0),
     * so n is a non-negative integer root of I. When I vanishes identically every n is possible
     * and Integer.MAX_VALUE is returned.
     */
    static int largestPossibleDegree(Equation eq) {
        Poly p2 = eq.p2();
        Poly p1 = eq.p1();
        Poly p0 = eq.p0();
        int d = Math.max(p2.degree() - 2, Math.max(p1.isZero() ? Integer.MIN_VALUE : p1.degree() - 1,
                p0.isZero() ? Integer.MIN_VALUE : p0.degree()));
        Rational a = p2.degree() - 2 == d ? p2.leadingCoefficient() : Rational.ZERO;
        Rational b = !p1.isZero() && p1.degree() - 1 == d ? p1.leadingCoefficient() : Rational.ZERO;
        Rational c = !p0.isZero() && p0.degree() == d ? p0.leadingCoefficient() : Rational.ZERO;
        // I(n) = a n^2 + (b − a) n + c
        Poly indicial = Poly.of(c, b.subtract(a), a);
        if (indicial.isZero()) {
            return Integer.MAX_VALUE;
        }
        int best = -1;
        if (indicial.degree() == 0) {
            return -1;
        }
        // integer roots divide the constant term of the primitive integer polynomial; search by
        // bracketing instead: the roots are at most 1 + max |coefficient / leading| (Cauchy).
        Poly prim = indicial.primitivePart();
        Rational lead = prim.leadingCoefficient().abs();
        Rational bound = Rational.ONE;
        for (int i = 0; i < prim.degree(); i++) {
            bound = bound.max(Rational.ONE.add(prim.coefficient(i).abs().divide(lead)));
        }
        long limit = bound.floor().min(BigInteger.valueOf(1_000_000)).longValueExact();
        for (long n = 0; n <= limit; n++) {
            if (prim.evaluate(Rational.of(n)).isZero()) {
                best = (int) n;
            }
        }
        return best;
    }

    private static int bits(Rational r) {
        BigInteger n = r.numerator();
        return n.bitLength() + r.denominator().bitLength();
    }
}
