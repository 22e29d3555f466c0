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
 * Gegenbauer (ultraspherical) polynomial C_n^(λ)(x) (DLMF 18.3), the solution of
 * (1 − x²) y'' − (2λ + 1) x y' + n(n + 2λ) y = 0 (DLMF 18.8, Table 18.8.1), for λ > −1/2, λ ≠ 0.
 * From the explicit sum DLMF 18.5.10,
 * C_n^(λ)(x) = Σ_(ℓ=0..⌊n/2⌋) (−1)^ℓ (λ)_(n−ℓ) / (ℓ! (n − 2ℓ)!) (2x)^(n−2ℓ), only the terms with
 * n − 2ℓ = 0 and 1 survive at 0: C_(2k)^(λ)(0) = (−1)^k (λ)_k / k! and
 * C_(2k+1)^(λ)'(0) = 2 (−1)^k (λ)_(k+1) / k!, the other two values being 0.
 *
 * <p>Gauss–Gegenbauer rule: weight (1 − x²)^(λ − 1/2) on (−1, 1); A_k = 2(k + λ)/(k + 1), B_k = 0,
 * C_k = (k + 2λ − 1)/(k + 1) (DLMF 18.9.1, Table 18.9.1). From C_n^λ = (2λ)_n / (λ+1/2)_n ·
 * P_n^(λ−1/2, λ−1/2) (DLMF 18.7.1), the Jacobi weights of {@link JacobiP} and Legendre's
 * duplication formula (DLMF 5.5.5): w = 2√π Γ(λ+1/2)/Γ(λ) · (2λ)_n/n! / ((1 − x²) C_n'(x)²). For
 * λ = m + 1/2 the first factor is 2 m!/(1/2)_m, for an integer λ = m it is 2π (1/2)_m/(m−1)!
 * (Γ(m+1/2) = √π (1/2)_m, DLMF 5.4.6 with 5.2.5).
 */
public final class GegenbauerC implements OrthogonalFamily {
    static final Rational MAX_LAMBDA = Rational.of(1000);
    private static final String LAMBDA_RANGE = "a rational -1/2 < lambda <= " + MAX_LAMBDA + ", lambda != 0";

    @Override
    public String name() {
        return "gegenbauer-c";
    }

    @Override
    public String equation() {
        return "(1 - x^2)*y'' - (2*lambda + 1)*x*y' + n*(n + 2*lambda)*y = 0";
    }

    @Override
    public String title() {
        return "Gegenbauer polynomial C_n^(lambda)(x) (DLMF 18.3, 18.8)";
    }

    @Override
    public List<Parameter> parameters() {
        return List.of(Degrees.DEGREE,
                new Parameter("lambda", "order", LAMBDA_RANGE));
    }

    @Override
    public FunctionDef define(Map<String, Rational> values) throws ParameterException {
        int n = Degrees.degree(values);
        Rational lambda = Degrees.above("lambda", values.get("lambda"), Rational.of(-1, 2), MAX_LAMBDA, null, LAMBDA_RANGE);
        if (lambda.isZero()) {
            throw new ParameterException("lambda", "lambda = 0 is outside the allowed range: " + LAMBDA_RANGE);
        }
        Rational twoLambda = lambda.multiply(2);
        Equation eq = new Equation(Poly.of(Rational.ONE, Rational.ZERO, Rational.of(-1)),
                Poly.of(Rational.ZERO, twoLambda.add(Rational.ONE).negate()), Poly.constant(twoLambda.add(Rational.of(n)).multiply(n)));
        int k = n / 2;
        Rational kFactorial = Rational.ONE;
        for (int i = 2; i <= k; i++) {
            kFactorial = kFactorial.multiply(i);
        }
        Rational value = Rational.ZERO;
        Rational slope = Rational.ZERO;
        if (n % 2 == 0) {
            value = Degrees.pochhammer(lambda, k).divide(kFactorial).multiply(Degrees.sign(k));
        } else {
            slope = Degrees.pochhammer(lambda, k + 1).divide(kFactorial).multiply(2 * Degrees.sign(k));
        }
        return new FunctionDef(name(), eq, Rational.ZERO, Normalizations.exact(value), Normalizations.exact(slope),
                Map.of("n", Rational.of(n), "lambda", lambda), "DLMF 18.3, 18.5.10, 18.8 (Table 18.8.1)");
    }

    @Override
    public String ruleName() {
        return "Gauss–Gegenbauer";
    }

    @Override
    public String weightFunction() {
        return "(1 - x^2)^(lambda - 1/2) on (-1, 1)";
    }

    @Override
    public Interval interval() {
        return Interval.FINITE;
    }

    @Override
    public List<String> ruleParameters() {
        return List.of("lambda");
    }

    @Override
    public Rational[] threeTerm(int k, Map<String, Rational> parameters) {
        Rational a = parameters.get("lambda");
        Rational kk = Rational.of(k);
        Rational k1 = Rational.of(k + 1L);
        return new Rational[] {kk.add(a).multiply(2).divide(k1), Rational.ZERO, kk.add(a.multiply(2)).subtract(Rational.ONE).divide(k1)};
    }

    @Override
    public WeightConstant weightConstant(int n, Map<String, Rational> parameters) {
        Rational a = parameters.get("lambda");
        Rational q = Degrees.pochhammer(a.multiply(2), n).divide(Degrees.factorial(n));
        Rational half = Rational.of(1, 2);
        Rational shifted = a.subtract(half);
        if (shifted.isInteger()) {
            int m = shifted.numerator().intValueExact();
            return new WeightConstant(q.multiply(Degrees.factorial(m)).multiply(2).divide(Degrees.pochhammer(half, m)), null);
        }
        if (a.isInteger()) {
            int m = a.numerator().intValueExact();
            return new WeightConstant(q.multiply(Degrees.pochhammer(half, m)).multiply(2).divide(Degrees.factorial(m - 1)), BallFunctions::pi);
        }
        return new WeightConstant(q, p -> {
            int wp = p + 10;
            Ball ratio = BallFunctions.gamma(Ball.of(a.add(half), wp), wp).divide(BallFunctions.gamma(Ball.of(a, wp), wp), wp);
            return BallFunctions.sqrt(BallFunctions.pi(wp), wp).multiply(ratio, wp).multiply(Rational.TWO, p);
        });
    }
}
