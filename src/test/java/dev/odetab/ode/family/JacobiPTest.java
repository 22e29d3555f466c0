package dev.odetab.ode.family;

import dev.odetab.numeric.Rational;
import dev.odetab.ode.FunctionDef;
import java.util.List;
import java.util.Map;
import org.apache.commons.math3.analysis.polynomials.PolynomialsUtils;
import org.apfloat.ApfloatMath;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;

/** P_n^(α,β) against apfloat 1.15.0 (ApfloatMath.jacobiP(n, α, β, x)) and commons-math3 3.6.1. */
class JacobiPTest {
    private static FunctionDef p(int n, Rational alpha, Rational beta) throws ParameterException {
        return new JacobiP().define(Map.of("n", Rational.of(n), "alpha", alpha, "beta", beta));
    }

    private static void check(int[] degrees) throws Exception {
        List<Rational> xs = FamilyChecks.points("-0.98", "0.04", 50);
        Rational beta = Rational.of(1, 3);
        for (String a : new String[] {"-1/2", "5/2"}) {
            Rational alpha = Rational.parse(a);
            for (int n : degrees) {
                FamilyChecks.assertBinary64(p(n, alpha, beta), xs, x -> ApfloatMath.jacobiP(FamilyChecks.apfloat(n),
                        FamilyChecks.apfloat(alpha), FamilyChecks.apfloat(beta), x), "P_" + n + "^(" + a + ", 1/3)");
            }
        }
    }

    @Test
    void binary64MatchesApfloat() throws Exception {
        check(new int[] {0, 1, 2, 7, 20});
    }

    @Test
    @Tag("slow")
    void binary64MatchesApfloatHighDegrees() throws Exception {
        check(new int[] {33, 60});
    }

    @Test
    void coefficientsMatchCommonsMath() throws Exception {
        for (int n = 0; n <= 12; n++) {
            FamilyChecks.assertCoefficients(p(n, Rational.ONE, Rational.TWO), PolynomialsUtils.createJacobiPolynomial(n, 1, 2), "P_" + n + "^(1, 2)");
        }
    }

    @Test
    void parameterErrors() {
        FamilyChecks.assertBadInput("argument 8 'beta=-3/2', column 1: beta = -1.5 is outside the allowed range: a rational -1 < beta <= 1000",
                "eval", "jacobi-p", "-p", "n=3", "-p", "alpha=0", "-p", "beta=-3/2", "0.5");
    }
}
