package dev.odetab.tables.quadrature;

import dev.odetab.numeric.Ball;
import dev.odetab.numeric.BallFunctions;
import dev.odetab.numeric.Rational;
import dev.odetab.ode.family.OrthogonalFamily;
import java.math.BigDecimal;
import java.math.BigInteger;
import java.util.Map;
import java.util.Optional;

/**
 * The polynomial p_n of one Gauss rule: a family of orthogonal polynomials with its Gauss data
 * ({@link OrthogonalFamily}: recurrence, weight function, interval, Christoffel constant), the
 * number of nodes n and the member's parameter values. What is shared by every family lives here:
 * the exact evaluation of p_n and p_n' by the recurrence, the double seeds of its zeros and the
 * weight denominator g(x, p_n'(x)) of w = K / g (g = (1 − x²) p'², x p'² or p'², by the
 * interval of orthogonality), exact or over balls.
 *
 * @param family the family and its Gauss data
 * @param n the number of nodes, 1 … {@link #MAX_NODES}
 * @param parameters the member's parameter values by name (n included), as {@code FunctionDef.parameters()}
 */
public record GaussPolynomial(OrthogonalFamily family, int n, Map<String, Rational> parameters) {
    /** The largest number of nodes of a quadrature table (the polynomial families allow degrees up to 1000). */
    public static final int MAX_NODES = 1000;

    public GaussPolynomial {
        if (n < 1 || n > MAX_NODES) {
            throw new IllegalArgumentException("a Gauss rule has 1 to " + MAX_NODES + " nodes, got " + n);
        }
        parameters = Map.copyOf(parameters);
    }

    /** One line for provenance: the rule, its weight function and its parameters. */
    public String describe() {
        StringBuilder params = new StringBuilder();
        for (String name : family.ruleParameters()) {
            params.append(", ").append(name).append(" = ").append(parameters.get(name).toDecimalOrFraction());
        }
        return family.ruleName() + " rule, n = " + n + params + ", weight function " + family.weightFunction();
    }

    /** True when w(−x) = w(x): the nodes are symmetric about 0 and p_n has the parity of n (DLMF 18.6.1). */
    public boolean symmetric() {
        return family.symmetric(parameters);
    }

    /** True for the rules on an infinite interval, whose weights may underflow and whose scaled weights exist. */
    public boolean hasScaledWeight() {
        return scaledWeightFormula().isPresent();
    }

    /** How the scaled weight is formed, for messages: {@code w·e^(x²)} or {@code w·e^x}; empty on a finite interval. */
    public Optional<String> scaledWeightFormula() {
        return switch (family.interval()) {
            case FINITE -> Optional.empty();
            case HALF_LINE -> Optional.of("w·e^x");
            case REAL_LINE -> Optional.of("w·e^(x²)");
        };
    }

    /** Exact: the family's {A_k, B_k, C_k} of p_(k+1) = (A_k x + B_k) p_k − C_k p_(k−1) (DLMF 18.9.1). */
    Rational[] threeTerm(int k) {
        return family.threeTerm(k, parameters);
    }

    /**
     * Exact: p_n(x) = value/denominator and p_n'(x) = slope/denominator at a rational x.
     *
     * @param value an integer
     * @param slope an integer
     * @param denominator a positive integer
     */
    record ExactJet(BigInteger value, BigInteger slope, BigInteger denominator) {
        boolean isZero() {
            return value.signum() == 0;
        }

        /** p_n'(x) as a reduced rational (one gcd of long integers: for the rare exact nodes). */
        Rational slopeExact() {
            return Rational.of(slope, denominator);
        }

        /** Rigorous: balls containing p_n(x) and p_n'(x), relative radius about 2^-precBits. */
        Ball valueBall(int precBits) {
            return quotient(value, denominator, precBits);
        }

        Ball slopeBall(int precBits) {
            return quotient(slope, denominator, precBits);
        }

        /**
         * Rigorous: num/den for den &gt; 0. With q = ⌊|num| 2^k / den⌋ (one integer division whose
         * quotient has about precBits bits), |num|/den lies in [q, q + 1] 2^-k: the ball of
         * midpoint (q + 1/2) 2^-k and radius 2^-(k+1), both exact decimals (2^-j = 5^j/10^j).
         */
        private static Ball quotient(BigInteger num, BigInteger den, int precBits) {
            if (num.signum() == 0) {
                return Ball.ZERO;
            }
            int k = precBits + 8 - (num.bitLength() - den.bitLength());
            BigInteger q = k >= 0 ? num.abs().shiftLeft(k).divide(den) : num.abs().divide(den.shiftLeft(-k));
            BigDecimal unit = powerOfTwo(-(k + 1));
            BigDecimal mid = new BigDecimal(q.shiftLeft(1).add(BigInteger.ONE)).multiply(unit);
            Ball b = Ball.of(mid, unit).round(precBits);
            return num.signum() < 0 ? b.negate() : b;
        }

        private static BigDecimal powerOfTwo(int e) {
            return e >= 0 ? new BigDecimal(BigInteger.ONE.shiftLeft(e)) : new BigDecimal(BigInteger.valueOf(5).pow(-e), -e);
        }
    }

    /**
     * Exact evaluation of p_n and p_n' at rational points by the recurrence of {@link #threeTerm}
     * and its derivative p'_(k+1) = A_k p_k + (A_k x + B_k) p'_k − C_k p'_(k−1), in integers: with
     * x = X/Y, A_k = a_k/d_k, B_k = b_k/d_k, C_k = e_k/d_k (common denominator d_k), p_k = N_k/D_k
     * and p'_k = M_k/D_k where D_(k+1) = d_k Y D_k:
     * N_(k+1) = L_k N_k − E_k N_(k−1), M_(k+1) = a_k Y N_k + L_k M_k − E_k M_(k−1), with
     * L_k = a_k X + b_k Y and E_k = e_k d_(k−1) Y². In matrix form (N_(k+1), N_k, M_(k+1), M_k) =
     * T_k (N_k, N_(k−1), M_k, M_(k−1)) with T_k = [[F_k, 0], [G_k, F_k]], F_k = [[L_k, −E_k], [1, 0]],
     * G_k = [[a_k Y, 0], [0, 0]]; products of such block-triangular matrices keep the form
     * ([[F, 0], [G, F]] [[F', 0], [G', F']] = [[F F', 0], [G F' + F G', F F']]), and the product
     * T_(n−1) … T_0 is formed by binary splitting, so the long integers meet only in balanced
     * multiplications. Nothing is reduced.
     */
    final class Evaluator {
        private final BigInteger[] a = new BigInteger[n];
        private final BigInteger[] b = new BigInteger[n];
        /** e_k d_(k−1), the coefficient of Y² N_(k−1). */
        private final BigInteger[] e = new BigInteger[n];
        /** d_0 d_1 … d_(n−1). */
        private final BigInteger dProduct;

        Evaluator() {
            BigInteger previous = BigInteger.ONE;
            BigInteger product = BigInteger.ONE;
            for (int k = 0; k < n; k++) {
                Rational[] abc = threeTerm(k);
                BigInteger dk = lcm(lcm(abc[0].denominator(), abc[1].denominator()), abc[2].denominator());
                a[k] = abc[0].numerator().multiply(dk.divide(abc[0].denominator()));
                b[k] = abc[1].numerator().multiply(dk.divide(abc[1].denominator()));
                e[k] = k == 0 ? BigInteger.ZERO : abc[2].numerator().multiply(dk.divide(abc[2].denominator())).multiply(previous);
                previous = dk;
                product = product.multiply(dk);
            }
            dProduct = product;
        }

        ExactJet at(Rational x) {
            BigInteger bigX = x.numerator();
            BigInteger bigY = x.denominator();
            BigInteger[][] t = product(0, n, bigX, bigY, bigY.multiply(bigY));
            // (N_n, ., M_n, .) = T (1, 0, 0, 0): the first columns of F and G
            return new ExactJet(t[0][0], t[1][0], dProduct.multiply(bigY.pow(n)));
        }

        /** {F, G} of T_(hi−1) … T_lo, each 2×2 as {m00, m01, m10, m11}. */
        private BigInteger[][] product(int lo, int hi, BigInteger x, BigInteger y, BigInteger y2) {
            if (hi - lo == 1) {
                BigInteger l = a[lo].multiply(x).add(b[lo].multiply(y));
                return new BigInteger[][] {{l, e[lo].multiply(y2).negate(), BigInteger.ONE, BigInteger.ZERO},
                    {a[lo].multiply(y), BigInteger.ZERO, BigInteger.ZERO, BigInteger.ZERO}};
            }
            int mid = (lo + hi) >>> 1;
            BigInteger[][] later = product(mid, hi, x, y, y2);
            BigInteger[][] earlier = product(lo, mid, x, y, y2);
            BigInteger[] f = times(later[0], earlier[0]);
            BigInteger[] g1 = times(later[1], earlier[0]);
            BigInteger[] g2 = times(later[0], earlier[1]);
            for (int i = 0; i < 4; i++) {
                g1[i] = g1[i].add(g2[i]);
            }
            return new BigInteger[][] {f, g1};
        }

        private static BigInteger[] times(BigInteger[] p, BigInteger[] q) {
            return new BigInteger[] {p[0].multiply(q[0]).add(p[1].multiply(q[2])), p[0].multiply(q[1]).add(p[1].multiply(q[3])),
                p[2].multiply(q[0]).add(p[3].multiply(q[2])), p[2].multiply(q[1]).add(p[3].multiply(q[3]))};
        }
    }

    private static BigInteger lcm(BigInteger p, BigInteger q) {
        return p.divide(p.gcd(q)).multiply(q);
    }

    /**
     * Heuristic: the monic recurrence p̂_(k+1) = (x − α_k) p̂_k − β_k p̂_(k−1) as doubles,
     * {α_0 … α_(n−1)} and {β_0 = 0, β_1 … β_(n−1)}: with p_k = κ_k p̂_k, κ_(k+1) = A_k κ_k,
     * α_k = −B_k/A_k and β_k = C_k / (A_k A_(k−1)). The zeros of p_n are the eigenvalues of the
     * symmetric tridiagonal matrix with diagonal α and off-diagonal √β (Golub and Welsch 1969);
     * these doubles only seed the proof.
     */
    double[][] monicRecurrenceEstimate() {
        double[] alpha = new double[n];
        double[] beta = new double[n];
        Rational previousA = null;
        for (int k = 0; k < n; k++) {
            Rational[] abc = threeTerm(k);
            alpha[k] = abc[1].negate().divide(abc[0]).doubleEstimate();
            if (k > 0) {
                beta[k] = abc[2].divide(abc[0].multiply(previousA)).doubleEstimate();
            }
            previousA = abc[0];
        }
        return new double[][] {alpha, beta};
    }

    /** The constant K of w = K / g(x, p_n'(x)), exact where the parameters allow (the family's data). */
    OrthogonalFamily.WeightConstant weightConstant() {
        return family.weightConstant(n, parameters);
    }

    /** Rigorous: g(x, d) of the class comment over balls x ∋ node and d ∋ p_n'(node); (1 − x)(1 + x) keeps 1 − x² accurate near ±1. */
    Ball weightDenominator(Ball x, Ball d, int precBits) {
        Ball d2 = d.square(precBits);
        return switch (family.interval()) {
            case REAL_LINE -> d2;
            case HALF_LINE -> x.multiply(d2, precBits);
            case FINITE -> Ball.ONE.subtract(x, precBits).multiply(Ball.ONE.add(x, precBits), precBits).multiply(d2, precBits);
        };
    }

    /** Exact: g(x, d) of the class comment at a rational node. */
    Rational weightDenominatorExact(Rational x, Rational d) {
        Rational d2 = d.multiply(d);
        return switch (family.interval()) {
            case REAL_LINE -> d2;
            case HALF_LINE -> x.multiply(d2);
            case FINITE -> Rational.ONE.subtract(x.multiply(x)).multiply(d2);
        };
    }

    /**
     * Exact: the same g from x² = r and p_n'(x)² = d2, for a symmetric rule (g depends on x only
     * through x² on (−1, 1) and (−∞, ∞); the rules on (0, ∞) are not symmetric).
     */
    Rational weightDenominatorFromSquares(Rational r, Rational d2) {
        return switch (family.interval()) {
            case REAL_LINE -> d2;
            case FINITE -> Rational.ONE.subtract(r).multiply(d2);
            case HALF_LINE -> throw new IllegalStateException("a rule on (0, inf) is not symmetric: g needs x, not x²");
        };
    }

    /** Rigorous: the scaling of the scaled weight, e^(x²) on (−∞, ∞) or e^x on (0, ∞), over a ball x. */
    Ball scale(Ball x, int precBits) {
        return switch (family.interval()) {
            case REAL_LINE -> BallFunctions.exp(x.square(precBits + 20), precBits);
            case HALF_LINE -> BallFunctions.exp(x, precBits);
            case FINITE -> throw new IllegalStateException("a rule on (-1, 1) has no scaled weight");
        };
    }
}
