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
 * Chebyshev polynomial of the first kind T_n(x) (DLMF 18.3), the solution of
 * (1 − x²) y'' − x y' + n² y = 0 (DLMF 18.8, Table 18.8.1). From T_n(cos θ) = cos(nθ)
 * (DLMF 18.5.1) at θ = π/2: T_n(0) = cos(nπ/2) and T_n'(0) = n sin(nπ/2), that is
 * (−1)^(n/2) and 0 for even n, 0 and n (−1)^((n−1)/2) for odd n.
 *
 * <p>Gauss–Chebyshev rule of the first kind: weight (1 − x²)^(−1/2) on (−1, 1); A_0 = 1, A_k = 2
 * (k ≥ 1), B_k = 0, C_k = 1 (DLMF 18.9.1, Table 18.9.1). The Jacobi constant of {@link JacobiP}
 * gives K = π n (DLMF 18.7.3); the nodes are the Chebyshev points of the first kind and every
 * weight is π/n (DLMF 3.5(v), A&amp;S 25.4.38).
 */
public final class ChebyshevT implements OrthogonalFamily {
    @Override
    public String name() {
        return "chebyshev-t";
    }

    @Override
    public String equation() {
        return "(1 - x^2)*y'' - x*y' + n^2*y = 0";
    }

    @Override
    public String title() {
        return "Chebyshev polynomial of the first kind T_n(x) (DLMF 18.3, 18.8)";
    }

    @Override
    public List<Parameter> parameters() {
        return List.of(Degrees.DEGREE);
    }

    @Override
    public FunctionDef define(Map<String, Rational> values) throws ParameterException {
        int n = Degrees.degree(values);
        Equation eq = new Equation(Poly.of(Rational.ONE, Rational.ZERO, Rational.of(-1)), Poly.of(Rational.ZERO, Rational.of(-1)),
                Poly.constant(Rational.of((long) n * n)));
        Rational value = n % 2 == 0 ? Rational.of(Degrees.sign(n / 2)) : Rational.ZERO;
        Rational slope = n % 2 == 0 ? Rational.ZERO : Rational.of((long) n * Degrees.sign((n - 1) / 2));
        return new FunctionDef(name(), eq, Rational.ZERO, Normalizations.exact(value), Normalizations.exact(slope),
                Map.of("n", Rational.of(n)), "DLMF 18.3, 18.5.1, 18.8 (Table 18.8.1)");
    }

    @Override
    public String ruleName() {
        return "Gauss–Chebyshev (first kind)";
    }

    @Override
    public String weightFunction() {
        return "(1 - x^2)^(-1/2) on (-1, 1)";
    }

    @Override
    public Interval interval() {
        return Interval.FINITE;
    }

    @Override
    public Rational[] threeTerm(int k, Map<String, Rational> parameters) {
        return new Rational[] {k == 0 ? Rational.ONE : Rational.TWO, Rational.ZERO, Rational.ONE};
    }

    @Override
    public WeightConstant weightConstant(int n, Map<String, Rational> parameters) {
        return new WeightConstant(Rational.of(n), BallFunctions::pi);
    }

    @Override
    public OptionalInt chebyshevNodes() {
        return OptionalInt.of(1);
    }
}
