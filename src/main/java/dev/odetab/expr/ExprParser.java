package dev.odetab.expr;

import dev.odetab.base.ExprException;

import dev.odetab.expr.Syntax.Context;
import dev.odetab.expr.Syntax.Node;
import dev.odetab.numeric.Rational;
import java.util.Map;

/**
 * Reads constant expressions and rational functions of x written in ordinary notation.
 *
 * <p>Grammar (shared with {@link EquationParser}; blanks and tabs are ignored):
 * <pre>
 * sum      := term (('+' | '-') term)*
 * term     := factor (('*' | '/') factor | juxtaposed factor)*
 * factor   := ('-' | '+') factor | power          unary minus is looser than '^': -2^2 = -4
 * power    := primary ('^' factor)?              right-associative: 2^3^2 = 2^9
 * primary  := number | name | function '(' sum ')' | '(' sum ')'
 * number   := digits ['.' digits] | '.' digits, then optionally [eE] ['+'|'-'] digits
 * function := sqrt | exp | log (natural) | gamma
 * name     := pi | a parameter | x (rational functions and equations only)
 * </pre>
 * Juxtaposition is multiplication with the precedence of '*' in exactly two cases: a bare
 * number (no '^') followed by a name or '(' ({@code 2x}, {@code 3(x+1)}, {@code 2pi}), and a
 * parenthesized group or call (no '^') followed by '(' ({@code (x-1)(x+1)}). So {@code 1/2x}
 * is (1/2)·x, and {@code x 2}, {@code x(x+1)} and {@code 2^3x} are rejected.
 *
 * <p>Trust level: Exact. Every number is read exactly (never through a double). Errors are
 * {@link ExprException}s with the 1-based column in {@code text}; syntax errors come before
 * errors of meaning.
 */
public final class ExprParser {
    private ExprParser() {
    }

    /**
     * A constant expression. {@code params} are named exact values (for example n → 5, so
     * that {@code gamma(n+1)} is 120); their names must be identifiers other than pi, x, y and
     * the function names. Exact domain errors ({@code 1/0}, {@code log(-1)}, {@code gamma(0)},
     * {@code (-8)^(1/3)}) are reported here, at the column of the operator or function;
     * other domain errors surface in {@link ConstExpr#evaluate(int)}.
     *
     * @throws ExprException with the column of the fault
     * @throws IllegalArgumentException when a parameter name is not an identifier or clashes with a built-in name
     */
    public static ConstExpr parseConstant(String text, Map<String, Rational> params) throws ExprException {
        Node n = Syntax.parseExpression(text, Context.CONSTANT, params);
        ConstExpr c = new Linear(params, "coefficients").constant(n);
        ConstEval.exact(c);
        return c;
    }

    /**
     * A rational function of x with exact rational coefficients, e.g. {@code (1-x^2)/(x+4)} or
     * {@code (1/4)*x^2 + 4^(1/2)*x}. Constant parts must be exactly rational (see
     * {@link ConstExpr#exact()}); powers of a non-constant base must have an exponent that is
     * an exact integer in [0, 256].
     *
     * @throws ExprException with the column of the fault, for example "coefficients must be
     *     exact rationals; 'sqrt' is not allowed here" at the column of {@code sqrt}
     * @throws IllegalArgumentException when a parameter name is not an identifier or clashes with a built-in name
     */
    public static RationalFunction parseRationalFunction(String text, Map<String, Rational> params) throws ExprException {
        Node n = Syntax.parseExpression(text, Context.RATIONAL_FUNCTION, params);
        return new Linear(params, "coefficients").form(n).free();
    }
}
