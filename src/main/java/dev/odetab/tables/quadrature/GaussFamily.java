package dev.odetab.tables.quadrature;

import dev.odetab.numeric.Ball;
import dev.odetab.numeric.BallFunctions;
import dev.odetab.numeric.Rational;
import dev.odetab.ode.family.Family;
import java.math.BigDecimal;
import java.math.BigInteger;
import java.util.Arrays;
import java.util.Optional;
import java.util.function.IntFunction;

/**
 * The data of one classical Gauss rule: the family of orthogonal polynomials (normalized as in
 * DLMF 18.3, as the families of {@code ode/family} are), the number of nodes n (the degree of the
 * polynomial p_n whose zeros are the nodes) and the family's parameters, with the exact
 * three-term recurrence (DLMF 18.9.1, Table 18.9.1), the Christoffel numbers written through
 * p_n' (so that one derivative at a node gives its weight) and the weight function.
 *
 * <p>Weights, each at a zero x of p_n (DLMF 3.5(v), Szegő, "Orthogonal Polynomials", eq. 15.3.1):
 * <ul>
 * <li>Jacobi: w = G_n / ((1 − x²) P_n'(x)²), G_n = 2^(α+β+1) Γ(n+α+1) Γ(n+β+1) / (Γ(n+α+β+1) n!),
 * written G_n = μ_0 (α+1)_n (β+1)_n / ((α+β+2)_(n−1) n!) with μ_0 = 2^(α+β+1) Γ(α+1) Γ(β+1) / Γ(α+β+2)
 * (Γ(n+a) = Γ(a) (a)_n, DLMF 5.2.5, and α+β+2 &gt; 0, so no pole). Legendre is α = β = 0: G_n = 2
 * (A&amp;S 25.4.29).</li>
 * <li>Gegenbauer (C_n^λ = (2λ)_n / (λ+1/2)_n · P_n^(λ−1/2, λ−1/2), DLMF 18.7.1, and Legendre's
 * duplication formula DLMF 5.5.5): w = 2√π Γ(λ+1/2)/Γ(λ) · (2λ)_n/n! / ((1 − x²) C_n'(x)²).</li>
 * <li>Chebyshev: the same formula gives G = π n for T_n (DLMF 18.7.3) and π (n + 1) for U_n
 * (DLMF 18.7.4); their rules are also known in closed form ({@link GaussRule}).</li>
 * <li>Hermite, w = 2^(n−1) n! √π / (n² H_(n−1)(x)²) (A&amp;S 25.4.46); with H_n' = 2n H_(n−1)
 * (DLMF 18.9.25): w = 2^(n+1) n! √π / H_n'(x)².</li>
 * <li>Laguerre, w = Γ(n+α+1) x / (n! (n+1)² L_(n+1)^(α)(x)²) (A&amp;S 25.4.45 generalized); at a zero,
 * DLMF 18.9.13 and 18.9.14 give (n+1) L_(n+1) = −(n+α) L_(n−1) = x L_n', so
 * w = Γ(n+α+1) / (n! x L_n'(x)²).</li>
 * </ul>
 * So every weight is K / g(x, p_n'(x)) with a constant K and g = (1 − x²) p'², p'² or x p'².
 *
 * @param kind the family
 * @param n the number of nodes, 1 … {@link #MAX_NODES}
 * @param a α of laguerre-l and jacobi-p, λ of gegenbauer-c, otherwise 0
 * @param b β of jacobi-p, otherwise 0
 */
public record GaussFamily(Kind kind, int n, Rational a, Rational b) {
    /** The largest number of nodes of a quadrature table (the polynomial families allow degrees up to 1000). */
    public static final int MAX_NODES = 1000;

    /** The families with a Gauss rule, by the name of their family in {@code ode/family}. */
    public enum Kind {
        LEGENDRE("legendre-p", "Gauss–Legendre", "1 on (-1, 1)"),
        HERMITE("hermite-h", "Gauss–Hermite", "e^(-x^2) on (-inf, inf)"),
        LAGUERRE("laguerre-l", "Gauss–Laguerre", "x^alpha e^(-x) on (0, inf)"),
        CHEBYSHEV_T("chebyshev-t", "Gauss–Chebyshev (first kind)", "(1 - x^2)^(-1/2) on (-1, 1)"),
        CHEBYSHEV_U("chebyshev-u", "Gauss–Chebyshev (second kind)", "(1 - x^2)^(1/2) on (-1, 1)"),
        GEGENBAUER("gegenbauer-c", "Gauss–Gegenbauer", "(1 - x^2)^(lambda - 1/2) on (-1, 1)"),
        JACOBI("jacobi-p", "Gauss–Jacobi", "(1 - x)^alpha (1 + x)^beta on (-1, 1)");

        private final String family;
        private final String ruleName;
        private final String weightFunction;

        Kind(String family, String ruleName, String weightFunction) {
            this.family = family;
            this.ruleName = ruleName;
            this.weightFunction = weightFunction;
        }

        /** The family name as in the catalog ({@code legendre-p}). */
        public String family() {
            return family;
        }

        /** The rule of a catalog family, if it has one. */
        public static Optional<Kind> of(Family family) {
            return Arrays.stream(values()).filter(k -> k.family.equals(family.name())).findFirst();
        }

        /** The catalog names of the families with a Gauss rule. */
        public static String names() {
            return String.join(", ", Arrays.stream(values()).map(Kind::family).toList());
        }
    }

    /**
     * An exact rational times an optional transcendental factor.
     *
     * @param rational the exact factor
     * @param factor a ball containing the transcendental factor at a precision, or null when the constant is rational
     */
    record Constant(Rational rational, IntFunction<Ball> factor) {
        /** Rigorous: a ball containing the constant, relative radius about 2^-precBits. */
        Ball enclose(int precBits) {
            Ball q = Ball.of(rational, precBits + 10);
            return factor == null ? q.round(precBits) : factor.apply(precBits + 10).multiply(q, precBits);
        }

        boolean isRational() {
            return factor == null;
        }
    }

    public GaussFamily {
        if (n < 1 || n > MAX_NODES) {
            throw new IllegalArgumentException("a Gauss rule has 1 to " + MAX_NODES + " nodes, got " + n);
        }
    }

    /** One line for provenance: the rule, its weight function and its parameters. */
    public String describe() {
        String params = switch (kind) {
            case LAGUERRE -> ", alpha = " + a.toDecimalOrFraction();
            case GEGENBAUER -> ", lambda = " + a.toDecimalOrFraction();
            case JACOBI -> ", alpha = " + a.toDecimalOrFraction() + ", beta = " + b.toDecimalOrFraction();
            default -> "";
        };
        return kind.ruleName + " rule, n = " + n + params + ", weight function " + kind.weightFunction;
    }

    /** True when w(−x) = w(x): the nodes are symmetric about 0 and p_n has the parity of n (DLMF 18.6.1). */
    public boolean symmetric() {
        return kind != Kind.LAGUERRE && (kind != Kind.JACOBI || a.equals(b));
    }

    /** True for the rules on an infinite interval, whose weights may underflow and whose scaled weights exist. */
    public boolean hasScaledWeight() {
        return kind == Kind.HERMITE || kind == Kind.LAGUERRE;
    }

    /** How the scaled weight is formed, for messages: {@code w·e^(x²)} or {@code w·e^x}. */
    public String scaledWeightFormula() {
        return kind == Kind.HERMITE ? "w·e^(x²)" : "w·e^x";
    }

    /**
     * Exact: {A_k, B_k, C_k} with p_(k+1) = (A_k x + B_k) p_k − C_k p_(k−1), p_0 = 1 (DLMF 18.9.1,
     * Table 18.9.1; C_0 is unused). Jacobi at k = 0 takes p_1 from DLMF 18.5.7, since Table 18.9.1's
     * B_0 and C_0 divide by α + β, which may be 0.
     */
    Rational[] threeTerm(int k) {
        Rational kk = Rational.of(k);
        Rational k1 = Rational.of(k + 1L);
        return switch (kind) {
            case LEGENDRE -> new Rational[] {Rational.of(2L * k + 1, k + 1L), Rational.ZERO, Rational.of(k, k + 1L)};
            case HERMITE -> new Rational[] {Rational.TWO, Rational.ZERO, Rational.of(2L * k)};
            case LAGUERRE -> new Rational[] {Rational.of(-1, k + 1L), Rational.of(2L * k + 1).add(a).divide(k1), kk.add(a).divide(k1)};
            case CHEBYSHEV_T -> new Rational[] {k == 0 ? Rational.ONE : Rational.TWO, Rational.ZERO, Rational.ONE};
            case CHEBYSHEV_U -> new Rational[] {Rational.TWO, Rational.ZERO, Rational.ONE};
            case GEGENBAUER -> new Rational[] {kk.add(a).multiply(2).divide(k1), Rational.ZERO,
                kk.add(a.multiply(2)).subtract(Rational.ONE).divide(k1)};
            case JACOBI -> jacobiThreeTerm(k);
        };
    }

    private Rational[] jacobiThreeTerm(int k) {
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

    /** The constant K of w = K / g(x, p_n'(x)) (class comment), exact where the parameters allow. */
    Constant weightConstant() {
        return switch (kind) {
            case LEGENDRE -> new Constant(Rational.TWO, null);
            case CHEBYSHEV_T -> new Constant(Rational.of(n), BallFunctions::pi);
            case CHEBYSHEV_U -> new Constant(Rational.of(n + 1L), BallFunctions::pi);
            case HERMITE -> new Constant(Rational.TWO.pow(n + 1).multiply(factorial(n)),
                    p -> BallFunctions.sqrt(BallFunctions.pi(p + 4), p));
            case LAGUERRE -> laguerreConstant();
            case GEGENBAUER -> gegenbauerConstant();
            case JACOBI -> jacobiConstant();
        };
    }

    /** Γ(n+α+1)/n! = Γ(α+1) (α+1)_n / n!; Γ(α+1) = α! for an integer α. */
    private Constant laguerreConstant() {
        Rational q = pochhammer(a.add(Rational.ONE), n).divide(factorial(n));
        if (a.isInteger()) {
            return new Constant(q.multiply(factorial(a.numerator().intValueExact())), null);
        }
        return new Constant(q, p -> BallFunctions.gamma(Ball.of(a.add(Rational.ONE), p + 10), p));
    }

    /**
     * 2√π Γ(λ+1/2)/Γ(λ) · (2λ)_n/n!. For λ = m + 1/2 the first factor is 2 m!/(1/2)_m, for an
     * integer λ = m it is 2π (1/2)_m/(m−1)! (Γ(m+1/2) = √π (1/2)_m, DLMF 5.4.6 with 5.2.5).
     */
    private Constant gegenbauerConstant() {
        Rational q = pochhammer(a.multiply(2), n).divide(factorial(n));
        Rational half = Rational.of(1, 2);
        Rational shifted = a.subtract(half);
        if (shifted.isInteger()) {
            int m = shifted.numerator().intValueExact();
            return new Constant(q.multiply(factorial(m)).multiply(2).divide(pochhammer(half, m)), null);
        }
        if (a.isInteger()) {
            int m = a.numerator().intValueExact();
            return new Constant(q.multiply(pochhammer(half, m)).multiply(2).divide(factorial(m - 1)), BallFunctions::pi);
        }
        return new Constant(q, p -> {
            int wp = p + 10;
            Ball ratio = BallFunctions.gamma(Ball.of(a.add(half), wp), wp).divide(BallFunctions.gamma(Ball.of(a, wp), wp), wp);
            return BallFunctions.sqrt(BallFunctions.pi(wp), wp).multiply(ratio, wp).multiply(Rational.TWO, p);
        });
    }

    /** μ_0 (α+1)_n (β+1)_n / ((α+β+2)_(n−1) n!); μ_0 is rational when α and β are integers. */
    private Constant jacobiConstant() {
        Rational ab2 = a.add(b).add(Rational.TWO);
        Rational q = pochhammer(a.add(Rational.ONE), n).multiply(pochhammer(b.add(Rational.ONE), n))
                .divide(pochhammer(ab2, n - 1).multiply(factorial(n)));
        if (a.isInteger() && b.isInteger()) {
            int ai = a.numerator().intValueExact();
            int bi = b.numerator().intValueExact();
            Rational mu0 = Rational.TWO.pow(ai + bi + 1).multiply(factorial(ai)).multiply(factorial(bi)).divide(factorial(ai + bi + 1));
            return new Constant(q.multiply(mu0), null);
        }
        return new Constant(q, p -> {
            int wp = p + 10;
            Ball two = BallFunctions.pow(Ball.exact(2), a.add(b).add(Rational.ONE), wp);
            Ball g = BallFunctions.gamma(Ball.of(a.add(Rational.ONE), wp), wp).multiply(BallFunctions.gamma(Ball.of(b.add(Rational.ONE), wp), wp), wp);
            return two.multiply(g, wp).divide(BallFunctions.gamma(Ball.of(ab2, wp), wp), wp);
        });
    }

    /** Rigorous: g(x, d) of the class comment over balls x ∋ node and d ∋ p_n'(node); (1 − x)(1 + x) keeps 1 − x² accurate near ±1. */
    Ball weightDenominator(Ball x, Ball d, int precBits) {
        Ball d2 = d.square(precBits);
        return switch (kind) {
            case HERMITE -> d2;
            case LAGUERRE -> x.multiply(d2, precBits);
            default -> Ball.ONE.subtract(x, precBits).multiply(Ball.ONE.add(x, precBits), precBits).multiply(d2, precBits);
        };
    }

    /** Exact: g(x, d) of the class comment at a rational node. */
    Rational weightDenominatorExact(Rational x, Rational d) {
        Rational d2 = d.multiply(d);
        return switch (kind) {
            case HERMITE -> d2;
            case LAGUERRE -> x.multiply(d2);
            default -> Rational.ONE.subtract(x.multiply(x)).multiply(d2);
        };
    }

    /**
     * Exact: the same g from x² = r and p_n'(x)² = d2 (for symmetric families g depends on x only
     * through x²; Laguerre is not symmetric).
     */
    Rational weightDenominatorFromSquares(Rational r, Rational d2) {
        return kind == Kind.HERMITE ? d2 : Rational.ONE.subtract(r).multiply(d2);
    }

    /** Rigorous: the scaling of the scaled weight, e^(x²) (Hermite) or e^x (Laguerre), over a ball x. */
    Ball scale(Ball x, int precBits) {
        Ball exponent = kind == Kind.HERMITE ? x.square(precBits + 20) : x;
        return BallFunctions.exp(exponent, precBits);
    }

    static Rational factorial(int k) {
        return pochhammer(Rational.ONE, k);
    }

    /** (q)_k = q (q + 1) … (q + k − 1), exactly (DLMF 5.2.4). */
    static Rational pochhammer(Rational q, int k) {
        BigInteger num = BigInteger.ONE;
        BigInteger den = BigInteger.ONE;
        for (int i = 0; i < k; i++) {
            Rational f = q.add(Rational.of(i));
            num = num.multiply(f.numerator());
            den = den.multiply(f.denominator());
        }
        return Rational.of(num, den);
    }
}
