package dev.odetab.series;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.odetab.expr.Poly;
import dev.odetab.numeric.Rational;
import dev.odetab.ode.Equation;
import java.util.Optional;
import org.apache.commons.math3.analysis.polynomials.PolynomialFunction;
import org.apache.commons.math3.analysis.polynomials.PolynomialsUtils;
import org.junit.jupiter.api.Test;

/** Terminating series found from the recurrence, against commons-math3 3.6.1 PolynomialsUtils. */
class ExactPolynomialTest {
    private static Equation legendre(int n) {
        return new Equation(Poly.of(Rational.ONE, Rational.ZERO, Rational.of(-1)), Poly.of(Rational.ZERO, Rational.of(-2)),
                Poly.constant(Rational.of((long) n * (n + 1))));
    }

    @Test
    void legendrePolynomialsComeOutExactly() {
        for (int n = 0; n <= 12; n++) {
            PolynomialFunction ref = PolynomialsUtils.createLegendrePolynomial(n);
            double[] c = ref.getCoefficients();
            // P_n(1/2) and P_n'(1/2) from the reference, as exact binary fractions: commons-math3 keeps
            // the coefficients as exact fractions internally and its doubles are exact here (n <= 12).
            Rational at = Rational.of(1, 2);
            Rational y0 = Rational.ZERO;
            Rational y1 = Rational.ZERO;
            for (int i = c.length - 1; i >= 0; i--) {
                y0 = y0.multiply(at).add(Rational.of(new java.math.BigDecimal(c[i])));
            }
            for (int i = c.length - 1; i >= 1; i--) {
                y1 = y1.multiply(at).add(Rational.of(new java.math.BigDecimal(c[i])).multiply(i));
            }
            Optional<Poly> p = ExactPolynomial.detect(legendre(n), at, y0, y1, 100);
            assertTrue(p.isPresent(), "P_" + n + " not detected");
            assertEquals(n, p.get().degree());
            for (int i = 0; i < c.length; i++) {
                assertEquals(Rational.of(new java.math.BigDecimal(c[i])), p.get().coefficient(i), "P_" + n + " coefficient " + i);
            }
        }
    }

    @Test
    void noPolynomialWhereNoneCanExist() {
        Equation airy = new Equation(Poly.ONE, Poly.ZERO, Poly.X.negate());
        assertEquals(-1, ExactPolynomial.largestPossibleDegree(airy));
        assertTrue(ExactPolynomial.detect(airy, Rational.ZERO, Rational.ONE, Rational.ZERO, 100).isEmpty());
        // the even solution of Legendre's equation with n = 5 does not terminate (DLMF 14.2: it is a Q-type function)
        assertTrue(ExactPolynomial.detect(legendre(5), Rational.ZERO, Rational.ONE, Rational.ZERO, 100).isEmpty());
        assertEquals(5, ExactPolynomial.largestPossibleDegree(legendre(5)));
    }
}
