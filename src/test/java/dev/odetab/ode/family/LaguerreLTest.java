package dev.odetab.ode.family;

import dev.odetab.numeric.Rational;
import dev.odetab.ode.FunctionDef;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import org.apache.commons.math3.analysis.polynomials.PolynomialsUtils;
import org.apfloat.ApfloatMath;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;

/** L_n^(α) against apfloat 1.15.0 (ApfloatMath.laguerreL(n, α, x)) and commons-math3 3.6.1 (α = 0). */
class LaguerreLTest {
    private static FunctionDef l(int n, Rational alpha) throws ParameterException {
        Map<String, Rational> p = new HashMap<>(Map.of("n", Rational.of(n)));
        if (alpha != null) {
            p.put("alpha", alpha);
        }
        return new LaguerreL().define(p);
    }

    private static void check(int[] degrees, List<Rational> xs) throws Exception {
        for (String a : new String[] {"0", "-1/2", "5/2"}) {
            Rational alpha = Rational.parse(a);
            for (int n : degrees) {
                FamilyChecks.assertBinary64(l(n, alpha), xs,
                        x -> ApfloatMath.laguerreL(FamilyChecks.apfloat(n), FamilyChecks.apfloat(alpha), x), "L_" + n + "^(" + a + ")");
            }
        }
    }

    @Test
    void binary64MatchesApfloat() throws Exception {
        check(new int[] {1, 7}, FamilyChecks.points("-2", "0.88", 25));
    }

    @Test
    @Tag("slow")
    void binary64MatchesApfloatHighDegrees() throws Exception {
        check(new int[] {0, 2, 20, 33, 60}, FamilyChecks.points("-2", "0.44", 50));
    }

    @Test
    void coefficientsMatchCommonsMath() throws Exception {
        for (int n = 0; n <= 12; n++) {
            FamilyChecks.assertCoefficients(l(n, null), PolynomialsUtils.createLaguerrePolynomial(n), "L_" + n);
        }
    }

    @Test
    void parameterErrors() {
        FamilyChecks.assertBadInput("argument 6 'alpha=-1', column 1: alpha = -1 is outside the allowed range: a rational -1 < alpha <= 1000",
                "eval", "laguerre-l", "-p", "n=3", "-p", "alpha=-1", "0.5");
        FamilyChecks.assertBadInput("argument 4 'n=-1', column 1: n = -1 is outside the allowed range: an integer 0 <= n <= 1000",
                "eval", "laguerre-l", "-p", "n=-1", "0.5");
    }
}
