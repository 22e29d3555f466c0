package dev.odetab.ode.family;

import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.odetab.numeric.Ball;
import dev.odetab.numeric.Rational;
import dev.odetab.ode.FunctionDef;
import dev.odetab.series.FunctionEvaluator;
import java.math.BigDecimal;
import java.util.Map;
import org.apfloat.Apfloat;
import org.apfloat.ApfloatMath;
import org.junit.jupiter.api.Test;

/**
 * U(a, x) against apfloat 1.15.0 through Kummer's function M = ApfloatMath.hypergeometric1F1
 * (DLMF 12.4.1 with 12.7.12, 12.7.13): U(a, x) = U(a, 0) u1(a, x) + U'(a, 0) u2(a, x),
 * u1 = e^(−x²/4) M(a/2 + 1/4, 1/2, x²/2), u2 = x e^(−x²/4) M(a/2 + 3/4, 3/2, x²/2), with U(a, 0)
 * and U'(a, 0) of DLMF 12.2.6, 12.2.7 evaluated by apfloat (its gamma and pow);
 * and against the elementary case U(−1/2, x) = e^(−x²/4) (DLMF 12.7.2).
 */
class WeberTest {
    private static final long P = 60;

    @Test
    void matchesKummersFunctionForPositiveX() throws Exception {
        for (String as : new String[] {"-4.9", "-2.1", "-1/3", "0", "1/2", "2", "5"}) {
            Rational a = Rational.parse(as);
            FunctionDef f = new Weber().define(Map.of("a", a));
            Apfloat aa = new Apfloat(new BigDecimal(a.numerator()), P).divide(new Apfloat(new BigDecimal(a.denominator()), P));
            for (String xs : new String[] {"0.25", "1", "2.5", "4"}) {
                Apfloat x = new Apfloat(new BigDecimal(xs), P);
                Apfloat two = new Apfloat(2, P);
                Apfloat quarter = new Apfloat("0.25", P);
                Apfloat half = new Apfloat("0.5", P);
                Apfloat sqrtPi = ApfloatMath.sqrt(ApfloatMath.pi(P));
                Apfloat ah = aa.divide(two);
                Apfloat u0 = sqrtPi.divide(ApfloatMath.pow(two, ah.add(quarter)).multiply(ApfloatMath.gamma(ah.add(quarter).add(half))));
                Apfloat u0p = sqrtPi.negate().divide(ApfloatMath.pow(two, ah.subtract(quarter)).multiply(ApfloatMath.gamma(ah.add(quarter))));
                Apfloat z = x.multiply(x).divide(two);
                Apfloat g = ApfloatMath.exp(x.multiply(x).negate().divide(new Apfloat(4, P)));
                Apfloat u1 = g.multiply(ApfloatMath.hypergeometric1F1(ah.add(quarter), half, z));
                Apfloat u2 = x.multiply(g).multiply(ApfloatMath.hypergeometric1F1(ah.add(quarter).add(half), new Apfloat("1.5", P), z));
                Apfloat ref = u0.multiply(u1).add(u0p.multiply(u2));
                Ball b = FunctionEvaluator.enclose(f, Rational.parse(xs), 200).jet().value();
                BigDecimal r = new BigDecimal(ref.toString(true));
                BigDecimal tol = new BigDecimal("1e-45");
                assertTrue(b.addError(tol).contains(r), "U(" + as + ", " + xs + ") = " + r + " not in " + b);
                assertTrue(b.rad().compareTo(new BigDecimal("1e-45")) < 0, "too wide: " + b);
            }
        }
    }

    @Test
    void elementaryCaseIsExactGaussian() throws Exception {
        FunctionDef f = new Weber().define(Map.of("a", Rational.of(-1, 2)));
        for (String xs : new String[] {"-3", "-0.5", "1", "6"}) {
            Apfloat x = new Apfloat(new BigDecimal(xs), P);
            BigDecimal r = new BigDecimal(ApfloatMath.exp(x.multiply(x).negate().divide(new Apfloat(4, P))).toString(true));
            Ball b = FunctionEvaluator.enclose(f, Rational.parse(xs), 200).jet().value();
            assertTrue(b.addError(r.abs().scaleByPowerOfTen(-50)).contains(r), "U(-1/2, " + xs + ") = " + r + " not in " + b);
        }
    }
}
