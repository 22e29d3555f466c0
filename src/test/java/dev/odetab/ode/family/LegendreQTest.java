package dev.odetab.ode.family;

import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.odetab.numeric.Rational;
import dev.odetab.ode.FunctionDef;
import dev.odetab.series.FunctionEvaluator;
import java.util.List;
import java.util.Map;
import org.apfloat.ApfloatMath;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;

/** Q_n on (−1, 1) against apfloat 1.15.0 (ApfloatMath.legendreQ, Ferrers' function on the cut). */
class LegendreQTest {
    private static FunctionDef q(int n) throws ParameterException {
        return new LegendreQ().define(Map.of("n", Rational.of(n)));
    }

    @Test
    void lowDegreesMatchApfloat() throws Exception {
        List<Rational> xs = FamilyChecks.points("-0.55", "0.3", 4);
        for (int n : new int[] {1}) {
            FamilyChecks.assertBinary64(q(n), xs, x -> ApfloatMath.legendreQ(FamilyChecks.apfloat(n), x), "Q_" + n);
        }
    }

    @Test
    @Tag("slow")
    void binary64MatchesApfloat() throws Exception {
        List<Rational> xs = FamilyChecks.points("-0.98", "0.04", 50);
        for (int n : new int[] {0, 1, 2, 5, 20}) {
            FamilyChecks.assertBinary64(q(n), xs, x -> ApfloatMath.legendreQ(FamilyChecks.apfloat(n), x), "Q_" + n);
        }
        List<Rational> fewer = FamilyChecks.points("-0.9", "0.2", 10);
        FamilyChecks.assertBinary64(q(60), fewer, x -> ApfloatMath.legendreQ(FamilyChecks.apfloat(60), x), "Q_60");
    }

    @Test
    void notAPolynomial() throws Exception {
        for (int n : new int[] {0, 1, 6}) {
            assertTrue(FunctionEvaluator.polynomial(q(n)).isEmpty(), "Q_" + n);
        }
    }

    @Test
    void refusedBeyondTheSingularPoint() {
        FamilyChecks.assertBadInput("x = 1 is a singular point of (-x^2 + 1)*y'' - 2*x*y' + 6*y = 0 and lies between 0 and 1.5; "
                + "a solution cannot be continued through it", "eval", "legendre-q", "-p", "n=2", "1.5");
    }
}
