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
 * Jacobi polynomial P_n^(α,β)(x) (DLMF 18.3), the solution of
 * (1 − x²) y'' + (β − α − (α + β + 2) x) y' + n(n + α + β + 1) y = 0 (DLMF 18.8, Table 18.8.1),
 * for α, β > −1. From the explicit sum DLMF 18.5.7,
 * P_n^(α,β)(x) = Σ_(ℓ=0..n) t_ℓ ((x − 1)/2)^ℓ, t_ℓ = (n + α + β + 1)_ℓ (α + ℓ + 1)_(n−ℓ) / (ℓ! (n − ℓ)!):
 * P_n^(α,β)(0) = Σ t_ℓ (−1/2)^ℓ and P_n^(α,β)'(0) = −Σ ℓ t_ℓ (−1/2)^ℓ, exact rationals.
 *
 * <p>Gauss–Jacobi rule: weight (1 − x)^α (1 + x)^β on (−1, 1); the recurrence of DLMF 18.9.1 with
 * Table 18.9.1's coefficients, except at k = 0, where p_1 comes from DLMF 18.5.7 since the table's
 * B_0 and C_0 divide by α + β, which may be 0. Weights (DLMF 3.5(v), Szegő, "Orthogonal
 * Polynomials", eq. 15.3.1): w = G_n / ((1 − x²) P_n'(x)²),
 * G_n = 2^(α+β+1) Γ(n+α+1) Γ(n+β+1) / (Γ(n+α+β+1) n!), written
 * G_n = μ_0 (α+1)_n (β+1)_n / ((α+β+2)_(n−1) n!) with μ_0 = 2^(α+β+1) Γ(α+1) Γ(β+1) / Γ(α+β+2)
 * (Γ(n+a) = Γ(a) (a)_n, DLMF 5.2.5, and α+β+2 &gt; 0, so no pole); μ_0 is rational when α and β
 * are integers.
 */
public final class JacobiP implements OrthogonalFamily {
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

    @Override
    public String ruleName() {
        return "Gauss–Jacobi";
    }

    @Override
    public String weightFunction() {
        return "(1 - x)^alpha (1 + x)^beta on (-1, 1)";
    }

    @Override
    public Interval interval() {
        return Interval.FINITE;
    }

    @Override
    public List<String> ruleParameters() {
        return List.of("alpha", "beta");
    }

    @Override
    public boolean symmetric(Map<String, Rational> parameters) {
        return parameters.get("alpha").equals(parameters.get("beta"));
    }

    @Override
    public Rational[] threeTerm(int k, Map<String, Rational> parameters) {
        Rational a = parameters.get("alpha");
        Rational b = parameters.get("beta");
        Rational ab = a.add(b);
        if (k == 0) {
            return new Rational[] {ab.add(Rational.TWO).divide(Rational.TWO), a.subtract(b).divide(Rational.TWO), Rational.ZERO};
        }
        Rational s = ab.add(Rational.of(2L * k));               // 2k + α + β  (> 0 for k >= 1)
        Rational k1 = Rational.of(k + 1L);
        Rational kab1 = ab.add(Rational.of(k + 1L));            // k + α + β + 1 (> 0)
        Rational aK = s.add(Rational.ONE).multiply(s.add(Rational.TWO)).divide(Rational.TWO.multiply(k1).multiply(kab1));
        Rational bK = a.multiply(a).subtract(b.multiply(b)).multiply(s.add(Rational.ONE))
                .divide(Rational.TWO.multiply(k1).multiply(kab1).multiply(s));
        Rational cK = a.add(Rational.of(k)).multiply(b.add(Rational.of(k))).multiply(s.add(Rational.TWO))
                .divide(k1.multiply(kab1).multiply(s));
        return new Rational[] {aK, bK, cK};
    }

    @Override
    public WeightConstant weightConstant(int n, Map<String, Rational> parameters) {
        Rational a = parameters.get("alpha");
        Rational b = parameters.get("beta");
        Rational ab2 = a.add(b).add(Rational.TWO);
        Rational q = Degrees.pochhammer(a.add(Rational.ONE), n).multiply(Degrees.pochhammer(b.add(Rational.ONE), n))
                .divide(Degrees.pochhammer(ab2, n - 1).multiply(Degrees.factorial(n)));
        if (a.isInteger() && b.isInteger()) {
            int ai = a.numerator().intValueExact();
            int bi = b.numerator().intValueExact();
            Rational mu0 = Rational.TWO.pow(ai + bi + 1).multiply(Degrees.factorial(ai)).multiply(Degrees.factorial(bi))
                    .divide(Degrees.factorial(ai + bi + 1));
            return new WeightConstant(q.multiply(mu0), null);
        }
        return new WeightConstant(q, p -> {
            int wp = p + 10;
            Ball two = BallFunctions.pow(Ball.exact(2), a.add(b).add(Rational.ONE), wp);
            Ball g = BallFunctions.gamma(Ball.of(a.add(Rational.ONE), wp), wp)
                    .multiply(BallFunctions.gamma(Ball.of(b.add(Rational.ONE), wp), wp), wp);
            return two.multiply(g, wp).divide(BallFunctions.gamma(Ball.of(ab2, wp), wp), wp);
        });
    }
}
