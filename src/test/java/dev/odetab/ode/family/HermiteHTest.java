package dev.odetab.ode.family;

import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.odetab.numeric.Rational;
import dev.odetab.ode.FunctionDef;
import dev.odetab.series.FunctionEvaluator;
import java.util.List;
import java.util.Map;
import org.apache.commons.math3.analysis.polynomials.PolynomialsUtils;
import org.apfloat.ApfloatMath;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;

/**
 * H_n and the Hermite function H_ν against apfloat 1.15.0 (ApfloatMath.hermiteH, which also takes
 * a non-integer order), and the coefficients of H_n against commons-math3 3.6.1.
 */
class HermiteHTest {
    private static FunctionDef h(Rational n) throws ParameterException {
        return new HermiteH().define(Map.of("n", n));
    }

    @Test
    void polynomialsMatchApfloat() throws Exception {
        List<Rational> xs = FamilyChecks.points("-4.9", "0.2", 50);
        for (int n : new int[] {1, 7}) {
            FamilyChecks.assertBinary64(h(Rational.of(n)), xs, x -> ApfloatMath.hermiteH(FamilyChecks.apfloat(n), x), "H_" + n);
        }
    }

    @Test
    @Tag("slow")
    void polynomialsMatchApfloatHighDegrees() throws Exception {
        List<Rational> xs = FamilyChecks.points("-4.9", "0.2", 50);
        for (int n : new int[] {0, 2, 20, 33, 60}) {
            FamilyChecks.assertBinary64(h(Rational.of(n)), xs, x -> ApfloatMath.hermiteH(FamilyChecks.apfloat(n), x), "H_" + n);
        }
    }

    @Test
    void halfOrderMatchesApfloat() throws Exception {
        Rational v = Rational.of(1, 2);
        FamilyChecks.assertBinary64(h(v), FamilyChecks.points("-2.4", "0.4", 12), x -> ApfloatMath.hermiteH(FamilyChecks.apfloat(v), x), "H_1/2");
    }

    @Test
    @Tag("slow")
    void nonIntegerOrdersMatchApfloat() throws Exception {
        List<Rational> xs = FamilyChecks.points("-2.45", "0.1", 50);
        for (String nu : new String[] {"1/2", "-5/3", "7/3"}) {
            Rational v = Rational.parse(nu);
            FunctionDef f = h(v);
            assertTrue(FunctionEvaluator.polynomial(f).isEmpty(), "H_" + nu + " is not a polynomial");
            FamilyChecks.assertBinary64(f, xs, x -> ApfloatMath.hermiteH(FamilyChecks.apfloat(v), x), "H_" + nu);
        }
    }

    @Test
    void coefficientsMatchCommonsMath() throws Exception {
        for (int n = 0; n <= 12; n++) {
            FamilyChecks.assertCoefficients(h(Rational.of(n)), PolynomialsUtils.createHermitePolynomial(n), "H_" + n);
        }
    }

    @Test
    void parameterErrors() {
        String range = "an integer 0 <= n <= 1000, or a non-integer rational with |n| <= 1000";
        FamilyChecks.assertBadInput("argument 4 'n=-2', column 1: n = -2 is outside the allowed range: " + range,
                "eval", "hermite-h", "-p", "n=-2", "0.5");
        FamilyChecks.assertBadInput("argument 4 'n=2001/2', column 1: n = 1000.5 is outside the allowed range: " + range,
                "eval", "hermite-h", "-p", "n=2001/2", "0.5");
    }
}
