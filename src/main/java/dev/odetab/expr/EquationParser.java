package dev.odetab.expr;

import dev.odetab.base.ExprException;

import dev.odetab.expr.Linear.Form;
import dev.odetab.expr.Syntax.Bin;
import dev.odetab.expr.Syntax.EquationNode;
import dev.odetab.expr.Syntax.Group;
import dev.odetab.expr.Syntax.Neg;
import dev.odetab.expr.Syntax.Node;
import dev.odetab.numeric.Rational;
import java.util.Map;

/**
 * Reads a homogeneous second-order linear equation P2(x) y'' + P1(x) y' + P0(x) y = 0 written
 * in ordinary notation.
 *
 * <p>Grammar: {@code sum '=' sum}, each side as in {@link ExprParser}, with the names x, y,
 * y' and y'' in addition. Terms may come in any order and on either side ({@code y'' = x*y}
 * is {@code y'' - x*y = 0}); products and quotients are expanded ({@code (y'' + y)*x},
 * {@code y''*(x^2+4)}, {@code x^2*y''/4}); coefficients may be rational functions of x, and
 * the equation is then multiplied by the monic lcm of their denominators
 * ({@code y'' + y'/x + y = 0} gives {@code x*y'' + y' + x*y = 0}). Nothing else is changed:
 * no common factor or constant is divided out (see {@code Equation.reduced()} in the ode package).
 *
 * <p>Trust level: Exact.
 */
public final class EquationParser {
    private EquationParser() {
    }

    /**
     * The equation with exact polynomial coefficients.
     *
     * @param params named exact values usable in coefficients (n → 20 for {@code n*(n+1)*y})
     * @throws ExprException with the column of the fault: syntax errors; a product of two terms
     *     in y, y in a denominator, inside a function or under '^' ("the equation must be linear
     *     in y: ..."); a coefficient that is not a rational function of x with exact rational
     *     coefficients; a term without y ("the equation must be homogeneous: the term '1' has
     *     no y", at the term); no y'' ("no y'' term: not a second-order equation", column 1)
     * @throws IllegalArgumentException when a parameter name is not an identifier or clashes with a built-in name
     */
    public static ParsedEquation parse(String text, Map<String, Rational> params) throws ExprException {
        EquationNode eq = Syntax.parseEquation(text, params);
        Linear linear = new Linear(params, "coefficients of the equation");
        Form form = linear.form(eq.left()).add(linear.form(eq.right()).negate());
        if (!form.free().isZero()) {
            Node term = freeTerm(linear, eq.left());
            if (term == null) {
                term = freeTerm(linear, eq.right());
            }
            if (term == null) {
                throw new ExprException(1, "the equation must be homogeneous: some terms have no y");
            }
            throw new ExprException(term.start() + 1, "the equation must be homogeneous: the term '"
                    + text.substring(term.start(), term.end()) + "' has no y");
        }
        if (form.d2().isZero()) {
            boolean mentioned = Syntax.mentionsSecondDerivative(eq.left())
                    || Syntax.mentionsSecondDerivative(eq.right());
            throw new ExprException(1, mentioned ? "the terms in y'' cancel: not a second-order equation"
                    : "no y'' term: not a second-order equation");
        }
        Poly lcm = lcm(lcm(form.d2().denominator(), form.d1().denominator()), form.d0().denominator());
        return new ParsedEquation(cleared(form.d2(), lcm), cleared(form.d1(), lcm), cleared(form.d0(), lcm));
    }

    private static Poly lcm(Poly a, Poly b) {
        return a.multiply(b).divideExact(a.gcd(b)).monic();
    }

    private static Poly cleared(RationalFunction f, Poly lcm) {
        return f.numerator().multiply(lcm.divideExact(f.denominator()));
    }

    /** The first additive term, searching into the parts that carry a free term, that has no y but a non-zero value. */
    private static Node freeTerm(Linear linear, Node n) throws ExprException {
        Form f = linear.form(n);
        if (f.free().isZero()) {
            return null;
        }
        if (!f.hasY()) {
            return n;
        }
        if (n instanceof Group g) {
            return freeTerm(linear, g.inner());
        } else if (n instanceof Neg g) {
            return freeTerm(linear, g.operand());
        } else if (n instanceof Bin b) {
            if (b.op() == '+' || b.op() == '-') {
                Node t = freeTerm(linear, b.left());
                return t != null ? t : freeTerm(linear, b.right());
            }
            if (b.op() == '/' || Linear.hasY(b.left())) {
                return freeTerm(linear, b.left());
            }
            return freeTerm(linear, b.right());
        }
        return null;
    }
}
