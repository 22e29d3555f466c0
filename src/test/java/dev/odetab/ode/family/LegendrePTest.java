package dev.odetab.ode.family;

import static org.junit.jupiter.api.Assertions.assertEquals;

import dev.odetab.numeric.Rational;
import dev.odetab.ode.FunctionDef;
import dev.odetab.series.FunctionEvaluator;
import java.util.List;
import java.util.Map;
import org.apache.commons.math3.analysis.polynomials.PolynomialsUtils;
import org.apfloat.ApfloatMath;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;

/** P_n against apfloat 1.15.0 (ApfloatMath.legendreP), commons-math3 3.6.1 and DLMF 18.6.1. */
class LegendrePTest {
    private static FunctionDef p(int n) throws ParameterException {
        return new LegendreP().define(Map.of("n", Rational.of(n)));
    }

    @Test
    void binary64MatchesApfloat() throws Exception {
        List<Rational> xs = FamilyChecks.points("-0.98", "0.04", 50);
        for (int n : new int[] {0, 1, 2, 7, 20}) {
            FamilyChecks.assertBinary64(p(n), xs, x -> ApfloatMath.legendreP(FamilyChecks.apfloat(n), x), "P_" + n);
        }
    }

    @Test
    @Tag("slow")
    void binary64MatchesApfloatHighDegrees() throws Exception {
        List<Rational> xs = FamilyChecks.points("-0.98", "0.04", 50);
        for (int n : new int[] {33, 60}) {
            FamilyChecks.assertBinary64(p(n), xs, x -> ApfloatMath.legendreP(FamilyChecks.apfloat(n), x), "P_" + n);
        }
    }

    @Test
    void coefficientsMatchCommonsMath() throws Exception {
        for (int n = 0; n <= 12; n++) {
            FamilyChecks.assertCoefficients(p(n), PolynomialsUtils.createLegendrePolynomial(n), "P_" + n);
        }
    }

    @Test
    void oneAtOneAndParityAtMinusOne() throws Exception {
        // DLMF 18.6.1: P_n(1) = 1, P_n(−1) = (−1)^n
        for (int n : new int[] {0, 3, 10, 101}) {
            FunctionDef f = p(n);
            assertEquals(Rational.ONE, FunctionEvaluator.exact(f, Rational.ONE, false).orElseThrow(), "P_" + n + "(1)");
            assertEquals(Rational.of(Degrees.sign(n)), FunctionEvaluator.exact(f, Rational.of(-1), false).orElseThrow(), "P_" + n + "(-1)");
        }
    }

    @Test
    void parameterErrors() {
        FamilyChecks.assertBadInput("argument 4 'n=-1', column 1: n = -1 is outside the allowed range: an integer 0 <= n <= 1000",
                "eval", "legendre-p", "-p", "n=-1", "0.5");
        FamilyChecks.assertBadInput("argument 4 'n=5/2', column 1: n = 2.5 is outside the allowed range: an integer 0 <= n <= 1000",
                "eval", "legendre-p", "-p", "n=5/2", "0.5");
        FamilyChecks.assertBadInput("argument 4 'n=1001', column 1: n = 1001 is outside the allowed range: an integer 0 <= n <= 1000",
                "eval", "legendre-p", "-p", "n=1001", "0.5");
    }
}
