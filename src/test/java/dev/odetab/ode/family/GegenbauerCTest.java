package dev.odetab.ode.family;

import dev.odetab.numeric.Rational;
import dev.odetab.ode.FunctionDef;
import java.util.List;
import java.util.Map;
import org.apfloat.ApfloatMath;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;

/** C_n^(λ) against apfloat 1.15.0 (ApfloatMath.gegenbauerC(n, λ, x)). */
class GegenbauerCTest {
    private static void check(int[] degrees) throws Exception {
        List<Rational> xs = FamilyChecks.points("-0.98", "0.04", 50);
        for (String l : new String[] {"3/2", "1/3"}) {
            Rational lambda = Rational.parse(l);
            for (int n : degrees) {
                FunctionDef f = new GegenbauerC().define(Map.of("n", Rational.of(n), "lambda", lambda));
                FamilyChecks.assertBinary64(f, xs,
                        x -> ApfloatMath.gegenbauerC(FamilyChecks.apfloat(n), FamilyChecks.apfloat(lambda), x), "C_" + n + "^(" + l + ")");
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
    void parameterErrors() {
        String range = "a rational -1/2 < lambda <= 1000, lambda != 0";
        FamilyChecks.assertBadInput("argument 6 'lambda=-1', column 1: lambda = -1 is outside the allowed range: " + range,
                "eval", "gegenbauer-c", "-p", "n=3", "-p", "lambda=-1", "0.5");
        FamilyChecks.assertBadInput("argument 6 'lambda=-1/2', column 1: lambda = -0.5 is outside the allowed range: " + range,
                "eval", "gegenbauer-c", "-p", "n=3", "-p", "lambda=-1/2", "0.5");
        FamilyChecks.assertBadInput("argument 6 'lambda=0', column 1: lambda = 0 is outside the allowed range: " + range,
                "eval", "gegenbauer-c", "-p", "n=3", "-p", "lambda=0", "0.5");
    }
}
