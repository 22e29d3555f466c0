package dev.odetab.ode.family;

import dev.odetab.numeric.Rational;
import dev.odetab.ode.FunctionDef;
import java.util.List;
import java.util.Map;
import org.apache.commons.math3.analysis.polynomials.PolynomialsUtils;
import org.apfloat.ApfloatMath;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;

/** T_n against apfloat 1.15.0 (ApfloatMath.chebyshevT) and commons-math3 3.6.1. */
class ChebyshevTTest {
    private static FunctionDef t(int n) throws ParameterException {
        return new ChebyshevT().define(Map.of("n", Rational.of(n)));
    }

    @Test
    void binary64MatchesApfloat() throws Exception {
        List<Rational> xs = FamilyChecks.points("-0.98", "0.04", 50);
        for (int n : new int[] {0, 1, 2, 7, 20}) {
            FamilyChecks.assertBinary64(t(n), xs, x -> ApfloatMath.chebyshevT(FamilyChecks.apfloat(n), x), "T_" + n);
        }
    }

    @Test
    @Tag("slow")
    void binary64MatchesApfloatHighDegrees() throws Exception {
        List<Rational> xs = FamilyChecks.points("-0.98", "0.04", 50);
        for (int n : new int[] {33, 60}) {
            FamilyChecks.assertBinary64(t(n), xs, x -> ApfloatMath.chebyshevT(FamilyChecks.apfloat(n), x), "T_" + n);
        }
    }

    @Test
    void coefficientsMatchCommonsMath() throws Exception {
        for (int n = 0; n <= 12; n++) {
            FamilyChecks.assertCoefficients(t(n), PolynomialsUtils.createChebyshevPolynomial(n), "T_" + n);
        }
    }

    @Test
    void parameterErrors() {
        FamilyChecks.assertBadInput("argument 4 'n=-3', column 1: n = -3 is outside the allowed range: an integer 0 <= n <= 1000",
                "eval", "chebyshev-t", "-p", "n=-3", "0.5");
    }
}
