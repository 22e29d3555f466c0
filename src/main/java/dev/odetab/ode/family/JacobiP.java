package dev.odetab.ode.family;

import dev.odetab.expr.Poly;
import dev.odetab.numeric.Rational;
import dev.odetab.ode.Equation;
import dev.odetab.ode.FunctionDef;
import java.util.List;
import java.util.Map;

/**
 * Jacobi polynomial P_n^(α,β)(x) (DLMF 18.3), the solution of
 * (1 − x²) y'' + (β − α − (α + β + 2) x) y' + n(n + α + β + 1) y = 0 (DLMF 18.8, Table 18.8.1),
 * for α, β > −1. From the explicit sum DLMF 18.5.7,
 * P_n^(α,β)(x) = Σ_(ℓ=0..n) t_ℓ ((x − 1)/2)^ℓ, t_ℓ = (n + α + β + 1)_ℓ (α + ℓ + 1)_(n−ℓ) / (ℓ! (n − ℓ)!):
 * P_n^(α,β)(0) = Σ t_ℓ (−1/2)^ℓ and P_n^(α,β)'(0) = −Σ ℓ t_ℓ (−1/2)^ℓ, exact rationals.
 */
public final class JacobiP implements Family {
    static final Rational MAX_PARAMETER = Rational.of(1000);
    private static final String ALPHA_RANGE = "a rational -1 < alpha <= " + MAX_PARAMETER;
    private static final String BETA_RANGE = "a rational -1 < beta <= " + MAX_PARAMETER;

    @Override
    public String name() {
        return "jacobi-p";
    }

    @Override
    public String equation() {
        return "(1 - x^2)*y'' + (beta - alpha - (alpha + beta + 2)*x)*y' + n*(n + alpha + beta + 1)*y = 0";
    }

    @Override
    public String title() {
        return "Jacobi polynomial P_n^(alpha,beta)(x) (DLMF 18.3, 18.8)";
    }

    @Override
    public List<Parameter> parameters() {
        return List.of(Degrees.DEGREE,
                new Parameter("alpha", "first parameter", ALPHA_RANGE), new Parameter("beta", "second parameter", BETA_RANGE));
    }

    @Override
    public FunctionDef define(Map<String, Rational> values) throws ParameterException {
        int n = Degrees.degree(values);
        Rational alpha = Degrees.above("alpha", values.get("alpha"), Rational.of(-1), MAX_PARAMETER, null, ALPHA_RANGE);
        Rational beta = Degrees.above("beta", values.get("beta"), Rational.of(-1), MAX_PARAMETER, null, BETA_RANGE);
        Rational ab1 = alpha.add(beta).add(Rational.ONE);
        Equation eq = new Equation(Poly.of(Rational.ONE, Rational.ZERO, Rational.of(-1)),
                Poly.of(beta.subtract(alpha), ab1.add(Rational.ONE).negate()), Poly.constant(ab1.add(Rational.of(n)).multiply(n)));
        // t_0 = (α + 1)_n / n!, and t_(ℓ+1) = t_ℓ (n + α + β + 1 + ℓ)(n − ℓ) / ((ℓ + 1)(α + ℓ + 1))
        Rational t = Degrees.pochhammer(alpha.add(Rational.ONE), n);
        for (int k = 2; k <= n; k++) {
            t = t.divide(Rational.of(k));
        }
        Rational value = Rational.ZERO;
        Rational slope = Rational.ZERO;
        Rational power = Rational.ONE;
        for (int l = 0; l <= n; l++) {
            Rational term = t.multiply(power);
            value = value.add(term);
            slope = slope.subtract(term.multiply(l));
            if (l < n) {
                t = t.multiply(ab1.add(Rational.of(n + l))).multiply(Rational.of(n - l))
                        .divide(alpha.add(Rational.of(l + 1)).multiply(l + 1));
                power = power.multiply(Rational.of(-1, 2));
            }
        }
        return new FunctionDef(name(), eq, Rational.ZERO, Normalizations.exact(value), Normalizations.exact(slope),
                Map.of("n", Rational.of(n), "alpha", alpha, "beta", beta), "DLMF 18.3, 18.5.7, 18.8 (Table 18.8.1)");
    }
}
