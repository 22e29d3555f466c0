package dev.odetab.numeric;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.math.BigDecimal;
import java.util.Random;
import org.junit.jupiter.api.Test;

/**
 * BallFunctions against big-math 2.3.2 through {@link IndependentCheck}: at random rational
 * points every ball meets big-math's value within its stated tolerance; the fixed set that
 * {@code odetab check} reports agrees; and a wrong value is reported as a disagreement.
 */
class IndependentCheckTest {
    private static final long SEED = Long.getLong("test.seed", 20261204L);

    @Test
    void ballFunctionsMeetBigMathAtRandomPoints() {
        Random rnd = new Random(SEED);
        for (int i = 0; i < 35; i++) {
            IndependentCheck.Function fn = IndependentCheck.Function.values()[2 + i % 5];
            // numerators and denominators of a few digits; positive where the domain needs it
            long num = 1 + rnd.nextInt(99_999);
            long den = 1 + rnd.nextInt(999);
            Rational x = Rational.of(num, den);
            if (fn == IndependentCheck.Function.EXP || fn == IndependentCheck.Function.GAMMA) {
                x = Rational.of(num % 6_000 - 3_000, 100 + den); // |x| < 30: exp and Γ stay in a sane range
                if (fn == IndependentCheck.Function.GAMMA && x.isInteger() && x.signum() <= 0) {
                    x = x.add(Rational.of(1, 2));
                }
            }
            int precBits = 64 + rnd.nextInt(400);
            IndependentCheck.Outcome o = IndependentCheck.compare(fn, x, precBits);
            assertTrue(o.agrees(), "seed " + SEED + ": " + o.label() + " at " + precBits + " bits: ours " + o.ours()
                    + ", big-math " + o.theirs() + ", " + o.units() + " units apart");
        }
    }

    @Test
    void theStandardSetAgreesAndNamesItsPoints() {
        var all = IndependentCheck.standard(200);
        assertEquals(19, all.size());
        assertEquals("pi", all.get(0).label());
        assertEquals("gamma(-2.5)", all.get(all.size() - 2).label());
        for (IndependentCheck.Outcome o : all) {
            assertTrue(o.agrees(), o.label() + ": " + o.ours() + " against " + o.theirs());
        }
    }

    @Test
    void aValueOutsideTheBallBeyondTheToleranceDisagrees() {
        // π to 30 digits against a ball around 3.14159 of radius 10^-6: 2.65...e-6 - 1e-6 beyond
        Ball rough = Ball.of(new BigDecimal("3.14159"), new BigDecimal("1e-6"));
        BigDecimal pi = new BigDecimal("3.14159265358979323846264338328");
        double units = pi.subtract(rough.mid()).abs().subtract(rough.rad()).divide(pi.ulp()).doubleValue();
        IndependentCheck.Outcome o = new IndependentCheck.Outcome(IndependentCheck.Function.PI, Rational.ZERO, rough, pi, units);
        assertFalse(o.agrees(), "1.65e-6 is 1.65e23 units of 1e-29");
    }
}
