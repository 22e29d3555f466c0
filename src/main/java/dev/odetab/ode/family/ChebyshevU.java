package dev.odetab.ode.family;

import dev.odetab.expr.Poly;
import dev.odetab.numeric.BallFunctions;
import dev.odetab.numeric.Rational;
import dev.odetab.ode.Equation;
import dev.odetab.ode.FunctionDef;
import java.util.List;
import java.util.Map;
import java.util.OptionalInt;

/**
 * Chebyshev polynomial of the second kind U_n(x) (DLMF 18.3), the solution of
 * (1 − x²) y'' − 3x y' + n(n + 2) y = 0 (DLMF 18.8, Table 18.8.1). From
 * U_n(cos θ) = sin((n + 1)θ) / sin θ (DLMF 18.5.2) at θ = π/2: U_n(0) = sin((n + 1)π/2) and,
 * with d/dx = −(1/sin θ) d/dθ, U_n'(0) = −(n + 1) cos((n + 1)π/2); that is (−1)^(n/2) and 0 for
 * even n, 0 and (n + 1)(−1)^((n−1)/2) for odd n.
 *
 * <p>Gauss–Chebyshev rule of the second kind: weight (1 − x²)^(1/2) on (−1, 1); A_k = 2, B_k = 0,
 * C_k = 1 (DLMF 18.9.1, Table 18.9.1). The Jacobi constant of {@link JacobiP} gives K = π (n + 1)
 * (DLMF 18.7.4); the nodes are the interior Chebyshev points of the second kind and the weights
 * π/(n+1) (1 − x²) (DLMF 3.5(v), A&amp;S 25.4.40).
 */
public final class ChebyshevU implements OrthogonalFamily {
    @Override
    public String name() {
        return "chebyshev-u";
    }

    @Override
    public String equation() {
        return "(1 - x^2)*y'' - 3*x*y' + n*(n + 2)*y = 0";
    }

    @Override
    public String title() {
        return "Chebyshev polynomial of the second kind U_n(x) (DLMF 18.3, 18.8)";
    }

    @Override
    public List<Parameter> parameters() {
        return List.of(Degrees.DEGREE);
    }

    @Override
    public FunctionDef define(Map<String, Rational> values) throws ParameterException {
        int n = Degrees.degree(values);
        Equation eq = new Equation(Poly.of(Rational.ONE, Rational.ZERO, Rational.of(-1)), Poly.of(Rational.ZERO, Rational.of(-3)),
                Poly.constant(Rational.of((long) n * (n + 2))));
        Rational value = n % 2 == 0 ? Rational.of(Degrees.sign(n / 2)) : Rational.ZERO;
        Rational slope = n % 2 == 0 ? Rational.ZERO : Rational.of((long) (n + 1) * Degrees.sign((n - 1) / 2));
        return new FunctionDef(name(), eq, Rational.ZERO, Normalizations.exact(value), Normalizations.exact(slope),
                Map.of("n", Rational.of(n)), "DLMF 18.3, 18.5.2, 18.8 (Table 18.8.1)");
    }

    @Override
    public String ruleName() {
        return "Gauss–Chebyshev (second kind)";
    }

    @Override
    public String weightFunction() {
        return "(1 - x^2)^(1/2) on (-1, 1)";
    }

    @Override
    public Interval interval() {
        return Interval.FINITE;
    }

    @Override
    public Rational[] threeTerm(int k, Map<String, Rational> parameters) {
        return new Rational[] {Rational.TWO, Rational.ZERO, Rational.ONE};
    }

    @Override
    public WeightConstant weightConstant(int n, Map<String, Rational> parameters) {
        return new WeightConstant(Rational.of(n + 1L), BallFunctions::pi);
    }

    @Override
    public OptionalInt chebyshevNodes() {
        return OptionalInt.of(2);
    }
}
