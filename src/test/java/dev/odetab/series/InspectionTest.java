package dev.odetab.series;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.odetab.numeric.Rational;
import dev.odetab.ode.FunctionDef;
import dev.odetab.ode.family.Catalog;
import java.math.BigDecimal;
import java.util.List;
import java.util.Map;
import org.apfloat.Apfloat;
import org.apfloat.ApfloatMath;
import org.junit.jupiter.api.Test;

/**
 * {@link Inspection}: Ai's Taylor coefficients at 0 against apfloat 1.15.0's closed forms (c(0) = Ai(0),
 * c(1) = Ai'(0), c(2) = 0, c(3) = Ai(0)/6 by the recurrence of y'' = x y, DLMF 9.2.1); P_3 is
 * found to be the exact polynomial (5x³ − 3x)/2 (DLMF 18.5.1 table); Airy is not.
 */
class InspectionTest {
    @Test
    void airyCoefficientsAtZeroMatchApfloat() throws Exception {
        FunctionDef ai = Catalog.lookup("airy-ai").orElseThrow().define(Map.of());
        List<Inspection.Coefficient> c = Inspection.coefficients(ai, Rational.ZERO, 4, 20, 128);
        // DLMF 9.2.3, 9.2.4: Ai(0) = 1/(3^(2/3) Γ(2/3)), Ai'(0) = −1/(3^(1/3) Γ(1/3)), with apfloat's cbrt and gamma
        Apfloat one = new Apfloat(1, 40);
        Apfloat three = new Apfloat(3, 40);
        Apfloat ai0 = one.divide(ApfloatMath.cbrt(new Apfloat(9, 40)).multiply(ApfloatMath.gamma(new Apfloat(2, 40).divide(three))));
        Apfloat aip0 = one.divide(ApfloatMath.cbrt(three).multiply(ApfloatMath.gamma(one.divide(three)))).negate();
        BigDecimal[] expected = {new BigDecimal(ai0.toString(true)), new BigDecimal(aip0.toString(true)), BigDecimal.ZERO,
            new BigDecimal(ai0.divide(new Apfloat(6, 40)).toString(true))};
        for (int m = 0; m < 4; m++) {
            BigDecimal slack = expected[m].signum() == 0 ? BigDecimal.ZERO : expected[m].ulp().multiply(BigDecimal.TEN);
            assertTrue(c.get(m).enclosure().addError(slack).contains(expected[m]), "c(" + m + ") = " + c.get(m).enclosure());
            assertTrue(c.get(m).rounded().isPresent(), "c(" + m + ") decided at 128 bits");
            assertTrue(c.get(m).rounded().get().subtract(expected[m]).abs().compareTo(new BigDecimal("1e-20")) <= 0,
                    "c(" + m + ") rounded to " + c.get(m).rounded().get());
        }
        assertTrue(Inspection.terminating(ai).isEmpty());
        assertTrue(Inspection.recurrence(ai.equation(), Rational.ZERO).contains("c(m)"), Inspection.recurrence(ai.equation(), Rational.ZERO));
    }

    @Test
    void legendreP3IsAnExactPolynomial() throws Exception {
        FunctionDef p3 = Catalog.lookup("legendre-p").orElseThrow().define(Map.of("n", Rational.of(3)));
        Inspection.Terminating t = Inspection.terminating(p3).orElseThrow();
        assertEquals(3, t.polynomial().degree());
        assertEquals(Rational.ONE, t.polynomial().evaluate(Rational.ONE), "P_3(1) = 1 (DLMF 18.6.1)");
        assertEquals(Rational.of(-7, 16), t.polynomial().evaluate(Rational.of(1, 2)), "P_3(1/2) = (5/8 - 3/2)/2");
    }
}
