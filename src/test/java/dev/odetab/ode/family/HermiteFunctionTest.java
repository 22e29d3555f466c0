package dev.odetab.ode.family;

import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.odetab.numeric.Ball;
import dev.odetab.numeric.Rational;
import dev.odetab.ode.FunctionDef;
import dev.odetab.series.FunctionEvaluator;
import dev.odetab.series.Jet;
import java.math.BigDecimal;
import java.util.Map;
import org.apfloat.Apfloat;
import org.apfloat.ApfloatMath;
import org.junit.jupiter.api.Test;

/**
 * ψ_n against apfloat 1.15.0: ψ_n(x) = H_n(x) e^(−x²/2) / sqrt(2^n n! √π) with
 * ApfloatMath.hermiteH (DLMF 18.3 normalization), and ψ_n' = sqrt(n/2) ψ_(n−1) − sqrt((n+1)/2) ψ_(n+1)
 * (a consequence of DLMF 18.9.25 and 18.9.26), for the derivative.
 */
class HermiteFunctionTest {
    private static final long P = 70;

    private static Apfloat psi(int n, Apfloat x) {
        if (n < 0) {
            return new Apfloat(0, P);
        }
        Apfloat two = new Apfloat(2, P);
        Apfloat norm = ApfloatMath.sqrt(ApfloatMath.pow(two, n).multiply(ApfloatMath.gamma(new Apfloat(n + 1, P)))
                .multiply(ApfloatMath.sqrt(ApfloatMath.pi(P))));
        return ApfloatMath.hermiteH(new Apfloat(n, P), x).multiply(ApfloatMath.exp(x.multiply(x).negate().divide(two))).divide(norm);
    }

    @Test
    void valuesAndDerivativesMatchApfloat() throws Exception {
        for (int n : new int[] {0, 1, 2, 5, 12, 30}) {
            FunctionDef f = new HermiteFunction().define(Map.of("n", Rational.of(n)));
            for (String xs : new String[] {"0", "0.5", "-1.25", "3", "-4.75", "7/3"}) {
                Rational x = Rational.parse(xs);
                Apfloat ax = new Apfloat(new BigDecimal(x.numerator()), P).divide(new Apfloat(new BigDecimal(x.denominator()), P));
                Apfloat two = new Apfloat(2, P);
                Apfloat value = psi(n, ax);
                Apfloat deriv = ApfloatMath.sqrt(new Apfloat(n, P).divide(two)).multiply(psi(n - 1, ax))
                        .subtract(ApfloatMath.sqrt(new Apfloat(n + 1, P).divide(two)).multiply(psi(n + 1, ax)));
                Jet jet = FunctionEvaluator.enclose(f, x, 200).jet();
                check(jet.value(), value, "psi_" + n + "(" + xs + ")");
                check(jet.derivative(), deriv, "psi_" + n + "'(" + xs + ")");
            }
        }
    }

    private static void check(Ball b, Apfloat ref, String what) {
        BigDecimal r = new BigDecimal(ref.toString(true));
        BigDecimal tol = new BigDecimal("1e-55");
        assertTrue(b.addError(tol).contains(r), what + ": " + r + " not in " + b);
        // 200 bits is about 60 digits; up to 20 of them may go to cancellation at |x| near 5
        assertTrue(b.rad().compareTo(new BigDecimal("1e-40")) < 0, what + " too wide: " + b);
    }
}
