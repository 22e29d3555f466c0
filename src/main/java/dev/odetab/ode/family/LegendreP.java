package dev.odetab.ode.family;

import dev.odetab.expr.Poly;
import dev.odetab.numeric.Rational;
import dev.odetab.ode.Equation;
import dev.odetab.ode.FunctionDef;
import java.math.BigInteger;
import java.util.List;
import java.util.Map;

/**
 * Legendre polynomial P_n(x) (DLMF 18.3), the solution of (1 − x²) y'' − 2x y' + n(n + 1) y = 0
 * (DLMF 14.2.1 with μ = 0, 18.8 Table 18.8.1). At 0, DLMF 14.5.1 and 14.5.2 with μ = 0 reduce for
 * integer n to P_n(0) = (−1)^(n/2) binom(n, n/2) / 2^n for even n and 0 for odd n, and
 * P_n'(0) = n P_(n−1)(0) (also DLMF 14.10.5 at x = 0: (1 − x²) P_n' = n (P_(n−1) − x P_n)).
 *
 * <p>Gauss–Legendre rule: weight 1 on (−1, 1); A_k = (2k + 1)/(k + 1), B_k = 0, C_k = k/(k + 1)
 * (DLMF 18.9.1, Table 18.9.1); the Jacobi constant of {@link JacobiP} at α = β = 0 is K = 2
 * (A&amp;S 25.4.29).
 */
public final class LegendreP implements OrthogonalFamily {
    @Override
    public String name() {
        return "legendre-p";
    }

    @Override
    public String equation() {
        return "(1 - x^2)*y'' - 2*x*y' + n*(n + 1)*y = 0";
    }

    @Override
    public String title() {
        return "Legendre polynomial P_n(x) (DLMF 14.2, 18.3)";
    }

    @Override
    public List<Parameter> parameters() {
        return List.of(Degrees.DEGREE);
    }

    @Override
    public FunctionDef define(Map<String, Rational> values) throws ParameterException {
        int n = Degrees.degree(values);
        Rational slope = n == 0 ? Rational.ZERO : atZero(n - 1).multiply(n);
        return new FunctionDef(name(), equation(n), Rational.ZERO, Normalizations.exact(atZero(n)), Normalizations.exact(slope),
                Map.of("n", Rational.of(n)), "DLMF 14.2.1, 14.5.1, 14.5.2, 18.3, 18.8 (Table 18.8.1)");
    }

    /** Legendre's equation of degree n (DLMF 14.2.1, μ = 0). */
    static Equation equation(int n) {
        return new Equation(Poly.of(Rational.ONE, Rational.ZERO, Rational.of(-1)), Poly.of(Rational.ZERO, Rational.of(-2)),
                Poly.constant(Rational.of((long) n * (n + 1))));
    }

    /** P_n(0) exactly. */
    static Rational atZero(int n) {
        if (n % 2 != 0) {
            return Rational.ZERO;
        }
        BigInteger binom = BigInteger.ONE;
        for (int k = 1; k <= n / 2; k++) {
            binom = binom.multiply(BigInteger.valueOf(n / 2 + k)).divide(BigInteger.valueOf(k));
        }
        return Rational.of(binom.multiply(BigInteger.valueOf(Degrees.sign(n / 2))), BigInteger.ONE.shiftLeft(n));
    }

    @Override
    public String ruleName() {
        return "Gauss–Legendre";
    }

    @Override
    public String weightFunction() {
        return "1 on (-1, 1)";
    }

    @Override
    public Interval interval() {
        return Interval.FINITE;
    }

    @Override
    public Rational[] threeTerm(int k, Map<String, Rational> parameters) {
        return new Rational[] {Rational.of(2L * k + 1, k + 1L), Rational.ZERO, Rational.of(k, k + 1L)};
    }

    @Override
    public WeightConstant weightConstant(int n, Map<String, Rational> parameters) {
        return new WeightConstant(Rational.TWO, null);
    }
}
