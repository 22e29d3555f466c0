package dev.odetab.ode.family;

import dev.odetab.expr.Poly;
import dev.odetab.numeric.Rational;
import dev.odetab.ode.Equation;
import dev.odetab.ode.FunctionDef;
import java.math.BigInteger;
import java.util.List;
import java.util.Map;

/**
 * Orthonormal Hermite functions ψ_n(x) = (2^n n! √π)^(−1/2) H_n(x) e^(−x²/2), which satisfy
 * ψ'' + (2n + 1 − x²) ψ = 0 (from DLMF 18.8 Table 18.8.1, H_n'' − 2x H_n' + 2n H_n = 0).
 * At 0: H_n(0) = (−1)^(n/2) n!/(n/2)! for even n and 0 for odd n (DLMF 18.5.13), and
 * H_n'(0) = 2n H_(n−1)(0) (DLMF 18.9.25); the factor e^(−x²/2) has value 1 and slope 0 at 0.
 */
public final class HermiteFunction implements Family {
    static final int MAX_DEGREE = 10_000;

    @Override
    public String name() {
        return "hermite-function";
    }

    @Override
    public String equation() {
        return "y'' + (2*n + 1 - x^2)*y = 0";
    }

    @Override
    public String title() {
        return "orthonormal Hermite function psi_n(x) (DLMF 18.3, 18.8)";
    }

    @Override
    public List<Parameter> parameters() {
        return List.of(new Parameter("n", "degree", "an integer 0 <= n <= " + MAX_DEGREE));
    }

    @Override
    public FunctionDef define(Map<String, Rational> values) throws ParameterException {
        int n = Degrees.integer("n", values.get("n"), 0, MAX_DEGREE);
        Equation eq = new Equation(Poly.ONE, Poly.ZERO,
                Poly.of(Rational.of(2L * n + 1), Rational.ZERO, Rational.of(-1)));
        BigInteger norm = BigInteger.ONE.shiftLeft(n).multiply(factorial(n));
        String scale = "sqrt(" + norm + "*sqrt(pi))";
        String value = hermiteAtZero(n) + "/" + scale;
        BigInteger slope = n == 0 ? BigInteger.ZERO : BigInteger.valueOf(2L * n).multiply(hermiteAtZero(n - 1));
        String slopeText = slope + "/" + scale;
        return new FunctionDef(name(), eq, Rational.ZERO, Normalizations.parse(value, Map.of()),
                Normalizations.parse(slopeText, Map.of()), Map.of("n", Rational.of(n)),
                "DLMF 18.3, 18.5.13, 18.8 (Table 18.8.1), 18.9.25");
    }

    /** H_n(0) exactly (DLMF 18.5.13). */
    static BigInteger hermiteAtZero(int n) {
        if (n % 2 != 0) {
            return BigInteger.ZERO;
        }
        BigInteger v = BigInteger.ONE;
        for (int k = n / 2 + 1; k <= n; k++) {
            v = v.multiply(BigInteger.valueOf(k));
        }
        return (n / 2) % 2 == 0 ? v : v.negate();
    }

    static BigInteger factorial(int n) {
        BigInteger f = BigInteger.ONE;
        for (int k = 2; k <= n; k++) {
            f = f.multiply(BigInteger.valueOf(k));
        }
        return f;
    }
}
