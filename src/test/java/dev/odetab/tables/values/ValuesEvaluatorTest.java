package dev.odetab.tables.values;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.odetab.numeric.Ball;
import java.math.BigDecimal;
import java.math.MathContext;
import org.junit.jupiter.api.Test;

/**
 * The relative error figure printed in provenance is a proven bound: shortened to three digits,
 * it must round up, never to nearest.
 */
class ValuesEvaluatorTest {
    @Test
    void relativeRadiusRoundsUp() {
        // rad/(|mid| − rad) = 1.8001e-21 exactly: half-up would print 1.80e-21, below the bound
        BigDecimal rad = new BigDecimal("1.8001e-21");
        Ball b = Ball.of(BigDecimal.ONE.add(rad), rad);
        assertEquals(new BigDecimal("1.81e-21"), ValuesEvaluator.relative(b));
        // negative values too: the bound is on |y|
        Ball neg = Ball.of(BigDecimal.ONE.add(rad).negate(), rad);
        assertEquals(new BigDecimal("1.81e-21"), ValuesEvaluator.relative(neg));
    }

    @Test
    void relativeRadiusIsAnUpperBoundOverTheBall() {
        // every y in [mid − rad, mid + rad] has rad/|y| <= rad/(|mid| − rad) <= the figure
        BigDecimal mid = new BigDecimal("3.14159");
        BigDecimal rad = new BigDecimal("2.7e-30");
        BigDecimal figure = ValuesEvaluator.relative(Ball.of(mid, rad));
        BigDecimal worst = rad.divide(mid.subtract(rad), new MathContext(40));
        assertTrue(figure.compareTo(worst) >= 0, figure + " < " + worst);
        assertTrue(figure.compareTo(worst.multiply(new BigDecimal("1.01"))) <= 0, figure + " is far above " + worst);
    }

    @Test
    void exactAndNearZeroBalls() {
        assertEquals(BigDecimal.ZERO, ValuesEvaluator.relative(Ball.of(BigDecimal.ONE, BigDecimal.ZERO)));
        // a ball within a radius of 0 reports the radius itself (absolute, as the provenance says)
        BigDecimal rad = new BigDecimal("1e-5");
        assertEquals(rad, ValuesEvaluator.relative(Ball.of(new BigDecimal("1.5e-5"), rad)));
    }
}
