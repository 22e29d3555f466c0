package dev.odetab.series;

import static org.junit.jupiter.api.Assertions.assertEquals;

import dev.odetab.numeric.Format;
import dev.odetab.numeric.Rational;
import dev.odetab.numeric.Target;
import dev.odetab.ode.FunctionDef;
import dev.odetab.ode.family.HermiteFunction;
import dev.odetab.ode.family.Weber;
import java.math.BigDecimal;
import java.util.Map;
import org.apfloat.Apfloat;
import org.apfloat.ApfloatMath;
import org.junit.jupiter.api.Test;

/**
 * Large arguments, where the series loses many digits to cancellation and the precision loop
 * must pay for them: binary64 entries equal apfloat 1.15.0 at 80 digits rounded by Java's
 * correctly rounded BigDecimal.doubleValue (Java SE API).
 */
class LargeArgumentTest {
    private static final long P = 90;

    private static void same(BigDecimal reference, FunctionDef f, String x, boolean derivative) throws Exception {
        var e = FunctionEvaluator.entry(f, Rational.parse(x), derivative, Target.nearest(Format.BinaryFormat.BINARY64), 1 << 14).entry();
        assertEquals(Double.doubleToRawLongBits(reference.doubleValue()), e.bits().longValue(), f.name() + " at " + x + (derivative ? " (derivative)" : ""));
    }

    @Test
    void hermiteFunctionsOutToTwenty() throws Exception {
        // ψ_n(x) = H_n(x) e^(−x²/2) / sqrt(2^n n! √π) (DLMF 18.3), with apfloat's hermiteH.
        for (int n : new int[] {0, 3, 12}) {
            FunctionDef f = new HermiteFunction().define(Map.of("n", Rational.of(n)));
            for (String x : new String[] {"-20", "12.5", "20"}) {
                Apfloat ax = new Apfloat(new BigDecimal(x), P);
                Apfloat norm = ApfloatMath.sqrt(ApfloatMath.pow(new Apfloat(2, P), n).multiply(ApfloatMath.gamma(new Apfloat(n + 1, P)))
                        .multiply(ApfloatMath.sqrt(ApfloatMath.pi(P))));
                Apfloat v = ApfloatMath.hermiteH(new Apfloat(n, P), ax).multiply(ApfloatMath.exp(ax.multiply(ax).negate().divide(new Apfloat(2, P))))
                        .divide(norm);
                same(new BigDecimal(v.toString(true)), f, x, false);
            }
        }
    }

    @Test
    void weberAcrossItsParameterRange() throws Exception {
        // U(a, x) = 2^(−1/4 − a/2) e^(−x²/4) U(a/2 + 1/4, 1/2, x²/2) (DLMF 12.7.14), apfloat's hypergeometricU
        // (only at moderate x: apfloat's Kummer U is slow for large arguments).
        for (String a : new String[] {"-5", "-1.5", "0", "2.5", "5"}) {
            FunctionDef f = new Weber().define(Map.of("a", Rational.parse(a)));
            for (String x : new String[] {"3", "6"}) {
                Apfloat aa = new Apfloat(new BigDecimal(a), P);
                Apfloat ax = new Apfloat(new BigDecimal(x), P);
                Apfloat two = new Apfloat(2, P);
                Apfloat quarter = new Apfloat("0.25", P);
                Apfloat v = ApfloatMath.pow(two, quarter.negate().subtract(aa.divide(two)))
                        .multiply(ApfloatMath.exp(ax.multiply(ax).negate().divide(new Apfloat(4, P))))
                        .multiply(ApfloatMath.hypergeometricU(aa.divide(two).add(quarter), new Apfloat("0.5", P), ax.multiply(ax).divide(two)));
                same(new BigDecimal(v.toString(true)), f, x, false);
            }
        }
    }
}
