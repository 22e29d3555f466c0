package dev.odetab.tables.quadrature;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.odetab.expr.Poly;
import dev.odetab.numeric.Rational;
import dev.odetab.ode.FunctionDef;
import dev.odetab.ode.family.OrthogonalFamily;
import dev.odetab.series.FunctionEvaluator;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;

/**
 * The exact data of Gauss rules: the three-term recurrences of DLMF 18.9.1 (Table 18.9.1), run in
 * integers by {@link GaussPolynomial.Evaluator}, must give the same polynomials as the families of
 * {@code ode/family}, which are normalized by the explicit sums of DLMF 18.5 (two independent
 * sources for one normalization, DLMF 18.3); and the Jacobi-matrix seeds must be the zeros.
 */
class GaussPolynomialTest {
    private static final List<Rational> POINTS = List.of(Rational.ZERO, Rational.of(1, 3), Rational.of(-2, 7), Rational.of(5, 4),
            Rational.of(-13, 8));

    private static void assertSamePolynomial(OrthogonalFamily kind, String a, String b) throws Exception {
        for (int n : new int[] {1, 2, 3, 4, 5, 6, 9, 14}) {
            Rational ra = a == null ? Rational.ZERO : Rational.parse(a);
            Rational rb = b == null ? Rational.ZERO : Rational.parse(b);
            FunctionDef f = GaussRuleTest.definition(kind, n, ra, rb);
            Poly p = FunctionEvaluator.polynomial(f).orElseThrow();
            GaussPolynomial.Evaluator e = new GaussPolynomial(kind, n, f.parameters()).new Evaluator();
            for (Rational x : POINTS) {
                GaussPolynomial.ExactJet jet = e.at(x);
                String what = kind.name() + " n = " + n + " at x = " + x.toDecimalOrFraction();
                assertEquals(p.evaluate(x), Rational.of(jet.value(), jet.denominator()), what);
                assertEquals(p.derivative().evaluate(x), jet.slopeExact(), what + " (derivative)");
                assertTrue(jet.valueBall(80).contains(p.evaluate(x)), what + ": the value's ball must contain it");
                assertTrue(jet.slopeBall(80).contains(p.derivative().evaluate(x)), what + ": the slope's ball must contain it");
            }
        }
    }

    @Test
    void recurrencesAgreeWithTheFamilyNormalizations() throws Exception {
        assertSamePolynomial(GaussRuleTest.LEGENDRE, null, null);
        assertSamePolynomial(GaussRuleTest.HERMITE, null, null);
        assertSamePolynomial(GaussRuleTest.LAGUERRE, "0", null);
        assertSamePolynomial(GaussRuleTest.LAGUERRE, "-2/3", null);
        assertSamePolynomial(GaussRuleTest.CHEBYSHEV_T, null, null);
        assertSamePolynomial(GaussRuleTest.CHEBYSHEV_U, null, null);
        assertSamePolynomial(GaussRuleTest.GEGENBAUER, "5/2", null);
        assertSamePolynomial(GaussRuleTest.GEGENBAUER, "-1/3", null);
        assertSamePolynomial(GaussRuleTest.JACOBI, "1/2", "-3/4");
        assertSamePolynomial(GaussRuleTest.JACOBI, "0", "0");
        assertSamePolynomial(GaussRuleTest.JACOBI, "-1/2", "-1/2");
    }

    @Test
    void jacobiMatrixSeedsAreCloseToTheZeros() throws Exception {
        // Legendre n = 5 zeros (A&S Table 25.4, the nodes of the rule whose weights are formula 25.4.29; from memory): 0, ±0.5384693101056831, ±0.9061798459386640
        double[] seeds = GaussRule.eigenvaluesEstimate(new GaussPolynomial(GaussRuleTest.LEGENDRE, 5, Map.of("n", Rational.of(5))), 0, 5);
        double[] expected = {-0.906179845938664, -0.5384693101056831, 0, 0.5384693101056831, 0.906179845938664};
        for (int i = 0; i < 5; i++) {
            assertEquals(expected[i], seeds[i], 1e-14, "seed " + (i + 1));
        }
    }
}
