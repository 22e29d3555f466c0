package dev.odetab.ode.family;

import dev.odetab.expr.Poly;
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
 */
public final class GegenbauerC implements Family {
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
}
