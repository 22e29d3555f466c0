package dev.odetab.expr;

import dev.odetab.base.ExprException;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.odetab.numeric.Rational;
import java.util.Map;
import org.junit.jupiter.api.Test;

class RationalFunctionTest {
    private static final Map<String, Rational> NO_PARAMS = Map.of();
    private static final RationalFunction X = RationalFunction.X;

    private static RationalFunction c(long p, long q) {
        return RationalFunction.constant(Rational.of(p, q));
    }

    private static RationalFunction parse(String text) throws ExprException {
        return ExprParser.parseRationalFunction(text, NO_PARAMS);
    }

    @Test
    void normalFormRemovesCommonFactorsAndMakesTheDenominatorMonic() {
        // (x² − 1)/(2x − 2) = (x + 1)/2
        Poly num = Poly.of(Rational.of(-1), Rational.ZERO, Rational.ONE);
        Poly den = Poly.of(Rational.of(-2), Rational.of(2));
        RationalFunction f = RationalFunction.of(num, den);
        assertEquals(Poly.of(Rational.of(1, 2), Rational.of(1, 2)), f.numerator());
        assertEquals(Poly.ONE, f.denominator());
        assertTrue(f.isPolynomial());
        // 1/(2x): the denominator becomes x, the numerator 1/2
        RationalFunction g = RationalFunction.ONE.divide(X.multiply(c(2, 1)));
        assertEquals(Poly.constant(Rational.of(1, 2)), g.numerator());
        assertEquals(Poly.X, g.denominator());
        assertEquals("(1/2)/x", g.toString());
    }

    @Test
    void arithmeticIdentities() {
        RationalFunction a = X.add(RationalFunction.ONE).divide(X.subtract(c(2, 1)));
        RationalFunction b = X.multiply(X).add(c(1, 3)).divide(X);
        assertEquals(a, a.add(b).subtract(b));
        assertEquals(a, a.multiply(b).divide(b));
        assertEquals(RationalFunction.ONE, a.pow(3).multiply(a.pow(-3)));
        assertEquals(RationalFunction.ONE, a.pow(0));
        assertEquals(RationalFunction.ZERO, a.subtract(a));
        assertThrows(ArithmeticException.class, () -> a.divide(RationalFunction.ZERO));
        assertThrows(ArithmeticException.class, () -> RationalFunction.ZERO.pow(-1));
        // a(3) = (3 + 1)/(3 − 2) = 4
        assertEquals(Rational.of(4), a.evaluate(Rational.of(3)));
    }

    @Test
    void parsesRationalFunctionsWithExactConstants() throws ExprException {
        RationalFunction f = parse("(1/4)*x^2 + 4^(1/2)*x");
        assertEquals(Poly.of(Rational.ZERO, Rational.of(2), Rational.of(1, 4)), f.numerator());
        assertEquals(Poly.ONE, f.denominator());
        assertEquals(X.add(RationalFunction.ONE), parse("(x^2 - 1)/(x - 1)"));
        assertEquals(X.pow(-2), parse("1/x^2"));
        assertEquals(parse("(x - 1)(x + 1)"), parse("x^2 - 1"));
        assertEquals(c(120, 1).multiply(X), ExprParser.parseRationalFunction("gamma(n+1)*x", Map.of("n", Rational.of(5))));
    }

    private static void assertRejected(String text, int column, String message) {
        ExprException e = assertThrows(ExprException.class, () -> parse(text), text);
        assertEquals(message, e.getMessage(), text);
        assertEquals(column, e.column(), text);
    }

    @Test
    void rejectsWhatIsNotAnExactRationalFunction() {
        assertRejected("1 + sqrt(2)*x", 5, "coefficients must be exact rationals; 'sqrt' is not allowed here");
        assertRejected("x + exp(log(2))", 9, "coefficients must be exact rationals; 'log' is not allowed here");
        assertRejected("x^(1/2)", 2, "powers of x must have a non-negative integer exponent, found 1/2");
        assertRejected("(x+1)^-1", 6, "powers of x must have a non-negative integer exponent, found -1");
        assertRejected("x^pi", 2, "powers of x must have a non-negative integer exponent, found pi");
        assertRejected("x^x", 2, "exponents must be constants");
        assertRejected("1/(x - x)", 2, "division by zero");
        assertRejected("y", 1, "unknown name 'y' (known: pi, sqrt, exp, log, gamma, x)");
        assertRejected("x(x + 1)", 2, "expected an operator or the end of the text, found '(' (a product is written with "
                + "'*'; juxtaposition is accepted only after a number, or between ')' and '(')");
    }
}
