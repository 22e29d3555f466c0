package dev.odetab.ode;

import static org.junit.jupiter.api.Assertions.assertDoesNotThrow;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.odetab.expr.Poly;
import dev.odetab.numeric.Rational;
import org.junit.jupiter.api.Test;

/** Paths along the Legendre equation (1 − x²) y'' − 2x y' + 2 y = 0, singular at ±1 (DLMF 14.2.1). */
class RealPathTest {
    private static final Equation LEGENDRE_1 = new Equation(Poly.ONE.subtract(Poly.X.multiply(Poly.X)),
            Poly.X.scale(Rational.of(-2)), Poly.constant(Rational.of(2)));

    private static void check(String from, String to) {
        RealPath.checkPath(LEGENDRE_1.reduced(), LEGENDRE_1, Rational.parse(from), Rational.parse(to));
    }

    @Test
    void aPathBetweenTheSingularPointsIsAllowed() {
        assertDoesNotThrow(() -> check("-0.99", "0.99"));
        assertDoesNotThrow(() -> check("2", "7/3"));
    }

    @Test
    void aPathThroughOrOntoASingularPointNamesIt() {
        SingularCrossingException through = assertThrows(SingularCrossingException.class, () -> check("0", "3"));
        assertTrue(through.getMessage().startsWith("x = 1 is a singular point of"), through.getMessage());
        assertTrue(through.getMessage().contains("lies between 0 and 3"), through.getMessage());
        SingularCrossingException onto = assertThrows(SingularCrossingException.class, () -> check("1/2", "-1"));
        assertTrue(onto.getMessage().startsWith("x = -1 is a singular point"), onto.getMessage());
        // the root nearest to `from` is the one named
        SingularCrossingException nearest = assertThrows(SingularCrossingException.class, () -> check("3", "-3"));
        assertTrue(nearest.getMessage().startsWith("x = 1 is"), nearest.getMessage());
    }
}
