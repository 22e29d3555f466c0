package dev.odetab.ode;

import dev.odetab.expr.ParsedEquation;
import dev.odetab.expr.Poly;
import dev.odetab.numeric.Rational;

/**
 * The equation P2(x) y'' + P1(x) y' + P0(x) y = 0 with exact rational polynomial coefficients.
 *
 * <p>Trust level: Exact. The reduced form divides out the factors common to all three
 * coefficients (they do not change the solutions away from their roots) and scales P2 to be
 * monic; singular points are the roots of the reduced P2 (docs/methods.md §1, DLMF 2.7(i)).
 */
public record Equation(Poly p2, Poly p1, Poly p0) {
    public Equation {
        if (p2.isZero()) {
            throw new IllegalArgumentException("the coefficient of y'' is zero: not a second-order equation");
        }
    }

    /** The equation as parsed from text. */
    public static Equation of(ParsedEquation parsed) {
        return new Equation(parsed.p2(), parsed.p1(), parsed.p0());
    }

    /** Common factors removed, P2 monic. */
    public Equation reduced() {
        Poly g = p2.gcd(p1).gcd(p0);
        Poly a = p2.divideExact(g);
        Poly b = p1.divideExact(g);
        Poly c = p0.divideExact(g);
        Rational lead = a.leadingCoefficient().reciprocal();
        return new Equation(a.scale(lead), b.scale(lead), c.scale(lead));
    }

    /** True when P2 of the reduced equation does not vanish at x (exact test). */
    public boolean isOrdinary(Rational x) {
        return !reduced().p2.evaluate(x).isZero();
    }

    /** Ordinary notation, e.g. {@code (1 - x^2)*y'' - 2*x*y' + 20*y = 0}. */
    @Override
    public String toString() {
        StringBuilder sb = new StringBuilder();
        appendTerm(sb, p2, "y''");
        appendTerm(sb, p1, "y'");
        appendTerm(sb, p0, "y");
        return sb.append(" = 0").toString();
    }

    private static void appendTerm(StringBuilder sb, Poly p, String what) {
        if (p.isZero()) {
            return;
        }
        String text;
        boolean negative = false;
        if (p.isConstant()) {
            Rational k = p.coefficient(0);
            negative = k.signum() < 0;
            Rational a = k.abs();
            text = a.equals(Rational.ONE) ? what : (a.isInteger() ? a.toString() : "(" + a + ")") + "*" + what;
        } else {
            String ps = p.toString();
            boolean single = !ps.substring(1).contains(" + ") && !ps.substring(1).contains(" - ");
            if (single && ps.startsWith("-")) {
                negative = true;
                ps = ps.substring(1);
            }
            text = (single ? ps : "(" + ps + ")") + "*" + what;
        }
        if (sb.length() == 0) {
            sb.append(negative ? "-" : "").append(text);
        } else {
            sb.append(negative ? " - " : " + ").append(text);
        }
    }
}
