package dev.odetab.series;

import static org.junit.jupiter.api.Assertions.assertEquals;

import dev.odetab.numeric.Rational;
import org.junit.jupiter.api.Test;

/**
 * {@link Recurrence} against the closed forms of its coefficients beta_j(m) (docs/methods.md §1) for
 * Airy's and Legendre's equations, and its order.
 */
class RecurrenceTest {


    @Test
    void recurrenceMatchesTheClosedFormsOfMethodsSection1() {
        // Airy at alpha: beta_2 = alpha/(m(m−1)), beta_3 = 1/(m(m−1)); Legendre at 0:
        // beta_2(m) = ((m−2)(m−1) − n(n+1))/(m(m−1)).
        Recurrence airy = new Recurrence(Equations.AIRY, Rational.of(-3));
        assertEquals(3, airy.order());
        for (int m = 2; m < 20; m++) {
            assertEquals(Rational.ZERO, airy.beta(1, m));
            assertEquals(Rational.of(-3, (long) m * (m - 1)), airy.beta(2, m));
            assertEquals(Rational.of(1, (long) m * (m - 1)), airy.beta(3, m));
        }
        Recurrence leg = new Recurrence(Equations.legendre(5), Rational.ZERO);
        for (int m = 2; m < 20; m++) {
            assertEquals(Rational.of((long) (m - 2) * (m - 1) - 30, (long) m * (m - 1)), leg.beta(2, m));
        }
    }
}
