package dev.odetab.expr;

import dev.odetab.base.ExprException;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.odetab.numeric.Ball;
import dev.odetab.numeric.Rational;
import java.math.BigDecimal;
import java.util.Map;
import java.util.Optional;
import org.apfloat.Apfloat;
import org.apfloat.ApfloatMath;
import org.junit.jupiter.api.Test;

class ConstExprTest {
    private static final Map<String, Rational> NO_PARAMS = Map.of();

    private static ConstExpr parse(String text) throws ExprException {
        return ExprParser.parseConstant(text, NO_PARAMS);
    }

    private static Optional<Rational> exact(String text) throws ExprException {
        return parse(text).exact();
    }

    /**
     * Asserts that {@code ball}, widened by the reference's own error {@code refError}, contains
     * {@code reference}, and that the ball is narrow enough for the check to mean something.
     */
    private static void assertEncloses(String reference, BigDecimal refError, Ball ball) {
        assertTrue(ball.rad().compareTo(refError) < 0, "ball too wide to test: " + ball);
        assertTrue(ball.addError(refError).contains(new BigDecimal(reference)),
                ball + " does not contain " + reference);
    }

    /** 60 significant digits of apfloat's Airy function at x, with 80 digits of working precision. */
    private static String apfloat60(Apfloat value) {
        return value.precision(60).toString(true);
    }

    @Test
    void deepContinuedFractionIsEvaluatedAndPrintedOnce() throws ExprException {
        // e_0 = 1, e_(k+1) = 1/(1 + e_k) gives e_k = F(k+1)/F(k+2) (Fibonacci numbers, F(1) = F(2) = 1),
        // by induction: 1/(1 + F(k+1)/F(k+2)) = F(k+2)/(F(k+2) + F(k+1)) = F(k+2)/F(k+3).
        // Printing once formatted every right operand twice, so 2^depth work: depth 40 never finished.
        int depth = 40;
        String text = "1";
        for (int k = 0; k < depth; k++) {
            text = "1/(1 + " + text + ")";
        }
        java.math.BigInteger f1 = java.math.BigInteger.ONE;
        java.math.BigInteger f2 = java.math.BigInteger.ONE;
        for (int k = 0; k < depth + 1; k++) {
            java.math.BigInteger next = f1.add(f2);
            f1 = f2;
            f2 = next;
        }
        // now f1 = F(depth + 2), f2 = F(depth + 3); e_depth = F(depth + 1)/F(depth + 2) = (f2 - f1)/f1
        ConstExpr e = parse(text);
        assertEquals(Optional.of(Rational.of(f2.subtract(f1), f1)), e.exact());
        assertEquals(text, e.toString(), "canonical text of a nested expression");
        assertEquals(e.toString(), parse(e.toString()).toString());
    }

    @Test
    void airyAiAtZeroContainsApfloatValue() throws ExprException {
        // DLMF 9.2.3: Ai(0) = 1/(3^(2/3) Γ(2/3)). Reference: apfloat 1.15 ApfloatMath.airyAi,
        // evaluated at 1e-200 because it rejects an exact zero; |Ai(1e-200) − Ai(0)| < 1e-200.
        String reference = apfloat60(ApfloatMath.airyAi(new Apfloat("1e-200", 80)));
        Ball ai0 = parse("1/(3^(2/3)*gamma(2/3))").evaluate(256);
        assertEncloses(reference, new BigDecimal("1e-60"), ai0);
    }

    @Test
    void airyAiPrimeAtZeroContainsApfloatValue() throws ExprException {
        // DLMF 9.2.4: Ai'(0) = −1/(3^(1/3) Γ(1/3)). Reference: apfloat 1.15 ApfloatMath.airyAiPrime at 1e-200,
        // |Ai'(1e-200) − Ai'(0)| <= 1e-200 max|Ai''| = 1e-200 max|x Ai(x)| < 1e-200.
        String reference = apfloat60(ApfloatMath.airyAiPrime(new Apfloat("1e-200", 80)));
        Ball slope = parse("-1/(3^(1/3)*gamma(1/3))").evaluate(256);
        assertEncloses(reference, new BigDecimal("1e-60"), slope);
    }

    @Test
    void squareRootOfTwoContainsApfloatValue() throws ExprException {
        // Reference: apfloat 1.15 ApfloatMath.sqrt at 80 digits, rounded to 60.
        String reference = apfloat60(ApfloatMath.sqrt(new Apfloat(2, 80)));
        assertEncloses(reference, new BigDecimal("1e-59"), parse("2^(1/2)").evaluate(256));
        assertEncloses(reference, new BigDecimal("1e-59"), parse("sqrt(2)").evaluate(256));
    }

    @Test
    void twoPrecisionsOverlap() throws ExprException {
        ConstExpr e = parse("1/(3^(2/3)*gamma(2/3)) + exp(1/3) - log(7)/pi");
        Ball coarse = e.evaluate(64);
        Ball fine = e.evaluate(300);
        assertTrue(coarse.overlaps(fine), coarse + " vs " + fine);
        assertTrue(fine.rad().compareTo(coarse.rad()) < 0, "more bits must narrow the ball: " + coarse + " vs " + fine);
    }

    @Test
    void identitiesHoldAsContainment() throws ExprException {
        // DLMF 5.4.6: Γ(1/2) = √π; DLMF 4.2.1 log is the inverse of exp; sqrt(2)^2 = 2.
        assertTrue(parse("gamma(1/2)^2 - pi").evaluate(200).containsZero());
        assertTrue(parse("exp(log(3)) - 3").evaluate(200).containsZero());
        assertTrue(parse("sqrt(2)^2 - 2").evaluate(200).containsZero());
        // DLMF 5.5.1 with Γ(1) = 1: Γ(11/3) = (8/3)(5/3)(2/3) Γ(2/3)
        assertTrue(parse("gamma(11/3) - (8/3)*(5/3)*(2/3)*gamma(2/3)").evaluate(200).containsZero());
    }

    @Test
    void exactValues() throws ExprException {
        assertEquals(Optional.of(Rational.of(4)), exact("(1/3 + 1/6)*2^3"));
        assertEquals(Optional.of(Rational.of(4)), exact("8^(2/3)"));
        assertEquals(Optional.of(Rational.of(2)), exact("4^(1/2)"));
        assertEquals(Optional.of(Rational.of(9, 4)), exact("(8/27)^(-2/3)"));
        assertEquals(Optional.of(Rational.of(3, 2)), exact("sqrt(9/4)"));
        assertEquals(Optional.of(Rational.of(1, 1000)), exact("1e-3"));
        assertEquals(Optional.of(Rational.of(1, 2)), exact(".5"));
        assertEquals(Optional.of(Rational.of(3, 2)), exact("1.5"));
        assertEquals(Optional.of(Rational.of(1500)), exact("1.5E3"));
        assertEquals(Optional.of(Rational.ONE), exact("exp(0)"));
        assertEquals(Optional.of(Rational.ZERO), exact("log(1)"));
        assertEquals(Optional.of(Rational.of(24)), exact("gamma(5)"));
        assertEquals(Optional.of(Rational.ZERO), exact("0^(1/3)"));
        assertEquals(Optional.of(Rational.ONE), exact("(-1)^1000001 + 2"));
    }

    @Test
    void irrationalValuesAreNotExact() throws ExprException {
        for (String s : new String[] {"2^(1/2)", "sqrt(2)", "pi", "exp(1)", "log(2)", "gamma(1/2)", "4^(1/3)", "2^pi"}) {
            assertEquals(Optional.empty(), exact(s), s);
        }
    }

    @Test
    void exactValueIsRoundedOnce() throws ExprException {
        Ball third = parse("1/3").evaluate(100);
        assertTrue(third.contains(Rational.of(1, 3)));
        assertTrue(third.rad().signum() > 0);
        assertEquals(Ball.exact(new BigDecimal("0.125")), parse("2^-3").evaluate(100));
    }

    @Test
    void precedence() throws ExprException {
        assertEquals(Optional.of(Rational.of(-4)), exact("-2^2"));
        assertEquals(Optional.of(Rational.of(4)), exact("(-2)^2"));
        assertEquals(Optional.of(Rational.of(512)), exact("2^3^2"));
        assertEquals(Optional.of(Rational.of(64)), exact("(2^3)^2"));
        assertEquals(Optional.of(Rational.of(10)), exact("2*3+4"));
        assertEquals(Optional.of(Rational.of(14)), exact("2+3*4"));
        assertEquals(Optional.of(Rational.ONE), exact("6/2/3"));
        assertEquals(Optional.of(Rational.of(-5)), exact("2-3-4"));
        assertEquals(Optional.of(Rational.of(1, 8)), exact("2^-3"));
        assertEquals(Optional.of(Rational.of(-6)), exact("-2*3"));
        assertEquals(Optional.of(Rational.of(2)), exact("--2"));
    }

    @Test
    void juxtaposition() throws ExprException {
        assertEquals(Optional.of(Rational.of(8)), exact("2(3+1)"));
        assertEquals(Optional.of(Rational.of(6)), exact("(1+1)(2+1)"));
        assertEquals(Optional.of(Rational.of(12)), exact("2 gamma(4)"));
        assertTrue(parse("2pi - 2*pi").evaluate(100).containsZero());
        ExprException e = assertThrows(ExprException.class, () -> parse("2^3(2)"));
        assertEquals(4, e.column());
    }

    @Test
    void parameters() throws ExprException {
        Map<String, Rational> n5 = Map.of("n", Rational.of(5));
        assertEquals(Optional.of(Rational.of(120)), ExprParser.parseConstant("gamma(n+1)", n5).exact());
        Map<String, Rational> half = Map.of("nu", Rational.of(-1, 2));
        ConstExpr e = ExprParser.parseConstant("2^nu*nu", half);
        assertEquals("2^-0.5*(-0.5)", e.toString());
        assertThrows(IllegalArgumentException.class, () -> ExprParser.parseConstant("1", Map.of("x", Rational.ONE)));
    }

    @Test
    void canonicalNotation() throws ExprException {
        String[][] cases = {
            {"2*3+4", "2*3 + 4"},
            {"((2))^(3)", "2^3"},
            {"-(2^2)", "-2^2"},
            {"(-2)^2", "(-2)^2"},
            {"2^(3^2)", "2^3^2"},
            {"(2^3)^2", "(2^3)^2"},
            {"1-(2-3)", "1 - (2 - 3)"},
            {"(1-2)-3", "1 - 2 - 3"},
            {"1/(2*3)", "1/(2*3)"},
            {"2*-3", "2*(-3)"},
            {"2^-(1/2)", "2^-(1/2)"},
            {"-(2*3)", "-(2*3)"},
            {"1.50", "1.5"},
            {"1e-3", "0.001"},
            {"2sqrt( 3 )", "2*sqrt(3)"},
            {"1/(3^(2/3)*gamma(2/3))", "1/(3^(2/3)*gamma(2/3))"},
        };
        for (String[] c : cases) {
            ConstExpr e = parse(c[0]);
            assertEquals(c[1], e.toString(), c[0]);
            ConstExpr again = parse(e.toString());
            assertEquals(e.toString(), again.toString(), "round trip of " + c[0]);
            assertEquals(e.exact(), again.exact(), "round trip of " + c[0]);
        }
    }

    private static void assertDomainError(String text, int column, String message) {
        ExprException e = assertThrows(ExprException.class, () -> parse(text).evaluate(100), text);
        assertEquals(column, e.column(), text);
        assertEquals(message, e.getMessage(), text);
    }

    @Test
    void exactDomainErrorsAtParse() {
        assertDomainError("2 + log(-1)", 5, "log is undefined at -1: the argument must be positive");
        assertDomainError("gamma(0)", 1, "gamma has a pole at 0");
        assertDomainError("gamma(1 - 3)", 1, "gamma has a pole at -2");
        assertDomainError("1 + 1/(2 - 2)", 6, "division by zero");
        assertDomainError("0^-1", 2, "division by zero: 0 raised to a negative power");
        assertDomainError("(-8)^(1/3)", 5, "a negative base needs an integer exponent, found exponent 1/3");
        assertDomainError("sqrt(-2)", 1, "sqrt is undefined at -2: the argument must not be negative");
    }

    @Test
    void undecidableDivisionAtEvaluation() throws ExprException {
        ConstExpr e = parse("1 + 1/(pi - pi)");
        ExprException ex = assertThrows(ExprException.class, () -> e.evaluate(100));
        assertEquals(6, ex.column());
        assertEquals("division by a value that cannot be separated from zero at this precision", ex.getMessage());
        ExprException log = assertThrows(ExprException.class, () -> parse("2*log(pi - pi)").evaluate(100));
        assertEquals(3, log.column());
        assertTrue(log.getMessage().startsWith("log: "), log.getMessage());
    }
}
