package dev.odetab.ode.family;

import dev.odetab.numeric.Ball;
import dev.odetab.numeric.Rational;
import java.util.List;
import java.util.Map;
import java.util.OptionalInt;
import java.util.function.IntFunction;

/**
 * A family of classical orthogonal polynomials (normalized as in DLMF 18.3) with the data of its
 * Gauss rule: the three-term recurrence, the weight function and its interval, and the constant of
 * the Christoffel numbers. The quadrature evaluator ({@code tables/quadrature/GaussRule}) works
 * from these data only; the rigorous parts (exact evaluation of the recurrence, the enclosures of
 * the nodes and of the weight denominator) are shared there.
 *
 * <p>Every weight at a zero x of p_n is K / g(x, p_n'(x)) with the constant K of
 * {@link #weightConstant} and g = (1 − x²) p'² on (−1, 1), x p'² on (0, ∞) and p'² on (−∞, ∞)
 * ({@link Interval}); each family's comment derives its K (DLMF 3.5(v), Szegő, "Orthogonal
 * Polynomials", eq. 15.3.1).
 *
 * <p>The parameters of a member are passed as its values by name, as
 * {@link dev.odetab.ode.FunctionDef#parameters()} holds them (n included).
 */
public interface OrthogonalFamily extends Family {
    /** The interval of orthogonality, which fixes the factor of g and the scaling of the weights. */
    enum Interval {
        /** (−1, 1): g = (1 − x²) p'². */
        FINITE,
        /** (0, ∞) with the weight's factor e^(−x): g = x p'², scaled weight w·e^x. */
        HALF_LINE,
        /** (−∞, ∞) with the weight's factor e^(−x²): g = p'², scaled weight w·e^(x²). */
        REAL_LINE
    }

    /**
     * An exact rational times an optional transcendental factor.
     *
     * @param rational the exact factor
     * @param factor a ball containing the transcendental factor at a precision, or null when the constant is rational
     */
    record WeightConstant(Rational rational, IntFunction<Ball> factor) {
        /** Rigorous: a ball containing the constant, relative radius about 2^-precBits. */
        public Ball enclose(int precBits) {
            Ball q = Ball.of(rational, precBits + 10);
            return factor == null ? q.round(precBits) : factor.apply(precBits + 10).multiply(q, precBits);
        }

        public boolean isRational() {
            return factor == null;
        }
    }

    /** The rule's name, e.g. {@code Gauss–Legendre}. */
    String ruleName();

    /** The weight function on its interval, for provenance, e.g. {@code 1 on (-1, 1)}. */
    String weightFunction();

    /** The interval of orthogonality. */
    Interval interval();

    /**
     * The parameters of the rule besides the degree n, in the order provenance prints them (the
     * names of {@link #parameters()} the recurrence depends on).
     */
    default List<String> ruleParameters() {
        return List.of();
    }

    /**
     * Exact: {A_k, B_k, C_k} with p_(k+1) = (A_k x + B_k) p_k − C_k p_(k−1), p_0 = 1 (DLMF 18.9.1,
     * Table 18.9.1; C_0 is unused), for the member with these parameter values.
     */
    Rational[] threeTerm(int k, Map<String, Rational> parameters);

    /** The constant K of w = K / g(x, p_n'(x)) for n nodes, exact where the parameters allow. */
    WeightConstant weightConstant(int n, Map<String, Rational> parameters);

    /** True when w(−x) = w(x): the nodes are symmetric about 0 and p_n has the parity of n (DLMF 18.6.1). */
    default boolean symmetric(Map<String, Rational> parameters) {
        return interval() != Interval.HALF_LINE;
    }

    /**
     * The kind (1 or 2) of Chebyshev points that are the rule's nodes in closed form (DLMF 3.5(v)),
     * or empty when the nodes are found as zeros of p_n.
     */
    default OptionalInt chebyshevNodes() {
        return OptionalInt.empty();
    }
}
