package dev.odetab.ode;

import dev.odetab.expr.Poly;
import dev.odetab.numeric.Rational;
import java.math.BigInteger;
import java.math.MathContext;

/**
 * Segments of the real line and the singular points on them: a walk of analytic continuation
 * (docs/methods.md §4) may not cross or end on a real root of P2.
 *
 * <p>Derivation: docs/methods.md §12 (singular points).
 */
public final class RealPath {
    private RealPath() {
    }

    /**
     * Exact: throws when a real root of the reduced P2 lies on the closed segment between the
     * two points (Sturm counts); names the root.
     *
     * @param reduced {@code original.reduced()}
     * @throws SingularCrossingException when such a root exists
     */
    public static void checkPath(Equation reduced, Equation original, Rational from, Rational to) {
        Poly p2 = reduced.p2();
        Rational lo = from.min(to);
        Rational hi = from.max(to);
        if (p2.countRealRoots(lo, hi) == 0) {
            return;
        }
        // Isolate the root nearest to `from` by bisection with exact Sturm counts.
        Rational a = lo;
        Rational b = hi;
        boolean towardLow = from.equals(lo);
        for (int i = 0; i < 64; i++) {
            Rational m = a.add(b).divide(Rational.TWO);
            Rational na = towardLow ? a : m;
            Rational nb = towardLow ? m : b;
            if (p2.countRealRoots(na, nb) > 0) {
                a = na;
                b = nb;
            } else {
                a = towardLow ? m : a;
                b = towardLow ? b : m;
            }
        }
        String where = describeRoot(p2, a, b);
        throw new SingularCrossingException("x = " + where + " is a singular point of " + original
                + " and lies between " + from.toDecimalOrFraction() + " and " + to.toDecimalOrFraction()
                + "; a solution cannot be continued through it");
    }

    private static String describeRoot(Poly p2, Rational a, Rational b) {
        Rational guess = a.add(b).divide(Rational.TWO);
        for (int den = 1; den <= 1000; den++) {
            Rational near = Rational.of(guess.multiply(Rational.of(den)).add(Rational.of(1, 2)).floor(), BigInteger.valueOf(den));
            if (near.compareTo(a) >= 0 && near.compareTo(b) <= 0 && p2.evaluate(near).isZero()) {
                return near.toDecimalOrFraction();
            }
        }
        return guess.toBigDecimal(new MathContext(12)).toPlainString() + " (approximately)";
    }
}
