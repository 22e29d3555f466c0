package dev.odetab.numeric;

import java.math.BigDecimal;
import java.math.BigInteger;
import java.math.RoundingMode;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.concurrent.ConcurrentHashMap;

/**
 * Elementary constants and functions of balls: pi, roots, exp, log, powers and gamma.
 *
 * <p>Trust level: Rigorous. Every ball returned here contains the exact value of the function
 * at every point of the input ball. Internally each routine works at a guarded precision
 * (about {@code precBits + 30} bits, more where squarings or large magnitudes cost bits) and
 * rounds the result once with {@link Ball#round(int)}; the relative radius of a result for an
 * exact input is then about 2^-precBits. Doubles appear only as {@code …Estimate} values that
 * choose term counts, shifts and working precisions; every radius comes from an exact
 * comparison, from ball arithmetic or from a tail bound rounded upward by {@link Directed}.
 * Methods: docs/methods.md §3.
 *
 * <p>Derivation: docs/methods.md §13 (rigorous elementary constants).
 */
public final class BallFunctions {
    /** Guard bits added to the requested precision for internal work. */
    private static final int GUARD_BITS = 30;
    /** Largest |x| accepted by {@link #exp}: 2^30 (the result still has a BigDecimal exponent). */
    private static final BigDecimal EXP_ARGUMENT_LIMIT = BigDecimal.valueOf(1L << 30);
    /** log2(10), for heuristic magnitude estimates only. */
    private static final double LOG2_10_ESTIMATE = 3.321928094887362;
    private static final BigDecimal HALF = new BigDecimal("0.5");
    private static final BigDecimal TWO = BigDecimal.valueOf(2);
    private static final BigDecimal MU_LOW = new BigDecimal("0.7");
    private static final BigDecimal MU_HIGH = new BigDecimal("1.4");
    /** Γ is increasing on [x0, ∞) with x0 = 1.4616… (DLMF 5.4(iii)); 3/2 &gt; x0. */
    private static final BigDecimal GAMMA_MONOTONE_FROM = new BigDecimal("1.5");

    /** π rounded at a public precision, keyed by precBits. */
    private static final Map<Integer, Ball> PI_CACHE = new ConcurrentHashMap<>();
    /** π at a working precision, keyed by wp. */
    private static final Map<Integer, Ball> PI_WORKING_CACHE = new ConcurrentHashMap<>();
    private static final Map<Integer, Ball> LN2_CACHE = new ConcurrentHashMap<>();
    /** B_0, B_1, B_2, … as exact rationals, extended on demand (guarded by the class lock). */
    private static final List<Rational> BERNOULLI_EXACT = new ArrayList<>(List.of(Rational.ONE));

    private BallFunctions() {
    }

    // ------------------------------------------------------------------ pi

    /**
     * Trust level: Rigorous. Encloses π; relative radius about 2^-precBits. Cached per precision.
     *
     * <p>Source: Machin's formula π = 16·atan(1/5) − 4·atan(1/239), with
     * atan(1/k) = Σ_{j≥0} (−1)^j / ((2j+1) k^(2j+1)). The terms alternate in sign and decrease in
     * magnitude, so the tail after n terms satisfies |Σ_{j≥n} …| &lt;= 1/((2n+1) k^(2n+1)) (the
     * first omitted term; Leibniz's alternating-series bound). The partial sums are computed in
     * ball arithmetic and each tail bound (rounded upward) is added to the radius; the final
     * radius therefore bounds 16·tail(5) + 4·tail(239) plus all rounding errors.
     *
     * @throws IllegalArgumentException when precBits &lt; 2
     */
    public static Ball pi(int precBits) {
        return PI_CACHE.computeIfAbsent(precBits, p -> piInternal(p + GUARD_BITS).round(p));
    }

    private static Ball piInternal(int wp) {
        return PI_WORKING_CACHE.computeIfAbsent(wp, p -> {
            Ball a5 = atanInverseInteger(5, p);
            Ball a239 = atanInverseInteger(239, p);
            return a5.multiply(Rational.of(16), p).subtract(a239.multiply(Rational.of(4), p), p);
        });
    }

    /** atan(1/k) for an integer k &gt;= 2 with the alternating-series tail in the radius (see {@link #pi}). */
    private static Ball atanInverseInteger(int k, int wp) {
        double log2kEstimate = Math.log(k) / Math.log(2);
        int n = (int) Math.ceil((wp + 10) / (2 * log2kEstimate)) + 1;
        BigInteger kk = BigInteger.valueOf(k);
        BigInteger k2 = kk.multiply(kk);
        BigInteger kPow = kk;
        Ball sum = Ball.ZERO;
        for (int j = 0; j < n; j++) {
            BigInteger den = kPow.multiply(BigInteger.valueOf(2L * j + 1));
            Ball term = Ball.ONE.divide(Ball.exact(new BigDecimal(den)), wp);
            sum = (j % 2 == 0) ? sum.add(term, wp) : sum.subtract(term, wp);
            kPow = kPow.multiply(k2);
        }
        // kPow = k^(2n+1) now: the first omitted term is 1/((2n+1) k^(2n+1))
        BigDecimal tailBound = Directed.absUp(Rational.of(BigInteger.ONE, kPow.multiply(BigInteger.valueOf(2L * n + 1))));
        return sum.addError(tailBound);
    }

    // ------------------------------------------------------------------ roots

    /**
     * Trust level: Rigorous. Encloses √x for every x in the ball; relative radius about
     * 2^-precBits. Same as {@link #root(Ball, int, int)} with n = 2.
     *
     * @throws ArithmeticException "sqrt of a negative number" when the ball lies entirely below
     *     zero, "sqrt of a number whose sign cannot be decided" when it contains negative numbers
     *     and numbers &gt;= 0 (a ball [0, u] is accepted)
     */
    public static Ball sqrt(Ball x, int precBits) {
        return root(x, 2, precBits);
    }

    /**
     * Trust level: Rigorous. Encloses the real n-th root x^(1/n) for every x in the ball;
     * relative radius about 2^-precBits.
     *
     * <p>Preconditions: n &gt;= 2; x &gt;= 0 for even n (a ball whose lower end is exactly 0 is
     * accepted); for odd n any real x (the root is odd and increasing on the whole line).
     *
     * <p>Method: exact bracketing. t ↦ t^(1/n) is increasing, so for x in [L, U] the root lies
     * in [lo, hi] with lo^n &lt;= L and U &lt;= hi^n. The candidates come from an integer n-th
     * root (Newton's iteration on BigInteger) and both inequalities are then checked exactly
     * with BigDecimal multiplication (no rounding) and corrected by one unit when they fail.
     *
     * @throws ArithmeticException for even n when the ball lies below zero or its sign cannot be
     *     decided (messages as in {@link #sqrt}); IllegalArgumentException when n &lt; 2
     */
    public static Ball root(Ball x, int n, int precBits) {
        return rootInternal(x, n, precBits + GUARD_BITS).round(precBits);
    }

    private static Ball rootInternal(Ball x, int n, int wp) {
        if (n < 2) {
            throw new IllegalArgumentException("root order must be at least 2, got " + n);
        }
        int digits = Precision.digits10(wp);
        BigDecimal lo = x.lower();
        BigDecimal hi = x.upper();
        String name = n == 2 ? "sqrt" : "root of order " + n;
        if (n % 2 == 0) {
            if (hi.signum() < 0) {
                throw new ArithmeticException(name + " of a negative number: " + x);
            }
            if (lo.signum() < 0) {
                throw new ArithmeticException(name + " of a number whose sign cannot be decided: " + x);
            }
        }
        BigDecimal rootLo = lo.signum() >= 0
                ? rootBracketExact(lo, n, digits)[0]
                : rootBracketExact(lo.negate(), n, digits)[1].negate();
        BigDecimal rootHi = hi.signum() >= 0
                ? rootBracketExact(hi, n, digits)[1]
                : rootBracketExact(hi.negate(), n, digits)[0].negate();
        return Ball.fromEndpoints(rootLo, rootHi).round(wp);
    }

    /**
     * Trust level: Exact. For v &gt;= 0 returns {lo, hi} with lo^n &lt;= v &lt;= hi^n, both
     * checked exactly, hi − lo one unit in the (digits+1)-th significant digit of the root.
     */
    private static BigDecimal[] rootBracketExact(BigDecimal v, int n, int digits) {
        if (v.signum() == 0) {
            return new BigDecimal[] {BigDecimal.ZERO, BigDecimal.ZERO};
        }
        int magnitude = v.precision() - v.scale(); // 10^(magnitude−1) <= v < 10^magnitude
        int scale = digits + 1 - Math.floorDiv(magnitude, n);
        BigInteger scaled = v.movePointRight(n * scale).setScale(0, RoundingMode.FLOOR).unscaledValue();
        BigInteger a = floorRootSeed(scaled, n);
        BigDecimal lo = new BigDecimal(a, scale);
        BigDecimal unit = BigDecimal.ONE.movePointLeft(scale);
        while (lo.pow(n).compareTo(v) > 0) {
            lo = lo.subtract(unit);
        }
        BigDecimal hi = lo.add(unit);
        while (hi.pow(n).compareTo(v) < 0) {
            lo = hi;
            hi = hi.add(unit);
        }
        return new BigDecimal[] {lo, hi};
    }

    /** A candidate for floor(N^(1/n)) by Newton's iteration from above; verified by the caller. */
    private static BigInteger floorRootSeed(BigInteger big, int n) {
        if (big.signum() == 0) {
            return BigInteger.ZERO;
        }
        if (n == 2) {
            return big.sqrt();
        }
        BigInteger nn = BigInteger.valueOf(n);
        BigInteger nMinus1 = BigInteger.valueOf(n - 1L);
        BigInteger x = BigInteger.ONE.shiftLeft((big.bitLength() + n - 1) / n);
        while (true) {
            BigInteger y = x.multiply(nMinus1).add(big.divide(x.pow(n - 1))).divide(nn);
            if (y.compareTo(x) >= 0) {
                return x;
            }
            x = y;
        }
    }

    // ------------------------------------------------------------------ exp

    /**
     * Trust level: Rigorous. Encloses e^x for every x in the ball; relative radius about
     * 2^-precBits plus the propagated input radius.
     *
     * <p>Precondition: |x| &lt;= 2^30 over the ball.
     *
     * <p>Method (point m = midpoint): exp(m) = exp(y)^(2^s) with y = m/2^s, |y| &lt;= 2^-t; the
     * Taylor series of exp(y) to degree n has remainder
     * |R_n(y)| = |Σ_{k&gt;n} y^k/k!| &lt;= |y|^(n+1)/(n+1)! · Σ_{j≥0} (|y|/(n+2))^j
     * = |y|^(n+1)/(n+1)! · 1/(1 − |y|/(n+2)), added to the radius (rounded upward); the s
     * squarings are ball products. Input radius r: exp(m ± r) ⊂ exp(m)·[e^−r, e^r] and
     * 1 − e^−r &lt;= e^r − 1, so |exp(x) − exp(m)| &lt;= exp(m)·(e^r − 1), with
     * e^r − 1 = Σ_{k≥1} r^k/k! &lt;= r·(e − 1) &lt;= 1.72·r for r &lt;= 1 and
     * e^r − 1 &lt;= e^r &lt;= (upper end of the enclosure of e^r) for r &gt; 1.
     *
     * @throws ArithmeticException when |x| may exceed 2^30
     */
    public static Ball exp(Ball x, int precBits) {
        return expInternal(x, precBits + GUARD_BITS).round(precBits);
    }

    private static Ball expInternal(Ball x, int wp) {
        if (x.absUpper().compareTo(EXP_ARGUMENT_LIMIT) > 0) {
            throw new ArithmeticException("exp argument too large (|x| > 2^30): " + x);
        }
        Ball e = expPoint(x.mid(), wp);
        if (x.isExact()) {
            return e;
        }
        BigDecimal r = x.rad();
        BigDecimal expm1Bound;
        if (r.compareTo(BigDecimal.ONE) <= 0) {
            expm1Bound = Directed.mulUp(r, new BigDecimal("1.72"));
        } else {
            expm1Bound = expPoint(Directed.up(r), 64).upper();
        }
        return e.addError(Directed.mulUp(e.absUpper(), expm1Bound));
    }

    /** exp at an exact point, at working precision wp (see {@link #exp} for the bounds). */
    private static Ball expPoint(BigDecimal m, int wp) {
        if (m.signum() == 0) {
            return Ball.ONE;
        }
        double log2AbsEstimate = log2Estimate(m.abs());
        int t = (int) Math.ceil(Math.sqrt(wp));
        int s = Math.max(0, (int) Math.ceil(log2AbsEstimate) + t);
        int wpi = wp + s + Math.max(0, (int) Math.ceil(log2AbsEstimate)) + 20;
        BigDecimal twoPowMinusS = new BigDecimal(BigInteger.valueOf(5).pow(s), s); // 2^-s exactly
        Ball y = Ball.exact(m.multiply(twoPowMinusS)).round(wpi);
        BigDecimal yAbs = y.absUpper();

        double log2YEstimate = log2Estimate(yAbs);
        int n = 1;
        double log2FactorialEstimate = 0;
        while (true) {
            log2FactorialEstimate += Math.log(n + 1) / Math.log(2);
            if ((n + 1) * log2YEstimate - log2FactorialEstimate < -(wpi + 10) || n > 100_000) {
                break;
            }
            n++;
        }
        BigDecimal nPlus2 = BigDecimal.valueOf(n + 2L);
        if (yAbs.compareTo(nPlus2) >= 0) {
            throw new ArithmeticException("exp: reduced argument " + yAbs + " too large for the tail bound");
        }
        // Horner: 1 + y/1·(1 + y/2·(1 + … (1 + y/n)))
        Ball sum = Ball.ONE;
        for (int k = n; k >= 1; k--) {
            sum = Ball.ONE.add(y.multiply(sum, wpi).divide(Rational.of(k), wpi), wpi);
        }
        BigInteger factorial = BigInteger.ONE;
        for (int k = 2; k <= n + 1; k++) {
            factorial = factorial.multiply(BigInteger.valueOf(k));
        }
        BigDecimal termBound = Directed.divUp(Directed.powUp(yAbs, n + 1), new BigDecimal(factorial));
        BigDecimal geometricDen = Directed.subDown(BigDecimal.ONE, Directed.divUp(yAbs, nPlus2));
        BigDecimal tailBound = Directed.divUp(termBound, geometricDen);
        Ball e = sum.addError(tailBound);
        for (int i = 0; i < s; i++) {
            e = e.square(wpi);
        }
        return e.round(wp);
    }

    // ------------------------------------------------------------------ cos

    /**
     * Rigorous: a ball containing cos(x) for every x in the ball, for |x| &lt;= 8 (enough for
     * Chebyshev nodes, whose angles lie in [0, π]).
     *
     * <p>Method: the Maclaurin series cos x = Σ_{j&lt;N} (−1)^j x^(2j)/(2j)! summed in ball
     * arithmetic (so the input radius is carried by the balls), plus the tail. With X &gt;= |x|
     * and N chosen so that X² &lt; (2N+1)(2N+2), the tail is dominated by a geometric series:
     * |Σ_{j&gt;=N} (−1)^j x^(2j)/(2j)!| &lt;= X^(2N)/(2N)! · 1/(1 − X²/((2N+1)(2N+2))),
     * since each term is at most X²/((2j+1)(2j+2)) times the one before (DLMF 4.19.1).
     *
     * @throws ArithmeticException when the ball reaches beyond |x| = 8
     */
    public static Ball cos(Ball x, int precBits) {
        BigDecimal bigX = x.absUpper();
        if (bigX.compareTo(BigDecimal.valueOf(8)) > 0) {
            throw new ArithmeticException("cos is implemented for |x| <= 8 only, got " + x);
        }
        int work = precBits + 20;
        Ball x2 = x.square(work);
        BigDecimal x2Up = Directed.mulUp(bigX, bigX);
        BigDecimal tiny = BigDecimal.ONE.scaleByPowerOfTen(-Precision.digits10(work) - 2);
        Ball sum = Ball.ONE;
        Ball term = Ball.ONE;
        BigDecimal termBound = BigDecimal.ONE;
        int j = 0;
        while (true) {
            j++;
            long den = (2L * j - 1) * (2L * j);
            term = term.multiply(x2, work).divide(BigInteger.valueOf(den), work).negate();
            termBound = Directed.divUp(Directed.mulUp(termBound, x2Up), BigDecimal.valueOf(den));
            sum = sum.add(term, work);
            long next = (2L * j + 1) * (2L * j + 2);
            if (x2Up.compareTo(BigDecimal.valueOf(next)) < 0) {
                // tail after the terms up to j: bound X^(2j+2)/(2j+2)! / (1 − X²/((2j+3)(2j+4)))
                BigDecimal nextTerm = Directed.divUp(Directed.mulUp(termBound, x2Up), BigDecimal.valueOf(next));
                long after = (2L * j + 3) * (2L * j + 4);
                BigDecimal ratio = Directed.divUp(x2Up, BigDecimal.valueOf(after));
                if (ratio.compareTo(BigDecimal.ONE) < 0 && nextTerm.compareTo(tiny) < 0) {
                    BigDecimal tail = Directed.divUp(nextTerm, Directed.subDown(BigDecimal.ONE, ratio));
                    return sum.addError(tail).round(precBits);
                }
            }
        }
    }

    // ------------------------------------------------------------------ log

    /**
     * Trust level: Rigorous. Encloses ln x for every x in the ball; relative radius about
     * 2^-precBits (absolute about 2^-precBits near x = 1 when the input is exact; relative
     * there too, because m − 1 is formed exactly).
     *
     * <p>Precondition: the ball lies in (0, ∞).
     *
     * <p>Method (point m = midpoint): m = 2^k·μ with μ in [0.7, 1.4] (exact scaling),
     * ln m = k·ln 2 + 2·atanh(u), u = (μ − 1)/(μ + 1), |u| &lt;= 0.18, and ln 2 = 2·atanh(1/3).
     * atanh(u) = Σ_{j≥0} u^(2j+1)/(2j+1); after n terms the tail is bounded by
     * Σ_{j≥n} |u|^(2j+1)/(2j+1) &lt;= |u|^(2n+1)/(2n+1) · Σ_{i≥0} u^(2i)
     * = |u|^(2n+1)/((2n+1)(1 − u²)), added to the radius (rounded upward, with |u| replaced by
     * the upper bound of |u| over its ball). Input radius r &lt; m: by the mean value theorem
     * |ln x − ln m| &lt;= r · max 1/ξ over ξ in [m − r, m + r] = r/(m − r).
     *
     * @throws ArithmeticException "log of a non-positive number" when the ball lies in
     *     (−∞, 0], "log of a number whose sign cannot be decided" when it contains 0 or reaches
     *     below it
     */
    public static Ball log(Ball x, int precBits) {
        return logInternal(x, precBits + GUARD_BITS).round(precBits);
    }

    private static Ball logInternal(Ball x, int wp) {
        if (x.upper().signum() <= 0) {
            throw new ArithmeticException("log of a non-positive number: " + x);
        }
        if (x.lower().signum() <= 0) {
            throw new ArithmeticException("log of a number whose sign cannot be decided (the ball reaches 0): " + x);
        }
        Ball l = logPoint(x.mid(), wp);
        if (x.isExact()) {
            return l;
        }
        BigDecimal shiftBound = Directed.divUp(x.rad(), Directed.subDown(x.mid(), x.rad()));
        return l.addError(shiftBound);
    }

    private static Ball logPoint(BigDecimal m, int wp) {
        if (m.compareTo(BigDecimal.ONE) == 0) {
            return Ball.ZERO;
        }
        int k = (int) Math.round(log2Estimate(m));
        BigDecimal mu = k >= 0
                ? m.multiply(new BigDecimal(BigInteger.valueOf(5).pow(k), k))
                : m.multiply(new BigDecimal(BigInteger.TWO.pow(-k)));
        while (mu.compareTo(MU_HIGH) > 0) {
            mu = mu.multiply(HALF);
            k++;
        }
        while (mu.compareTo(MU_LOW) < 0) {
            mu = mu.multiply(TWO);
            k--;
        }
        Ball num = Ball.exact(mu.subtract(BigDecimal.ONE)).round(wp);
        Ball den = Ball.exact(mu.add(BigDecimal.ONE)).round(wp);
        Ball atanh = atanhSeries(num.divide(den, wp), wp);
        Ball result = atanh.multiply(Rational.TWO, wp);
        if (k != 0) {
            result = result.add(ln2(wp).multiply(Rational.of(k), wp), wp);
        }
        return result;
    }

    /** ln 2 = 2·atanh(1/3) at working precision wp, cached. */
    private static Ball ln2(int wp) {
        return LN2_CACHE.computeIfAbsent(wp,
                p -> atanhSeries(Ball.of(Rational.of(1, 3), p), p).multiply(Rational.TWO, p));
    }

    /** atanh(u) for every u in the ball, |u| &lt;= 1/2, with the tail bound of {@link #log}. */
    private static Ball atanhSeries(Ball u, int wp) {
        BigDecimal uAbs = u.absUpper();
        if (uAbs.signum() == 0) {
            return Ball.ZERO;
        }
        if (uAbs.compareTo(HALF) > 0) {
            throw new ArithmeticException("atanh series needs |u| <= 1/2, got " + u);
        }
        double log2UEstimate = log2Estimate(uAbs);
        int n = Math.max(1, (int) Math.ceil((wp + 10) / (-2 * log2UEstimate)) + 1);
        Ball u2 = u.square(wp);
        Ball sum = Ball.of(Rational.of(1, 2L * n - 1), wp);
        for (int j = n - 2; j >= 0; j--) {
            sum = Ball.of(Rational.of(1, 2L * j + 1), wp).add(u2.multiply(sum, wp), wp);
        }
        BigDecimal oneMinusU2 = Directed.subDown(BigDecimal.ONE, Directed.mulUp(uAbs, uAbs));
        BigDecimal tailBound = Directed.divUp(Directed.powUp(uAbs, 2 * n + 1),
                Directed.mulDown(BigDecimal.valueOf(2L * n + 1), oneMinusU2));
        return u.multiply(sum, wp).addError(tailBound);
    }

    // ------------------------------------------------------------------ powers

    /**
     * Trust level: Rigorous. Encloses base^exponent for every base in the ball and the exact
     * rational exponent p/q (lowest terms); relative radius about 2^-precBits.
     *
     * <p>Integer exponent: {@link Ball#pow(int, int)} (repeated squaring in ball arithmetic).
     * Exponent p/q with q &lt;= 16: (base^|p|)^(1/q) by {@link #root} (exact bracketing), inverted
     * for p &lt; 0; for even p the power is non-negative, so a ball base^p reaching below zero is
     * first clipped to [0, upper]. Larger q: exp((p/q)·ln|base|) by {@link #exp} and
     * {@link #log}, with the sign (−1)^p for a negative base and odd q. By convention x^0 = 1.
     *
     * @throws ArithmeticException when the base may be 0 and the exponent is negative, when q is
     *     even and the base may be negative, or when |p| &gt;= 2^30
     */
    public static Ball pow(Ball base, Rational exponent, int precBits) {
        if (exponent.isZero()) {
            return Ball.ONE;
        }
        if (exponent.signum() < 0 && base.containsZero()) {
            throw new ArithmeticException("0 cannot be raised to the negative power " + exponent + " (base " + base + ")");
        }
        if (base.isExact() && base.mid().signum() == 0) {
            return Ball.ZERO;
        }
        BigInteger p = exponent.numerator();
        BigInteger q = exponent.denominator();
        if (p.bitLength() > 30) {
            throw new ArithmeticException("exponent numerator too large: " + exponent);
        }
        int pInt = p.intValueExact();
        int wp = precBits + GUARD_BITS + 32 - Integer.numberOfLeadingZeros(Math.abs(pInt));
        if (q.equals(BigInteger.ONE)) {
            return base.pow(pInt, wp).round(precBits);
        }
        boolean qOdd = q.testBit(0);
        if (q.compareTo(BigInteger.valueOf(16)) <= 0) {
            Ball powered = base.pow(Math.abs(pInt), wp);
            if (pInt % 2 == 0 && powered.lower().signum() < 0) {
                powered = Ball.fromEndpoints(BigDecimal.ZERO, powered.upper());
            }
            Ball r = rootInternal(powered, q.intValueExact(), wp);
            if (pInt < 0) {
                r = Ball.ONE.divide(r, wp);
            }
            return r.round(precBits);
        }
        if (base.lower().signum() == 0) {
            // t ↦ t^(p/q) is increasing on [0, ∞) for p/q > 0 and vanishes at 0
            Ball atUpper = pow(Ball.exact(base.upper()), exponent, precBits + GUARD_BITS);
            return Ball.fromEndpoints(BigDecimal.ZERO, atUpper.upper()).round(precBits);
        }
        boolean negativeBase = base.upper().signum() < 0;
        if (negativeBase && !qOdd) {
            throw new ArithmeticException("even root of a negative number in pow(" + base + ", " + exponent + ")");
        }
        if (!negativeBase && base.lower().signum() < 0) {
            throw new ArithmeticException("pow(" + base + ", " + exponent + "): the sign of the base cannot be decided");
        }
        Ball magnitude = negativeBase ? base.negate() : base;
        Ball r = powByExpLog(magnitude, Ball.of(exponent, wp), wp);
        if (negativeBase && p.testBit(0)) {
            r = r.negate();
        }
        return r.round(precBits);
    }

    /**
     * Trust level: Rigorous. Encloses base^exponent = exp(exponent · ln base) for every base and
     * exponent in their balls; relative radius about 2^-precBits plus the propagated input
     * radii. An exact integer exponent goes through {@link #pow(Ball, Rational, int)} (so
     * negative bases work); a caller that knows an exact rational exponent should call that
     * overload directly.
     *
     * <p>Precondition: base &gt; 0 over its ball (unless the exponent is an exact integer).
     * Bounds: those of {@link #log} and {@link #exp}, composed in ball arithmetic.
     *
     * @throws ArithmeticException when the base ball reaches 0 or below, or the product
     *     exponent·ln(base) may exceed 2^30 in magnitude
     */
    public static Ball pow(Ball base, Ball exponent, int precBits) {
        if (exponent.isExact() && exponent.mid().stripTrailingZeros().scale() <= 0) {
            return pow(base, Rational.of(exponent.mid()), precBits);
        }
        if (base.lower().signum() <= 0) {
            throw new ArithmeticException("pow with a non-integer exponent needs a positive base, got " + base);
        }
        return powByExpLog(base, exponent, precBits + GUARD_BITS).round(precBits);
    }

    /** exp(y·ln x) for x &gt; 0; extra bits cover the magnitude of y·ln x (absolute → relative error). */
    private static Ball powByExpLog(Ball x, Ball y, int wp) {
        Ball lnRough = logInternal(x, 32);
        double magnitudeEstimate = log2Estimate(lnRough.absUpper().multiply(y.absUpper()).add(BigDecimal.ONE));
        int wpi = wp + Math.max(0, (int) Math.ceil(magnitudeEstimate)) + 4;
        return expInternal(y.multiply(logInternal(x, wpi), wpi), wpi);
    }

    // ------------------------------------------------------------------ gamma

    /**
     * Trust level: Rigorous. Encloses Γ(x) for every x in the ball; relative radius about
     * 2^-precBits for exact inputs, plus the propagated input radius.
     *
     * <p>Precondition: the ball contains no pole, i.e. no integer &lt;= 0; the largest supported
     * argument is about 4·10^7 (ln Γ must stay within the range of {@link #exp}).
     *
     * <p>Method at an exact point x: shift to z = x + K &gt;= Z (Z about precBits/2) with
     * Γ(x) = Γ(z) / (x (x+1) … (x+K−1)) (recurrence DLMF 5.5.1, in ball arithmetic), and
     * Stirling's series DLMF 5.11.1:
     * ln Γ(z) = (z − 1/2) ln z − z + ln(2π)/2 + Σ_{k=1}^{N−1} B_{2k} / (2k(2k−1) z^(2k−1)) + R_N(z),
     * with exact Bernoulli numbers. DLMF §5.11(ii): for real z &gt; 0 the remainder R_N(z) is
     * bounded in absolute value by the first neglected term (and has its sign), so
     * |R_N(z)| &lt;= |B_{2N}| / (2N(2N−1) z^(2N−1)) &lt;= |B_{2N}| / (2N(2N−1) ⌊z⌋^(2N−1)), computed
     * exactly as a rational and rounded upward into the radius. N is chosen by a double
     * estimate of the terms; it only affects speed.
     *
     * <p>Ball input: Γ is increasing on [3/2, ∞) (its minimum on (0, ∞) is at 1.4616…, DLMF
     * 5.4(iii)), so a ball there maps into [Γ(lower), Γ(upper)], both ends evaluated rigorously;
     * a ball further left is first shifted right with Γ(x) = Γ(x+k) / (x (x+1) … (x+k−1)).
     *
     * @throws ArithmeticException "gamma has a pole at n" when the ball contains the integer
     *     n &lt;= 0
     */
    public static Ball gamma(Ball x, int precBits) {
        checkNoPole(x);
        int wp = precBits + GUARD_BITS;
        if (x.isExact()) {
            return gammaPoint(x.mid(), wp).round(precBits);
        }
        if (x.lower().compareTo(GAMMA_MONOTONE_FROM) >= 0) {
            return gammaMonotone(x, wp).round(precBits);
        }
        BigInteger shift = BigInteger.TWO.subtract(x.lower().setScale(0, RoundingMode.FLOOR).toBigIntegerExact());
        int k = shift.intValueExact();
        Ball shifted = x.add(Ball.exact(k), wp);
        Ball g = gammaMonotone(shifted, wp);
        Ball product = Ball.ONE;
        for (int j = 0; j < k; j++) {
            product = product.multiply(x.add(Ball.exact(j), wp), wp);
        }
        return g.divide(product, wp).round(precBits);
    }

    private static void checkNoPole(Ball x) {
        if (x.lower().signum() > 0) {
            return;
        }
        BigInteger firstInteger = x.lower().setScale(0, RoundingMode.CEILING).toBigIntegerExact();
        if (firstInteger.signum() <= 0 && new BigDecimal(firstInteger).compareTo(x.upper()) <= 0) {
            throw new ArithmeticException("gamma has a pole at " + firstInteger);
        }
    }

    /** Γ over a ball inside [3/2, ∞): the hull of the enclosures at both ends. */
    private static Ball gammaMonotone(Ball x, int wp) {
        if (x.lower().compareTo(GAMMA_MONOTONE_FROM) < 0) {
            throw new IllegalStateException("gammaMonotone needs lower >= 3/2, got " + x);
        }
        Ball atLower = gammaPoint(x.lower(), wp);
        Ball atUpper = gammaPoint(x.upper(), wp);
        return Ball.fromEndpoints(atLower.lower(), atUpper.upper());
    }

    private static Ball gammaPoint(BigDecimal x, int wp) {
        checkNoPole(Ball.exact(x));
        int target = wp / 2 + 8;
        BigDecimal targetDec = BigDecimal.valueOf(target);
        int k = x.compareTo(targetDec) >= 0 ? 0
                : targetDec.subtract(x).setScale(0, RoundingMode.CEILING).intValueExact();
        BigDecimal z = x.add(BigDecimal.valueOf(k));
        double log2ZEstimate = log2Estimate(z);
        int wpi = wp + 2 * (int) Math.ceil(log2ZEstimate + 1) + 32 - Integer.numberOfLeadingZeros(k) + 10;
        Ball lnGamma = lnGammaStirling(z, wpi);
        Ball g = expInternal(lnGamma, wpi);
        if (k > 0) {
            Ball product = Ball.ONE;
            for (int j = 0; j < k; j++) {
                product = product.multiply(Ball.exact(x.add(BigDecimal.valueOf(j))), wpi);
            }
            g = g.divide(product, wpi);
        }
        return g.round(wp);
    }

    /** ln Γ(z) for exact z &gt;= 8 by Stirling's series with the remainder bound of {@link #gamma}. */
    private static Ball lnGammaStirling(BigDecimal z, int wp) {
        BigInteger zFloor = z.setScale(0, RoundingMode.FLOOR).toBigIntegerExact();
        if (zFloor.compareTo(BigInteger.valueOf(8)) < 0) {
            throw new IllegalStateException("Stirling's series is used only for z >= 8, got " + z);
        }
        int n = stirlingTermCount(log2Estimate(z), wp);
        Ball zBall = Ball.exact(z);
        Ball lnZ = logPoint(z, wp);
        Ball twoPi = piInternal(wp).multiply(Rational.TWO, wp);
        Ball halfLn2Pi = logInternal(twoPi, wp).multiply(Rational.of(1, 2), wp);
        Ball main = zBall.subtract(Ball.exact(HALF), wp).multiply(lnZ, wp).subtract(zBall, wp).add(halfLn2Pi, wp);

        // Σ_{j=1}^{n−1} c_j w^(2j−1), c_j = B_{2j}/(2j(2j−1)), w = 1/z, by Horner in w².
        Ball w = Ball.ONE.divide(zBall, wp);
        Ball w2 = w.square(wp);
        Ball sum = Ball.ZERO;
        for (int j = n - 1; j >= 1; j--) {
            sum = Ball.of(stirlingCoefficientExact(j), wp).add(w2.multiply(sum, wp), wp);
        }
        sum = sum.multiply(w, wp);

        Rational remainderBound = stirlingCoefficientExact(n).abs()
                .divide(Rational.of(zFloor.pow(2 * n - 1)));
        return main.add(sum, wp).addError(Directed.absUp(remainderBound));
    }

    /** B_{2j} / (2j (2j − 1)), exact. */
    private static Rational stirlingCoefficientExact(int j) {
        return bernoulliExact(2 * j).divide(Rational.of(2L * j * (2L * j - 1)));
    }

    /**
     * Smallest N whose first neglected Stirling term is estimated below 2^-(wp+10), using
     * |B_{2N}| ≈ 2 (2N)! / (2π)^(2N) (from |B_{2N}| = 2 (2N)! ζ(2N) / (2π)^(2N), ζ(2N) ≈ 1).
     * Heuristic: chooses N only.
     */
    private static int stirlingTermCount(double log2ZEstimate, int wp) {
        double log2TwoPi = Math.log(2 * Math.PI) / Math.log(2);
        double log2Factorial = 0;
        for (int n = 1; n < 5000; n++) {
            log2Factorial += Math.log((2.0 * n - 1) * (2.0 * n)) / Math.log(2);
            double log2TermEstimate = 1 + log2Factorial - 2 * n * log2TwoPi
                    - Math.log((2.0 * n) * (2.0 * n - 1)) / Math.log(2) - (2 * n - 1) * log2ZEstimate;
            if (log2TermEstimate < -(wp + 10)) {
                return Math.max(n, 2);
            }
        }
        throw new ArithmeticException("Stirling's series cannot reach " + wp + " bits at z = 2^" + log2ZEstimate);
    }

    /**
     * B_m exactly, from Σ_{j=0}^{m} C(m+1, j) B_j = 0 (DLMF 24.5.3), i.e.
     * B_m = −(1/(m+1)) Σ_{j&lt;m} C(m+1, j) B_j, with B_1 = −1/2 and B_j = 0 for odd j &gt; 1.
     */
    private static synchronized Rational bernoulliExact(int m) {
        while (BERNOULLI_EXACT.size() <= m) {
            int next = BERNOULLI_EXACT.size();
            if (next > 1 && next % 2 == 1) {
                BERNOULLI_EXACT.add(Rational.ZERO);
                continue;
            }
            Rational acc = Rational.ZERO;
            BigInteger binom = BigInteger.ONE; // C(next+1, j)
            for (int j = 0; j < next; j++) {
                acc = acc.add(BERNOULLI_EXACT.get(j).multiply(Rational.of(binom)));
                binom = binom.multiply(BigInteger.valueOf(next + 1L - j)).divide(BigInteger.valueOf(j + 1L));
            }
            BERNOULLI_EXACT.add(acc.divide(Rational.of(next + 1L)).negate());
        }
        return BERNOULLI_EXACT.get(m);
    }

    // ------------------------------------------------------------------ helpers

    /** About log2(v) for v &gt; 0 (within 1). Heuristic: chooses parameters only. */
    private static double log2Estimate(BigDecimal v) {
        BigInteger unscaled = v.unscaledValue().abs();
        int shift = Math.max(0, unscaled.bitLength() - 60);
        double lead = unscaled.shiftRight(shift).doubleValue();
        return Math.log(lead) / Math.log(2) + shift - v.scale() * LOG2_10_ESTIMATE;
    }
}
