package dev.odetab.ode.family;

import static org.junit.jupiter.api.Assertions.assertEquals;

import dev.odetab.numeric.Rational;
import dev.odetab.ode.FunctionDef;
import dev.odetab.series.FunctionEvaluator;
import java.util.List;
import java.util.Map;
import org.apfloat.ApfloatMath;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;

/** U_n against apfloat 1.15.0 (ApfloatMath.chebyshevU) and DLMF 18.6.1 (U_n(1) = n + 1). */
class ChebyshevUTest {
    private static FunctionDef u(int n) throws ParameterException {
        return new ChebyshevU().define(Map.of("n", Rational.of(n)));
    }

    @Test
    void binary64MatchesApfloat() throws Exception {
        List<Rational> xs = FamilyChecks.points("-0.98", "0.04", 50);
        for (int n : new int[] {0, 1, 2, 7, 20}) {
            FamilyChecks.assertBinary64(u(n), xs, x -> ApfloatMath.chebyshevU(FamilyChecks.apfloat(n), x), "U_" + n);
        }
    }

    @Test
    @Tag("slow")
    void binary64MatchesApfloatHighDegrees() throws Exception {
        List<Rational> xs = FamilyChecks.points("-0.98", "0.04", 50);
        for (int n : new int[] {33, 60}) {
            FamilyChecks.assertBinary64(u(n), xs, x -> ApfloatMath.chebyshevU(FamilyChecks.apfloat(n), x), "U_" + n);
        }
    }

    @Test
    void valueAtOne() throws Exception {
        for (int n : new int[] {0, 1, 4, 9, 60}) {
            assertEquals(Rational.of(n + 1), FunctionEvaluator.exact(u(n), Rational.ONE, false).orElseThrow(), "U_" + n + "(1)");
        }
    }

    @Test
    void parameterErrors() {
        FamilyChecks.assertBadInput("argument 4 'n=0.5', column 1: n = 0.5 is outside the allowed range: an integer 0 <= n <= 1000",
                "eval", "chebyshev-u", "-p", "n=0.5", "0.5");
    }
}
