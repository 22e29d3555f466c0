package dev.odetab.ode.family;

import dev.odetab.expr.Poly;
import dev.odetab.numeric.BallFunctions;
import dev.odetab.numeric.Rational;
import dev.odetab.ode.Equation;
import dev.odetab.ode.FunctionDef;
import java.math.BigInteger;
import java.util.List;
import java.util.Map;

/**
 * Physicists' Hermite polynomial H_n(x) (DLMF 18.3), the solution of y'' − 2x y' + 2n y = 0
 * (DLMF 18.8, Table 18.8.1). For an integer n >= 0: H_n(0) = (−1)^(n/2) n!/(n/2)! for even n and
 * 0 for odd n (DLMF 18.5.13), and H_n'(0) = 2n H_(n−1)(0) (DLMF 18.9.25), exact rationals, so the
 * member is the exact polynomial.
 *
 * <p>For any other rational order ν it is the Hermite function
 * H_ν(x) = 2^(ν/2) e^(x²/2) D_ν(√2 x) with D_ν(z) = U(−ν − 1/2, z) (DLMF 12.1), which for ν = n
 * is H_n (DLMF 12.7.2 with He_n(x) = 2^(−n/2) H_n(x/√2), DLMF 18.7). Substituting a = −ν − 1/2
 * in DLMF 12.2.6 and 12.2.7 gives H_ν(0) = 2^ν √π / Γ((1 − ν)/2) and
 * H_ν'(0) = 2^((ν+1)/2) U'(a, 0) = −2^(ν+1) √π / Γ(−ν/2).
 *
 * <p>Gauss–Hermite rule: weight e^(−x²) on (−∞, ∞); A_k = 2, B_k = 0, C_k = 2k (DLMF 18.9.1,
 * Table 18.9.1). Weights w = 2^(n−1) n! √π / (n² H_(n−1)(x)²) (A&amp;S 25.4.46); with
 * H_n' = 2n H_(n−1) (DLMF 18.9.25): w = 2^(n+1) n! √π / H_n'(x)², so K = 2^(n+1) n! √π.
 */
public final class HermiteH implements OrthogonalFamily {
    static final Rational MAX_ABS_ORDER = Rational.of(Degrees.MAX_DEGREE);
    private static final String RANGE = "an integer 0 <= n <= " + Degrees.MAX_DEGREE
            + ", or a non-integer rational with |n| <= " + Degrees.MAX_DEGREE;

    @Override
    public String name() {
        return "hermite-h";
    }

    @Override
    public String equation() {
        return "y'' - 2*x*y' + 2*n*y = 0";
    }

    @Override
    public String title() {
        return "physicists' Hermite polynomial H_n(x), or Hermite function for non-integer n (DLMF 18.3, 18.8, 12.2)";
    }

    @Override
    public List<Parameter> parameters() {
        return List.of(new Parameter("n", "degree (order)", RANGE));
    }

    @Override
    public FunctionDef define(Map<String, Rational> values) throws ParameterException {
        Rational nu = values.get("n");
        if (nu == null) {
            throw new ParameterException("n", "missing parameter n (" + RANGE + ")");
        }
        if (nu.abs().compareTo(MAX_ABS_ORDER) > 0 || (nu.isInteger() && nu.signum() < 0)) {
            throw new ParameterException("n", "n = " + nu.toDecimalOrFraction() + " is outside the allowed range: " + RANGE);
        }
        Equation eq = new Equation(Poly.ONE, Poly.of(Rational.ZERO, Rational.of(-2)), Poly.constant(nu.multiply(2)));
        if (nu.isInteger()) {
            int n = nu.numerator().intValueExact();
            Rational slope = n == 0 ? Rational.ZERO : Rational.of(HermiteFunction.hermiteAtZero(n - 1).multiply(BigInteger.valueOf(2L * n)));
            return new FunctionDef(name(), eq, Rational.ZERO, Normalizations.exact(Rational.of(HermiteFunction.hermiteAtZero(n))),
                    Normalizations.exact(slope), Map.of("n", nu), "DLMF 18.3, 18.5.13, 18.8 (Table 18.8.1), 18.9.25");
        }
        String v = Normalizations.literal(nu);
        // n is not an integer here, so neither (1 − n)/2 nor −n/2 is a pole of Γ
        String value = "2^" + v + "*sqrt(pi)/gamma((1-" + v + ")/2)";
        String slope = "-2^(" + v + "+1)*sqrt(pi)/gamma(-" + v + "/2)";
        return new FunctionDef(name(), eq, Rational.ZERO, Normalizations.parse(value, Map.of()),
                Normalizations.parse(slope, Map.of()), Map.of("n", nu), "DLMF 18.8 (Table 18.8.1), 12.1, 12.2.6, 12.2.7");
    }

    @Override
    public String ruleName() {
        return "Gauss–Hermite";
    }

    @Override
    public String weightFunction() {
        return "e^(-x^2) on (-inf, inf)";
    }

    @Override
    public Interval interval() {
        return Interval.REAL_LINE;
    }

    @Override
    public Rational[] threeTerm(int k, Map<String, Rational> parameters) {
        return new Rational[] {Rational.TWO, Rational.ZERO, Rational.of(2L * k)};
    }

    @Override
    public WeightConstant weightConstant(int n, Map<String, Rational> parameters) {
        return new WeightConstant(Rational.TWO.pow(n + 1).multiply(Degrees.factorial(n)),
                p -> BallFunctions.sqrt(BallFunctions.pi(p + 4), p));
    }
}
