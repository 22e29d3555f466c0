package dev.odetab.series;

import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.odetab.numeric.Ball;
import dev.odetab.numeric.Rational;
import dev.odetab.ode.Equation;
import java.math.BigDecimal;
import java.math.BigInteger;
import org.apfloat.Apfloat;
import org.apfloat.ApfloatMath;
import org.junit.jupiter.api.Test;

/**
 * {@link LocalSeries}, one Taylor step with its tail bound (docs/methods.md §1–2): the coefficients of
 * y'' = y contain 1/m! exactly; the sums contain apfloat 1.15.0's exp and Airy values; rational
 * and ball steps, and two precisions, give overlapping balls; a step that reaches the nearest
 * singular point has no tail bound.
 */
class LocalSeriesTest {

    private static BigDecimal apfloat(Apfloat v) {
        return new BigDecimal(v.toString(true));
    }

    @Test
    void coefficientsOfTheExponentialContainOneOverMFactorial() {
        Ball[] c = LocalSeries.coefficients(new Recurrence(Equations.EXP, Rational.ZERO), Ball.ONE, Ball.ONE, 30, 200);
        BigInteger factorial = BigInteger.ONE;
        for (int m = 0; m < c.length; m++) {
            factorial = m == 0 ? BigInteger.ONE : factorial.multiply(BigInteger.valueOf(m));
            Rational exact = Rational.of(BigInteger.ONE, factorial);
            assertTrue(c[m].contains(exact), "c(" + m + ") = " + c[m] + " does not contain 1/" + m + "!");
        }
    }

    @Test
    void sumsContainApfloatsValues() {
        Recurrence exp = new Recurrence(Equations.EXP, Rational.ZERO);
        for (String ts : new String[] {"1/2", "-3/4", "1/1000"}) {
            Rational t = Rational.parse(ts);
            Jet j = LocalSeries.sum(exp, Ball.ONE, Ball.ONE, t, 400, 200).jet();
            Apfloat at = new Apfloat(new BigDecimal(t.numerator()), 90).divide(new Apfloat(new BigDecimal(t.denominator()), 90));
            BigDecimal e = apfloat(ApfloatMath.exp(at));
            BigDecimal slack = e.ulp().multiply(BigDecimal.TEN);
            assertTrue(j.value().addError(slack).contains(e), "exp(" + ts + ") = " + e + " not in " + j.value());
            assertTrue(j.derivative().addError(slack).contains(e), "exp'(" + ts + ") = " + e + " not in " + j.derivative());
            assertTrue(j.value().rad().compareTo(new BigDecimal("1e-50")) < 0, "too wide: " + j.value());
        }
        // Airy from apfloat's Ai(1), Ai'(1) (DLMF 9.2) one step to 3/2 and to 1/2
        Apfloat one = new Apfloat(1, 90);
        Ball y0 = Ball.of(apfloat(ApfloatMath.airyAi(one)), new BigDecimal("1e-85"));
        Ball y1 = Ball.of(apfloat(ApfloatMath.airyAiPrime(one)), new BigDecimal("1e-85"));
        Recurrence airy = new Recurrence(Equations.AIRY, Rational.ONE);
        for (String ts : new String[] {"1/2", "-1/2"}) {
            Rational t = Rational.parse(ts);
            Jet j = LocalSeries.sum(airy, y0, y1, t, 400, 256).jet();
            Apfloat x = one.add(new Apfloat(new BigDecimal(t.numerator()), 90).divide(new Apfloat(new BigDecimal(t.denominator()), 90)));
            BigDecimal ai = apfloat(ApfloatMath.airyAi(x));
            BigDecimal aip = apfloat(ApfloatMath.airyAiPrime(x));
            assertTrue(j.value().addError(ai.ulp().multiply(BigDecimal.TEN)).contains(ai), "Ai(1 + " + ts + ") = " + ai + " not in " + j.value());
            assertTrue(j.derivative().addError(aip.ulp().multiply(BigDecimal.TEN)).contains(aip),
                    "Ai'(1 + " + ts + ") = " + aip + " not in " + j.derivative());
        }
    }

    @Test
    void rationalAndBallStepsAndTwoPrecisionsOverlap() {
        Recurrence airy = new Recurrence(Equations.AIRY, Rational.of(-2));
        Ball y0 = Ball.of(new BigDecimal("0.2274074282016855"), new BigDecimal("1e-16"));
        Ball y1 = Ball.of(new BigDecimal("0.6182590207416910"), new BigDecimal("1e-16"));
        Rational t = Rational.of(3, 5);
        Jet low = LocalSeries.sum(airy, y0, y1, t, 400, 100).jet();
        Jet high = LocalSeries.sum(airy, y0, y1, t, 400, 300).jet();
        Jet ball = LocalSeries.sum(airy, y0, y1, Ball.of(t, 300), 400, 300).jet();
        assertTrue(low.value().overlaps(high.value()) && low.derivative().overlaps(high.derivative()), low + " / " + high);
        assertTrue(ball.value().overlaps(high.value()) && ball.derivative().overlaps(high.derivative()), ball + " / " + high);
    }

    @Test
    void aStepToTheSingularPointHasNoTailBound() {
        // Legendre's equation (1 − x²) y'' − 2x y' + 6 y = 0 (n = 2) is singular at ±1: from 0, a step of 1 reaches it.
        Equation legendre = Equations.legendre(2);
        Recurrence rec = new Recurrence(legendre, Rational.ZERO);
        assertThrows(LocalSeries.StepTooLongException.class,
                () -> LocalSeries.sum(rec, Ball.ONE, Ball.ZERO, Rational.ONE, 400, 100));
    }
}
