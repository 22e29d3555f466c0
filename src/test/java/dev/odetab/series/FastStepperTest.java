package dev.odetab.series;

import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.odetab.numeric.Ball;
import dev.odetab.numeric.DDBall;
import dev.odetab.numeric.Rational;
import dev.odetab.ode.Equation;
import java.math.BigDecimal;
import org.apfloat.Apfloat;
import org.apfloat.ApfloatMath;
import org.junit.jupiter.api.Test;

/**
 * {@link FastStepper}, one double-double Taylor step (docs/methods.md §1–2 in DDBall arithmetic): its
 * balls contain apfloat 1.15.0's values of e^x and Ai, Ai' and the BigDecimal step of
 * {@link LocalSeries} from the same state; a step onto a singular point gives null, never a
 * ball.
 */
class FastStepperTest {

    private static DDBall[] step(Equation eq, Rational center, DDBall y, DDBall dy, Rational t) {
        FastStepper s = new FastStepper(eq);
        return s.step(DDBall.of(center), y, dy, s.powers(DDBall.of(t)), DDBall.of(t.reciprocal()));
    }

    private static BigDecimal apfloat(Apfloat v) {
        return new BigDecimal(v.toString(true));
    }

    private static Apfloat apfloat(Rational r) {
        return new Apfloat(new BigDecimal(r.numerator()), 60).divide(new Apfloat(new BigDecimal(r.denominator()), 60));
    }

    @Test
    void exponentialStepsContainApfloatsValue() {
        for (String ts : new String[] {"1/8", "-1/3", "1/1024"}) {
            Rational t = Rational.parse(ts);
            DDBall[] r = step(Equations.EXP, Rational.ZERO, DDBall.of(1.0), DDBall.of(1.0), t);
            assertNotNull(r, ts);
            BigDecimal e = apfloat(ApfloatMath.exp(apfloat(t)));
            assertTrue(r[0].toBall().contains(e), "exp(" + ts + ") = " + e + " not in " + r[0].toBall());
            assertTrue(r[1].toBall().contains(e), "exp'(" + ts + ") = " + e + " not in " + r[1].toBall());
            assertTrue(r[0].toBall().rad().compareTo(new BigDecimal("1e-28")) < 0, "double-double width: " + r[0].toBall());
        }
    }

    @Test
    void airyStepContainsApfloatAndTheBigDecimalStep() {
        // state at x = -2 from apfloat (DLMF 9.2), rounded into double-double balls
        Rational c = Rational.of(-2);
        Apfloat x0 = apfloat(c);
        Ball y0 = Ball.of(apfloat(ApfloatMath.airyAi(x0)), new BigDecimal("1e-40"));
        Ball y1 = Ball.of(apfloat(ApfloatMath.airyAiPrime(x0)), new BigDecimal("1e-40"));
        Rational t = Rational.of(1, 4);
        DDBall[] fast = step(Equations.AIRY, c, DDBall.of(y0), DDBall.of(y1), t);
        assertNotNull(fast);
        Apfloat x1 = apfloat(c.add(t));
        BigDecimal ai = apfloat(ApfloatMath.airyAi(x1));
        BigDecimal aip = apfloat(ApfloatMath.airyAiPrime(x1));
        assertTrue(fast[0].toBall().contains(ai), "Ai(-7/4) = " + ai + " not in " + fast[0].toBall());
        assertTrue(fast[1].toBall().contains(aip), "Ai'(-7/4) = " + aip + " not in " + fast[1].toBall());
        Jet slow = LocalSeries.sum(new Recurrence(Equations.AIRY, c), y0, y1, t, 400, 256).jet();
        assertTrue(fast[0].toBall().overlaps(slow.value()), "value against LocalSeries");
        assertTrue(fast[1].toBall().overlaps(slow.derivative()), "derivative against LocalSeries");
    }

    @Test
    void aStepOntoASingularPointGivesNull() {
        // Legendre n = 2, singular at ±1: from 0 a step of 1 has no admissible tail radius
        Equation legendre = Equations.legendre(2);
        assertNull(step(legendre, Rational.ZERO, DDBall.of(1.0), DDBall.of(0.0), Rational.ONE));
    }
}
