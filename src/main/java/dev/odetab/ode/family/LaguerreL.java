package dev.odetab.ode.family;

import dev.odetab.expr.Poly;
import dev.odetab.numeric.Ball;
import dev.odetab.numeric.BallFunctions;
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
 *
 * <p>Gauss–Laguerre rule: weight x^α e^(−x) on (0, ∞); A_k = −1/(k + 1), B_k = (2k + α + 1)/(k + 1),
 * C_k = (k + α)/(k + 1) (DLMF 18.9.1, Table 18.9.1). Weights
 * w = Γ(n+α+1) x / (n! (n+1)² L_(n+1)^(α)(x)²) (A&amp;S 25.4.45 generalized); at a zero, DLMF 18.9.13
 * and 18.9.14 give (n+1) L_(n+1) = −(n+α) L_(n−1) = x L_n', so w = Γ(n+α+1) / (n! x L_n'(x)²) and
 * K = Γ(n+α+1)/n! = Γ(α+1) (α+1)_n / n!, with Γ(α+1) = α! for an integer α.
 */
public final class LaguerreL implements OrthogonalFamily {
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

    @Override
    public String ruleName() {
        return "Gauss–Laguerre";
    }

    @Override
    public String weightFunction() {
        return "x^alpha e^(-x) on (0, inf)";
    }

    @Override
    public Interval interval() {
        return Interval.HALF_LINE;
    }

    @Override
    public List<String> ruleParameters() {
        return List.of("alpha");
    }

    @Override
    public Rational[] threeTerm(int k, Map<String, Rational> parameters) {
        Rational a = parameters.get("alpha");
        Rational k1 = Rational.of(k + 1L);
        return new Rational[] {Rational.of(-1, k + 1L), Rational.of(2L * k + 1).add(a).divide(k1), Rational.of(k).add(a).divide(k1)};
    }

    @Override
    public WeightConstant weightConstant(int n, Map<String, Rational> parameters) {
        Rational a = parameters.get("alpha");
        Rational q = Degrees.pochhammer(a.add(Rational.ONE), n).divide(Degrees.factorial(n));
        if (a.isInteger()) {
            return new WeightConstant(q.multiply(Degrees.factorial(a.numerator().intValueExact())), null);
        }
        return new WeightConstant(q, p -> BallFunctions.gamma(Ball.of(a.add(Rational.ONE), p + 10), p));
    }
}
