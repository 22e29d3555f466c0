package dev.odetab.expr;

import dev.odetab.base.ExprException;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import dev.odetab.numeric.Rational;
import java.util.Map;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;

class EquationParserTest {
    private static final Map<String, Rational> NO_PARAMS = Map.of();

    private static Rational q(long p, long d) {
        return Rational.of(p, d);
    }

    private static Rational q(long p) {
        return Rational.of(p);
    }

    /** The polynomial with these coefficients, lowest degree first. */
    private static Poly poly(Rational... c) {
        return Poly.of(c);
    }

    private static void assertEquation(Poly p2, Poly p1, Poly p0, String text, Map<String, Rational> params)
            throws ExprException {
        ParsedEquation e = EquationParser.parse(text, params);
        assertEquals(p2, e.p2(), "P2 of " + text);
        assertEquals(p1, e.p1(), "P1 of " + text);
        assertEquals(p0, e.p0(), "P0 of " + text);
    }

    @Test
    void legendre() throws ExprException {
        // DLMF 14.2.1 with mu = 0, nu = 4: (1 − x²) w'' − 2x w' + ν(ν + 1) w = 0
        Poly p2 = poly(q(1), q(0), q(-1));
        Poly p1 = poly(q(0), q(-2));
        Poly p0 = poly(q(20));
        assertEquation(p2, p1, p0, "(1-x^2)*y'' - 2*x*y' + 20*y = 0", NO_PARAMS);
        assertEquation(p2, p1, p0, "(1-x^2)*y'' - 2*x*y' + n*(n+1)*y = 0", Map.of("n", q(4)));
        assertEquation(p2, p1, p0, "(1 - x^2)*y'' = 2x*y' - n*(n + 1)*y", Map.of("n", q(4)));
    }

    @Test
    void airy() throws ExprException {
        // DLMF 9.2.1: w'' = z w
        Poly one = poly(q(1));
        Poly minusX = poly(q(0), q(-1));
        assertEquation(one, Poly.ZERO, minusX, "y'' - x*y = 0", NO_PARAMS);
        assertEquation(one, Poly.ZERO, minusX, "y'' = x*y", NO_PARAMS);
        assertEquation(one, Poly.ZERO, minusX, "0 = x*y - y''", NO_PARAMS);
    }

    @Test
    void coefficientOnEitherSideOfY() throws ExprException {
        Poly p2 = poly(q(4), q(0), q(1));
        assertEquation(p2, Poly.ZERO, poly(q(1)), "(x^2+4)*y'' + y = 0", NO_PARAMS);
        assertEquation(p2, Poly.ZERO, poly(q(1)), "y''*(x^2+4) + y = 0", NO_PARAMS);
        assertEquation(p2, Poly.ZERO, poly(q(1)), "y = -(x + 2)(x - 2)*y'' - 8y''", NO_PARAMS);
    }

    @Test
    void besselType() throws ExprException {
        // DLMF 10.2.1 with nu = 1/2: z² w'' + z w' + (z² − ν²) w = 0
        Poly p2 = poly(q(0), q(0), q(1));
        Poly p1 = poly(q(0), q(1));
        Poly p0 = poly(q(-1, 4), q(0), q(1));
        assertEquation(p2, p1, p0, "x^2*y'' + x*y' + (x^2 - 1/4)*y = 0", NO_PARAMS);
        assertEquation(p2, p1, p0, "x^2*y'' + x*y' + (x^2 - nu^2)*y = 0", Map.of("nu", q(1, 2)));
        assertEquation(p2, p1, p0, "x^2*y'' + x*y' + (x^2 - 0.25)*y = 0", NO_PARAMS);
    }

    @Test
    void rationalCoefficientsAreCleared() throws ExprException {
        // DLMF 10.2.1 with nu = 0, divided by z²: w'' + w'/z + w = 0
        Poly x = poly(q(0), q(1));
        assertEquation(x, poly(q(1)), x, "y'' + y'/x + y = 0", NO_PARAMS);
        assertEquation(x, poly(q(1)), x, "y'' + (1/x)*y' + y = 0", NO_PARAMS);
        // lcm of x and x² - x is x² − x = x(x − 1)
        assertEquation(poly(q(0), q(-1), q(1)), poly(q(-1), q(1)), poly(q(1)),
                "y'' + y'/x + y/(x^2 - x) = 0", NO_PARAMS);
    }

    @Test
    void productsAndQuotientsAreExpanded() throws ExprException {
        Poly x = poly(q(0), q(1));
        assertEquation(x, Poly.ZERO, x, "(y'' + y)*x = 0", NO_PARAMS);
        assertEquation(poly(q(0), q(0), q(1, 4)), Poly.ZERO, poly(q(1)), "x^2*y''/4 + y = 0", NO_PARAMS);
        assertEquation(poly(q(2)), poly(q(0), q(1)), poly(q(3), q(3)), "2y'' + x*y' + 3(x+1)*y = 0", NO_PARAMS);
        assertEquation(poly(q(2)), Poly.ZERO, poly(q(0), q(0), q(1, 4)), "4^(1/2)*y'' + (1/4)*x^2*y = 0", NO_PARAMS);
        assertEquation(poly(q(1)), Poly.ZERO, poly(q(1)), "y'' + 1 + y = 1", NO_PARAMS);
    }

    static Stream<Arguments> malformed() {
        return Stream.of(
            Arguments.of("", 1, "the equation is empty"),
            Arguments.of("(y'' + y = 0", 10, "expected ')' to close the '(' at column 1, found '='"),
            Arguments.of("y'' + y) = 0", 8, "unbalanced ')'"),
            Arguments.of("y'' + y = 0)", 12, "unbalanced ')'"),
            Arguments.of("y'' + 1 +", 10, "expected a number, a name or '(' after '+', found the end of the text"),
            Arguments.of("y'' + 2**3*y = 0", 9, "expected a number, a name or '(' after '*', found '*' (powers are written '^')"),
            Arguments.of("foo*y'' = 0", 1, "unknown name 'foo' (known: pi, sqrt, exp, log, gamma, x, y, y', y'')"),
            Arguments.of("y'' + y*y = 0", 8, "the equation must be linear in y: a product of two terms in y"),
            Arguments.of("y'' + y''/y = 0", 10, "the equation must be linear in y: y cannot appear in a denominator"),
            Arguments.of("y'' + sqrt(y) = 0", 7, "the equation must be linear in y: y cannot appear inside 'sqrt'"),
            Arguments.of("y'' + y^2 = 0", 8, "the equation must be linear in y: a term in y cannot be raised to a power"),
            Arguments.of("y'' + 1 = 0", 7, "the equation must be homogeneous: the term '1' has no y"),
            Arguments.of("y'' = x^2 - y", 7, "the equation must be homogeneous: the term 'x^2' has no y"),
            Arguments.of("y' + y = 0", 1, "no y'' term: not a second-order equation"),
            Arguments.of("y'' - y'' + y = 0", 1, "the terms in y'' cancel: not a second-order equation"),
            Arguments.of("y'' = y = 0", 9, "a second '=': an equation has exactly one '='"),
            Arguments.of("y'''' = 0", 1, "only y, y' and y'' may appear in a second-order equation, found y''''"),
            Arguments.of("y'' + y", 8, "expected '=' after the left-hand side, found the end of the text"),
            Arguments.of(" = y''", 2, "the left-hand side is empty"),
            Arguments.of("y'' =", 6, "the right-hand side is empty"),
            Arguments.of("x^(1/2)*y'' = 0", 2, "powers of x must have a non-negative integer exponent, found 1/2"),
            Arguments.of("x^y*y'' = 0", 2, "exponents must be constants"),
            Arguments.of("pi*y'' = 0", 1, "coefficients of the equation must be exact rationals; 'pi' is not allowed here"),
            Arguments.of("y'' + sqrt(2)*y = 0", 7, "coefficients of the equation must be exact rationals; 'sqrt' is not allowed here"),
            Arguments.of("y'' + 2^(1/2)*y = 0", 8, "coefficients of the equation must be exact rationals; '2^(1/2)' is not rational"),
            Arguments.of("exp(x)*y'' = 0", 1, "coefficients of the equation must be rational functions of x; 'exp' is not allowed here"),
            Arguments.of("y''/(x - x) = 0", 4, "division by zero"),
            Arguments.of("y'' + y x = 0", 9, "expected an operator or '=', found 'x' (a product is written with '*'; "
                    + "juxtaposition is accepted only after a number, or between ')' and '(')"),
            Arguments.of("y'' + y = 0 0", 13, "expected an operator or the end of the text, found '0' (a product is written "
                    + "with '*'; juxtaposition is accepted only after a number, or between ')' and '(')"),
            Arguments.of("y'' + y = 0;", 12, "unexpected character ';'"),
            Arguments.of("y'' + sqrt y = 0", 12, "expected '(' after 'sqrt', found 'y'"),
            Arguments.of("y'' + 1.e3*y = 0", 9, "expected a digit after '.'"));
    }

    @ParameterizedTest(name = "[{index}] {0}")
    @MethodSource("malformed")
    void malformedEquationsAreRejectedWithColumn(String text, int column, String message) {
        ExprException e = assertThrows(ExprException.class, () -> EquationParser.parse(text, NO_PARAMS));
        assertEquals(message, e.getMessage());
        assertEquals(column, e.column());
    }

    @Test
    void unknownNameListsParameters() {
        ExprException e = assertThrows(ExprException.class,
                () -> EquationParser.parse("y'' + m*y = 0", Map.of("n", q(1), "alpha", q(2))));
        assertEquals(7, e.column());
        assertEquals("unknown name 'm' (known: pi, sqrt, exp, log, gamma, x, y, y', y'', alpha, n)", e.getMessage());
    }
}
