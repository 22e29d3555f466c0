package dev.odetab.ode.family;

import dev.odetab.numeric.Rational;
import dev.odetab.ode.FunctionDef;
import java.util.List;
import java.util.Map;
import org.apfloat.Apfloat;
import org.apfloat.ApfloatMath;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;

/**
 * He_n against apfloat 1.15.0 through He_n(x) = 2^(−n/2) H_n(x/√2) (DLMF 18.7) with
 * ApfloatMath.hermiteH.
 */
class HermiteHeTest {
    @Test
    void binary64MatchesApfloat() throws Exception {
        List<Rational> xs = FamilyChecks.points("-6.86", "0.28", 50);
        for (int n : new int[] {1, 7}) {
            FunctionDef f = new HermiteHe().define(Map.of("n", Rational.of(n)));
            Apfloat two = FamilyChecks.apfloat(2);
            Apfloat sqrt2 = ApfloatMath.sqrt(two);
            Apfloat scale = ApfloatMath.pow(sqrt2, -n);
            FamilyChecks.assertBinary64(f, xs, x -> ApfloatMath.hermiteH(FamilyChecks.apfloat(n), x.divide(sqrt2)).multiply(scale), "He_" + n);
        }
    }

    @Test
    @Tag("slow")
    void binary64MatchesApfloatHighDegrees() throws Exception {
        List<Rational> xs = FamilyChecks.points("-6.86", "0.28", 50);
        for (int n : new int[] {0, 2, 20, 33, 60}) {
            FunctionDef f = new HermiteHe().define(Map.of("n", Rational.of(n)));
            Apfloat two = FamilyChecks.apfloat(2);
            Apfloat sqrt2 = ApfloatMath.sqrt(two);
            Apfloat scale = ApfloatMath.pow(sqrt2, -n);
            FamilyChecks.assertBinary64(f, xs, x -> ApfloatMath.hermiteH(FamilyChecks.apfloat(n), x.divide(sqrt2)).multiply(scale), "He_" + n);
        }
    }

    @Test
    void parameterErrors() {
        FamilyChecks.assertBadInput("argument 4 'n=3/2', column 1: n = 1.5 is outside the allowed range: an integer 0 <= n <= 1000",
                "eval", "hermite-he", "-p", "n=3/2", "0.5");
    }
}
