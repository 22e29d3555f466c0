package dev.odetab.series;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.odetab.expr.Poly;
import dev.odetab.numeric.Rational;
import dev.odetab.ode.Equation;
import org.junit.jupiter.api.Test;

/**
 * The step rule min(r·ρ, s/(1 + √|P0/P2| + |P1/P2|)) with each use's fractions, worked out by
 * hand on two equations: Airy (y'' − x y = 0, ρ infinite, so only the oscillation term
 * counts) and Legendre of degree 0 ((1 − x²) y'' − 2x y' = 0, singular at ±1, so ρ = 1 at 0).
 */
class StepChooserTest {
    private static final Equation AIRY = new Equation(Poly.ONE, Poly.ZERO, Poly.X.negate());
    private static final Equation LEGENDRE_0 = new Equation(Poly.ONE.subtract(Poly.X.multiply(Poly.X)),
            Poly.X.scale(Rational.of(-2)), Poly.ZERO);

    private static Recurrence at(Equation e, String c) {
        return new Recurrence(e.reduced(), Rational.parse(c));
    }

    @Test
    void oscillationTermAtAiryMinus16() {
        // √|P0/P2| = √16 = 4: the length is s/5.
        Recurrence rec = at(AIRY, "-16");
        assertEquals(2.0 / 5, StepChooser.lengthEstimate(AIRY.reduced(), rec, StepChooser.Use.CONTINUATION));
        assertEquals(1.0 / 5, StepChooser.lengthEstimate(AIRY.reduced(), rec, StepChooser.Use.FAST_TIER));
        assertEquals(1.0 / 5, StepChooser.lengthEstimate(AIRY.reduced(), rec, StepChooser.Use.ZERO_CELL));
    }

    @Test
    void contractionTermAtLegendreZero() {
        // Σ |a_j/a_0| r^j = r² = 1 at c = 0, so ρ = 1; P0 = P1 = 0 there, so the oscillation term is s.
        Recurrence rec = at(LEGENDRE_0, "0");
        double rho = LocalSeries.contractionRadiusEstimate(rec);
        assertTrue(Math.abs(rho - 1) < 1e-9, "rho = " + rho);
        assertEquals(0.5 * rho, StepChooser.lengthEstimate(LEGENDRE_0.reduced(), rec, StepChooser.Use.CONTINUATION));
        assertEquals(0.25 * rho, StepChooser.lengthEstimate(LEGENDRE_0.reduced(), rec, StepChooser.Use.FAST_TIER));
        assertEquals(0.5 * rho, StepChooser.lengthEstimate(LEGENDRE_0.reduced(), rec, StepChooser.Use.ZERO_CELL));
    }

    @Test
    void stepsArePowersOfTwoTowardTheTarget() {
        Recurrence rec = at(AIRY, "-16");
        Equation r = AIRY.reduced();
        // length 2/5: the power of two below it is 1/4, signed toward the target
        assertEquals(Rational.of(-1, 4), StepChooser.chooseStep(r, rec, Rational.of(-10), StepChooser.Use.CONTINUATION));
        assertEquals(Rational.of(1, 4), StepChooser.chooseStep(r, rec, Rational.of(10), StepChooser.Use.CONTINUATION));
        // a remaining 3/10 within the length 2/5 is taken at once by the continuation ...
        assertEquals(Rational.of(-3, 10), StepChooser.chooseStep(r, rec, Rational.of(-3, 10), StepChooser.Use.CONTINUATION));
        // ... while a zero-search cell (length 1/5) stays a power of two: 1/8
        assertEquals(Rational.of(-1, 8), StepChooser.chooseStep(r, rec, Rational.of(-3, 20), StepChooser.Use.ZERO_CELL));
        // and a remaining distance below the power of two is taken whole
        assertEquals(Rational.of(1, 10), StepChooser.chooseStep(r, rec, Rational.of(1, 10), StepChooser.Use.ZERO_CELL));
    }

    @Test
    void powerOfTwoBelowIsClamped() {
        assertEquals(Rational.of(1, 8), StepChooser.powerOfTwoBelow(0.2));
        assertEquals(Rational.ONE, StepChooser.powerOfTwoBelow(1.0));
        assertEquals(Rational.of(java.math.BigInteger.ONE.shiftLeft(60)), StepChooser.powerOfTwoBelow(Double.POSITIVE_INFINITY));
    }

    @Test
    void substepsKeepEachStepWithinTheFastTierLength() {
        // Airy on [−16, −15] with grid step 1: at −16 the fast-tier length is 1/5, at −15 it is
        // 1/(1 + √15) > 1/5; so 5 sub-steps.
        assertEquals(5, StepChooser.chooseSubsteps(AIRY.reduced(), Rational.of(-16), Rational.of(-15), Rational.ONE));
        assertEquals(1, StepChooser.chooseSubsteps(AIRY.reduced(), Rational.ZERO, Rational.of(1, 100), Rational.of(1, 1000)));
    }

    @Test
    void maxTermsGrowWithPrecision() {
        assertEquals(2400, StepChooser.chooseMaxTerms(100));
        assertEquals(4 * 1024 + 2000, StepChooser.chooseMaxTerms(1024));
    }
}
