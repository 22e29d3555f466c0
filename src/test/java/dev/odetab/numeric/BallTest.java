package dev.odetab.numeric;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.math.BigDecimal;
import org.junit.jupiter.api.Test;

class BallTest {
    @Test
    void exactQuotientHasZeroRadius() {
        Ball fifth = Ball.ONE.divide(Ball.exact(5), 64);
        assertEquals(0, fifth.mid().compareTo(new BigDecimal("0.2")));
        assertEquals(0, fifth.rad().signum(), fifth::toString);
    }

    @Test
    void inexactQuotientContainsTheRationalAndIsTight() {
        for (int precBits : new int[] {64, 200}) {
            Ball third = Ball.exact(-2).divide(Ball.exact(3), precBits);
            assertTrue(third.contains(Rational.of(-2, 3)), third::toString);
            // one unit in the last of digits10(precBits) digits of 0.66…: 10^-digits10
            BigDecimal unit = BigDecimal.ONE.movePointLeft(Precision.digits10(precBits));
            assertTrue(third.rad().compareTo(unit) <= 0, third::toString);
        }
    }
}
