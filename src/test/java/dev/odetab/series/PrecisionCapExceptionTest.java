package dev.odetab.series;

import static org.junit.jupiter.api.Assertions.assertEquals;

import dev.odetab.numeric.Ball;
import java.math.BigDecimal;
import org.junit.jupiter.api.Test;

/** The cap's message names the last enclosure in a few characters, whatever its precision (issue 17, item 9). */
class PrecisionCapExceptionTest {
    @Test
    void theEnclosureIsBrief() {
        // a midpoint of 2,000 digits, as at a cap of several thousand bits
        BigDecimal mid = new BigDecimal("0." + "3".repeat(1999) + "7");
        Ball b = Ball.of(mid, new BigDecimal("1.234E-1990"));
        assertEquals("0.33333333333333333 ± 1.3e-1990", PrecisionCapException.brief(b));
        assertEquals("the precision cap of 8192 bits was reached before the rounding could be decided"
                + " (last enclosure 0.33333333333333333 ± 1.3e-1990)", new PrecisionCapException(8192, b).getMessage());
        assertEquals("-7e-618 ± 6.7e-616", PrecisionCapException.brief(Ball.of(new BigDecimal("-7E-618"), new BigDecimal("6.62822627844E-616"))));
    }
}
