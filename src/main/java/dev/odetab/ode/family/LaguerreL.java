package dev.odetab.ode.family;

import dev.odetab.expr.Poly;
import dev.odetab.numeric.Rational;
import dev.odetab.ode.Equation;
import dev.odetab.ode.FunctionDef;
import java.util.List;
import java.util.Map;

/**
 * Generalized Laguerre polynomial L_n^(α)(x) (DLMF 18.3), the solution of
 * x y'' + (α + 1 − x) y' + n y = 0 (DLMF 18.8, Table 18.8.1). x = 0 is a singular point, so the
 * member is normalized at the ordinary point x = 1 with the explicit sum DLMF 18.5.12,
 * L_n^(α)(x) = Σ_(ℓ=0..n) t_ℓ (−x)^ℓ, t_ℓ = (α + ℓ + 1)_(n−ℓ) / ((n − ℓ)! ℓ!):
 * L_n^(α)(1) = Σ (−1)^ℓ t_ℓ and L_n^(α)'(1) = Σ (−1)^ℓ ℓ t_ℓ, exact rationals.
 */
public final class LaguerreL implements Family {
    static final Rational MAX_ALPHA = Rational.of(1000);
    private static final String ALPHA_RANGE = "a rational -1 < alpha <= " + MAX_ALPHA;

    @Override
    public String name() {
        return "laguerre-l";
    }

    @Override
    public String equation() {
        return "x*y'' + (alpha + 1 - x)*y' + n*y = 0";
    }

    @Override
    public String title() {
        return "generalized Laguerre polynomial L_n^(alpha)(x) (DLMF 18.3, 18.8)";
    }

    @Override
    public List<Parameter> parameters() {
        return List.of(Degrees.DEGREE,
                new Parameter("alpha", "optional, default 0", ALPHA_RANGE));
    }

    @Override
    public FunctionDef define(Map<String, Rational> values) throws ParameterException {
        int n = Degrees.degree(values);
        Rational alpha = Degrees.above("alpha", values.get("alpha"), Rational.of(-1), MAX_ALPHA, Rational.ZERO, ALPHA_RANGE);
        Equation eq = new Equation(Poly.X, Poly.of(alpha.add(Rational.ONE), Rational.of(-1)), Poly.constant(Rational.of(n)));
        // t_n = 1/n!, and t_(ℓ−1) = t_ℓ (α + ℓ) ℓ / (n − ℓ + 1)
        Rational t = Rational.ONE;
        for (int k = 2; k <= n; k++) {
            t = t.divide(Rational.of(k));
        }
        Rational value = Rational.ZERO;
        Rational slope = Rational.ZERO;
        for (int l = n; l >= 0; l--) {
            Rational signed = t.multiply(Degrees.sign(l));
            value = value.add(signed);
            slope = slope.add(signed.multiply(l));
            if (l > 0) {
                t = t.multiply(alpha.add(Rational.of(l))).multiply(Rational.of(l, n - l + 1));
            }
        }
        return new FunctionDef(name(), eq, Rational.ONE, Normalizations.exact(value), Normalizations.exact(slope),
                Map.of("n", Rational.of(n), "alpha", alpha), "DLMF 18.3, 18.5.12, 18.8 (Table 18.8.1)");
    }
}
