package dev.odetab.ode;

import dev.odetab.expr.Poly;
import dev.odetab.numeric.Ball;
import dev.odetab.numeric.ComplexBall;
import dev.odetab.numeric.Directed;
import dev.odetab.numeric.Precision;
import dev.odetab.numeric.Rational;
import java.math.BigDecimal;
import java.math.BigInteger;
import java.math.MathContext;
import java.math.RoundingMode;
import java.util.ArrayList;
import java.util.List;

/**
 * Isolating disks for all complex roots of a family of square-free, pairwise coprime
 * polynomials with rational coefficients.
 *
 * <p>Trust level: Rigorous. Each returned disk contains exactly one root of the product of
 * the input polynomials, and that root is a root of the polynomial the disk is listed under.
 * Roots that are Gaussian rationals a + bi are recognised and then known exactly.
 *
 * <p>Method. Approximations are heuristic (Aberth iteration seeded in complex doubles and
 * polished in plain BigDecimal; "a double may choose, never prove"). Gaussian-rational
 * candidates guessed from them are kept only after exact evaluation gives zero, and are
 * divided out exactly. Proof, for each remaining monic factor q of degree n with
 * distinct approximations z_1..z_n, comes from the Weierstrass corrections
 * W_i = q(z_i) / Π_{j≠i}(z_i − z_j): q is the characteristic polynomial of the matrix
 * A = diag(z_i) − (W_i)_{i,j} (matrix determinant lemma: det(z − A) = Π(z − z_j) +
 * Σ_i W_i Π_{j≠i}(z − z_j), a monic polynomial of degree n equal to q at the n points z_k),
 * so by Gerschgorin's theorem the disks |z − (z_i − W_i)| &lt;= (n − 1)|W_i|, hence also the
 * larger disks |z − z_i| &lt;= n|W_i|, cover all roots, and a connected component of m of the
 * larger disks holds exactly m roots (Braess &amp; Hadeler, Numer. Math. 21, 1973; Carstensen,
 * "Inclusion of the roots of a polynomial based on Gerschgorin's theorem", Numer. Math. 59,
 * 1991). W_i is computed in {@link ComplexBall} arithmetic and |W_i| rounded up. A disk that
 * meets no other disk (of any factor) therefore holds exactly one root of the product.
 *
 * <p>Reality (the coefficients are real, so roots come in conjugate pairs): a disk D that
 * avoids the real axis holds a non-real root; a disk D whose mirror image meets no other
 * disk holds a real root, because the conjugate of its root is a root, lies in the mirror
 * image and hence in D, and D holds only one root. Every disk must be decided one way or
 * the other, else the attempt fails.
 *
 * <p>Failure: when a disk overlaps another or cannot be decided real or non-real, the
 * precision doubles from {@link #START_PREC_BITS} up to {@link #MAX_PREC_BITS}; beyond that
 * an {@link ArithmeticException} names the polynomials.
 *
 * <p>Derivation: docs/methods.md §12 (root disks).
 */
final class RootIsolation {
    static final int START_PREC_BITS = 128;
    static final int MAX_PREC_BITS = 2048;
    private static final BigDecimal STALL = new BigDecimal("0.9");

    private RootIsolation() {
    }

    /** A certified root: its disk, its exact value when recognised, and whether it is real. */
    record Root(ComplexEnclosure disk, Rational exactRe, Rational exactIm, boolean real) {
        boolean isExact() {
            return exactRe != null;
        }
    }

    /**
     * Trust level: Rigorous. Isolating disks for the roots of every polynomial in
     * {@code polys}, listed per polynomial in the same order.
     *
     * @param polys non-constant, square-free, pairwise coprime polynomials with rational coefficients
     * @throws IllegalArgumentException when a precondition fails (checked exactly with gcds)
     * @throws ArithmeticException when the roots could not be separated at {@link #MAX_PREC_BITS}
     */
    static List<List<Root>> isolate(List<Poly> polys) {
        List<Part> parts = new ArrayList<>();
        for (Poly p : polys) {
            if (p.isConstant()) {
                throw new IllegalArgumentException("constant polynomial has no roots: " + p);
            }
            if (!p.gcd(p.derivative()).isConstant()) {
                throw new IllegalArgumentException("not square-free: " + p);
            }
            for (Part other : parts) {
                if (!other.rest.gcd(p).isConstant()) {
                    throw new IllegalArgumentException("not coprime: " + other.rest + " and " + p);
                }
            }
            parts.add(new Part(p.monic()));
        }
        for (int precBits = START_PREC_BITS; precBits <= MAX_PREC_BITS; precBits *= 2) {
            for (Part part : parts) {
                part.approx = aberth(part.rest, part.approx, precBits);
                part.recognize(precBits);
            }
            List<List<Root>> result = certify(parts, precBits);
            if (result != null) {
                return result;
            }
        }
        throw new ArithmeticException("could not isolate the roots of " + polys + " at " + MAX_PREC_BITS + " bits");
    }

    /** The certification step at one precision; null when some disk is not isolated or not decided. */
    private static List<List<Root>> certify(List<Part> parts, int precBits) {
        List<List<ComplexEnclosure>> disks = new ArrayList<>();
        List<ComplexEnclosure> all = new ArrayList<>();
        for (Part part : parts) {
            List<ComplexEnclosure> d = new ArrayList<>();
            for (Rational[] e : part.exact) {
                d.add(exactDisk(e[0], e[1], precBits));
            }
            List<ComplexEnclosure> w = weierstrassDisks(part.rest, part.approx, precBits);
            if (w == null) {
                return null;
            }
            d.addAll(w);
            disks.add(d);
            all.addAll(d);
        }
        for (int i = 0; i < all.size(); i++) {
            for (int j = i + 1; j < all.size(); j++) {
                if (!all.get(i).isDisjointFrom(all.get(j))) {
                    return null;
                }
            }
        }
        List<List<Root>> result = new ArrayList<>();
        for (int k = 0; k < parts.size(); k++) {
            Part part = parts.get(k);
            List<Root> roots = new ArrayList<>();
            List<ComplexEnclosure> d = disks.get(k);
            for (int i = 0; i < d.size(); i++) {
                ComplexEnclosure disk = d.get(i);
                if (i < part.exact.size()) {
                    Rational[] e = part.exact.get(i);
                    roots.add(new Root(disk, e[0], e[1], e[1].isZero()));
                    continue;
                }
                boolean real;
                if (disk.avoidsRealAxis()) {
                    real = false;
                } else if (mirrorMeetsOnlyItself(disk, all)) {
                    real = true;
                } else {
                    return null;
                }
                roots.add(new Root(disk, null, null, real));
            }
            result.add(roots);
        }
        return result;
    }

    private static boolean mirrorMeetsOnlyItself(ComplexEnclosure disk, List<ComplexEnclosure> all) {
        ComplexEnclosure mirror = disk.conjugate();
        for (ComplexEnclosure other : all) {
            if (other != disk && !mirror.isDisjointFrom(other)) {
                return false;
            }
        }
        return true;
    }

    /** The exact root a + bi rounded to {@code precBits}, the rounding errors (exact rationals) rounded up into the radius. */
    private static ComplexEnclosure exactDisk(Rational a, Rational b, int precBits) {
        Ball re = Ball.of(a, precBits);
        Ball im = Ball.of(b, precBits);
        return new ComplexEnclosure(re.mid(), im.mid(), Directed.addUp(re.rad(), im.rad()));
    }

    /**
     * Trust level: Rigorous. The disks |z − z_i| &lt;= n|W_i| (see the class comment) for the
     * approximations rounded to {@code precBits}; null when two approximations cannot be told
     * apart. An empty list for a constant {@code q}.
     */
    private static List<ComplexEnclosure> weierstrassDisks(Poly q, List<Cx> approx, int precBits) {
        int n = q.degree();
        List<ComplexEnclosure> out = new ArrayList<>();
        if (n <= 0) {
            return out;
        }
        MathContext mc = Precision.midpoint(precBits);
        List<ComplexBall> z = new ArrayList<>();
        for (Cx c : centers(approx, mc)) {
            z.add(ComplexBall.exact(c.re, c.im));
        }
        List<ComplexBall> coef = new ArrayList<>();
        for (Rational r : q.coefficients()) {
            coef.add(ComplexBall.of(r, Rational.ZERO, precBits));
        }
        BigDecimal nBig = BigDecimal.valueOf(n);
        for (int i = 0; i < n; i++) {
            ComplexBall zi = z.get(i);
            ComplexBall value = ComplexBall.ZERO;
            for (int k = n; k >= 0; k--) {
                value = value.multiply(zi, precBits).add(coef.get(k), precBits);
            }
            ComplexBall prod = ComplexBall.ONE;
            for (int j = 0; j < n; j++) {
                if (j != i) {
                    prod = prod.multiply(zi.subtract(z.get(j), precBits), precBits);
                }
            }
            ComplexBall w;
            try {
                w = value.divide(prod, precBits);
            } catch (ArithmeticException coincident) {
                return null;
            }
            BigDecimal r = Directed.mulUp(nBig, w.absUpper());
            out.add(new ComplexEnclosure(zi.re().mid(), zi.im().mid(), r));
        }
        return out;
    }

    /**
     * Heuristic choice of disk centers (any choice is sound; a good one keeps the disks small
     * and the output deterministic): the approximations rounded by {@code mc}; an imaginary
     * part below 10^(−digits/2) of the modulus is set to zero, and the remaining non-real
     * ones are paired with their nearest conjugate and replaced by an exactly conjugate pair
     * (the mean of the two), as the roots of a real polynomial are.
     */
    private static List<Cx> centers(List<Cx> approx, MathContext mc) {
        BigDecimal realCut = BigDecimal.ONE.scaleByPowerOfTen(-(mc.getPrecision() / 2));
        List<Cx> c = new ArrayList<>();
        for (Cx a : approx) {
            BigDecimal im = a.im.round(mc);
            if (im.abs().compareTo(realCut.multiply(a.normEstimate().max(BigDecimal.ONE))) <= 0) {
                im = BigDecimal.ZERO;
            }
            c.add(new Cx(a.re.round(mc), im));
        }
        boolean[] paired = new boolean[c.size()];
        BigDecimal two = BigDecimal.valueOf(2);
        for (int i = 0; i < c.size(); i++) {
            if (paired[i] || c.get(i).im.signum() <= 0) {
                continue;
            }
            int best = -1;
            BigDecimal bestDist = null;
            for (int j = 0; j < c.size(); j++) {
                if (paired[j] || c.get(j).im.signum() >= 0) {
                    continue;
                }
                BigDecimal d = c.get(i).subtract(new Cx(c.get(j).re, c.get(j).im.negate())).normEstimate();
                if (bestDist == null || d.compareTo(bestDist) < 0) {
                    best = j;
                    bestDist = d;
                }
            }
            if (best >= 0) {
                BigDecimal re = c.get(i).re.add(c.get(best).re).divide(two).round(mc);
                BigDecimal im = c.get(i).im.subtract(c.get(best).im).divide(two).round(mc);
                c.set(i, new Cx(re, im));
                c.set(best, new Cx(re, im.negate()));
                paired[i] = true;
                paired[best] = true;
            }
        }
        return c;
    }

    /** Per-polynomial state: exactly recognised roots, the remaining factor and its approximations. */
    private static final class Part {
        final List<Rational[]> exact = new ArrayList<>();
        Poly rest;
        List<Cx> approx;

        Part(Poly monic) {
            this.rest = monic;
        }

        /**
         * Heuristic guess, exact check: a root approximation whose parts have continued-fraction
         * convergents with small denominators close to it is tried as a Gaussian rational; it is
         * kept only when the exact evaluation of the remaining factor there is zero. Linear
         * factors are solved directly.
         */
        void recognize(int precBits) {
            int digits = Precision.digits10(precBits);
            boolean found = true;
            while (found && rest.degree() > 0) {
                found = false;
                if (rest.degree() == 1) {
                    Rational root = rest.coefficient(0).negate().divide(rest.coefficient(1));
                    exact.add(new Rational[] {root, Rational.ZERO});
                    rest = Poly.ONE;
                    approx = new ArrayList<>();
                    return;
                }
                for (Cx z : approx) {
                    Rational a = guess(z.re, digits);
                    Rational b = a == null ? null : guess(z.im, digits);
                    if (b == null || !isRootExact(rest, a, b)) {
                        continue;
                    }
                    if (b.isZero()) {
                        rest = rest.divideExact(Poly.of(a.negate(), Rational.ONE)).monic();
                        exact.add(new Rational[] {a, b});
                        removeNearest(a, b);
                    } else {
                        Poly quadratic = Poly.of(a.multiply(a).add(b.multiply(b)), a.multiply(-2), Rational.ONE);
                        rest = rest.divideExact(quadratic).monic();
                        Rational lower = b.signum() < 0 ? b : b.negate();
                        exact.add(new Rational[] {a, lower});
                        exact.add(new Rational[] {a, lower.negate()});
                        removeNearest(a, b);
                        removeNearest(a, b.negate());
                    }
                    found = true;
                    break;
                }
            }
        }

        private void removeNearest(Rational a, Rational b) {
            BigDecimal x = a.toBigDecimal(MathContext.DECIMAL128);
            BigDecimal y = b.toBigDecimal(MathContext.DECIMAL128);
            int best = -1;
            BigDecimal bestDist = null;
            for (int i = 0; i < approx.size(); i++) {
                Cx c = approx.get(i);
                BigDecimal d = c.re.subtract(x).abs().max(c.im.subtract(y).abs());
                if (bestDist == null || d.compareTo(bestDist) < 0) {
                    best = i;
                    bestDist = d;
                }
            }
            approx = new ArrayList<>(approx);
            approx.remove(best);
        }
    }

    /**
     * Heuristic: the first continued-fraction convergent p/q of x with q &lt;= 10^(digits/5)
     * and |x − p/q| &lt;= 10^(−digits/2) max(1, |x|), or null. Only a candidate: callers verify.
     * The gap between the two exponents makes a candidate for an irrational x unlikely
     * (it needs a partial quotient near 10^(digits/10)), so exact checks stay rare.
     */
    static Rational guess(BigDecimal x, int digits) {
        BigDecimal tol = BigDecimal.ONE.scaleByPowerOfTen(-digits / 2).multiply(x.abs().max(BigDecimal.ONE));
        BigInteger denCap = BigInteger.TEN.pow(Math.max(1, digits / 5));
        Rational rest = Rational.of(x);
        BigInteger h1 = BigInteger.ONE;
        BigInteger h2 = BigInteger.ZERO;
        BigInteger k1 = BigInteger.ZERO;
        BigInteger k2 = BigInteger.ONE;
        Rational xr = Rational.of(x);
        while (true) {
            BigInteger a = rest.floor();
            BigInteger h = a.multiply(h1).add(h2);
            BigInteger k = a.multiply(k1).add(k2);
            if (k.compareTo(denCap) > 0) {
                return null;
            }
            Rational candidate = Rational.of(h, k);
            if (xr.subtract(candidate).abs().compareTo(Rational.of(tol)) <= 0) {
                return candidate;
            }
            Rational frac = rest.subtract(Rational.of(a));
            if (frac.isZero()) {
                return null;
            }
            rest = frac.reciprocal();
            h2 = h1;
            h1 = h;
            k2 = k1;
            k1 = k;
        }
    }

    /** Exact: q(a + bi) == 0, by Horner in Gaussian rationals. */
    static boolean isRootExact(Poly q, Rational a, Rational b) {
        Rational re = Rational.ZERO;
        Rational im = Rational.ZERO;
        for (int k = q.degree(); k >= 0; k--) {
            Rational nr = re.multiply(a).subtract(im.multiply(b)).add(q.coefficient(k));
            Rational ni = re.multiply(b).add(im.multiply(a));
            re = nr;
            im = ni;
        }
        return re.isZero() && im.isZero();
    }

    /** A complex number in plain BigDecimal, for the heuristic iteration only. */
    private record Cx(BigDecimal re, BigDecimal im) {
        Cx add(Cx o) {
            return new Cx(re.add(o.re), im.add(o.im));
        }

        Cx subtract(Cx o) {
            return new Cx(re.subtract(o.re), im.subtract(o.im));
        }

        Cx multiply(Cx o, MathContext mc) {
            return new Cx(re.multiply(o.re).subtract(im.multiply(o.im)).round(mc),
                    re.multiply(o.im).add(im.multiply(o.re)).round(mc));
        }

        Cx divide(Cx o, MathContext mc) {
            BigDecimal den = o.re.multiply(o.re).add(o.im.multiply(o.im));
            BigDecimal nr = re.multiply(o.re).add(im.multiply(o.im));
            BigDecimal ni = im.multiply(o.re).subtract(re.multiply(o.im));
            return new Cx(nr.divide(den, mc), ni.divide(den, mc));
        }

        Cx round(MathContext mc) {
            return new Cx(re.round(mc), im.round(mc));
        }

        boolean isZero() {
            return re.signum() == 0 && im.signum() == 0;
        }

        /** max(|re|, |im|): within a factor sqrt 2 of the modulus, enough to steer the iteration. */
        BigDecimal normEstimate() {
            return re.abs().max(im.abs());
        }
    }

    /**
     * Heuristic: Aberth–Ehrlich iteration z_i ← z_i − N_i / (1 − N_i Σ_{j≠i} 1/(z_i − z_j)),
     * N_i = q(z_i)/q'(z_i) (Aberth, Math. Comp. 27, 1973), in BigDecimal with a few guard
     * digits beyond {@code precBits}. Starts from {@code start} when it has deg q points,
     * else from the double-precision seeds of {@link #seedsInDoubles}, else from a circle of radius Fujiwara's bound 2 max_k |a_{n−k}|^(1/k) (a double, used
     * only to choose starting points). Stops when the largest relative correction is below
     * 10^(−digits + 12), or when it is already below 10^(−digits/4) and shrinks by less than
     * a tenth in one sweep (the rounding noise of the evaluation is reached), or after an
     * iteration cap. The
     * result may be inaccurate, which the certification detects.
     */
    private static List<Cx> aberth(Poly q, List<Cx> start, int precBits) {
        int n = q.degree();
        if (n <= 0) {
            return new ArrayList<>();
        }
        int digits = Precision.digits10(precBits) + 8;
        MathContext mc = new MathContext(digits, RoundingMode.HALF_EVEN);
        Cx[] z = new Cx[n];
        int maxIter;
        if (start == null || start.size() != n) {
            start = seedsInDoubles(q);
        }
        if (start != null) {
            z = start.toArray(z);
            spreadCoincident(z, digits, mc);
            maxIter = 100 + 10 * n;
        } else {
            double logRadius = Double.NEGATIVE_INFINITY;
            for (int k = 1; k <= n; k++) {
                Rational a = q.coefficient(n - k).abs();
                if (!a.isZero()) {
                    double log2 = a.numerator().bitLength() - a.denominator().bitLength();
                    logRadius = Math.max(logRadius, log2 / k);
                }
            }
            double radius = Math.scalb(1.0, (int) Math.ceil(Math.min(Math.max(logRadius, -500), 500)) + 1);
            for (int k = 0; k < n; k++) {
                double angle = 2 * Math.PI * k / n + 0.7;
                z[k] = new Cx(new BigDecimal(radius * Math.cos(angle), mc), new BigDecimal(radius * Math.sin(angle), mc));
            }
            maxIter = 200 + 20 * n;
        }
        List<Cx> coef = new ArrayList<>();
        for (Rational r : q.coefficients()) {
            coef.add(new Cx(r.toBigDecimal(mc), BigDecimal.ZERO));
        }
        List<Cx> dcoef = new ArrayList<>();
        for (Rational r : q.derivative().coefficients()) {
            dcoef.add(new Cx(r.toBigDecimal(mc), BigDecimal.ZERO));
        }
        BigDecimal tol = BigDecimal.ONE.scaleByPowerOfTen(-(digits - 12));
        BigDecimal noise = BigDecimal.ONE.scaleByPowerOfTen(-(digits / 4));
        BigDecimal previous = null;
        Cx one = new Cx(BigDecimal.ONE, BigDecimal.ZERO);
        for (int iter = 0; iter < maxIter; iter++) {
            BigDecimal worst = BigDecimal.ZERO;
            for (int i = 0; i < n; i++) {
                Cx value = horner(coef, z[i], mc);
                if (value.isZero()) {
                    continue;
                }
                Cx slope = horner(dcoef, z[i], mc);
                Cx sum = new Cx(BigDecimal.ZERO, BigDecimal.ZERO);
                for (int j = 0; j < n; j++) {
                    Cx diff = z[i].subtract(z[j]);
                    if (j != i && !diff.isZero()) {
                        sum = sum.add(one.divide(diff, mc)).round(mc);
                    }
                }
                Cx step;
                if (slope.isZero()) {
                    step = value;
                } else {
                    Cx newton = value.divide(slope, mc);
                    Cx den = one.subtract(newton.multiply(sum, mc));
                    step = den.isZero() ? newton : newton.divide(den, mc);
                }
                z[i] = z[i].subtract(step).round(mc);
                BigDecimal rel = step.normEstimate().divide(z[i].normEstimate().max(BigDecimal.ONE), MathContext.DECIMAL64);
                worst = worst.max(rel);
            }
            if (worst.compareTo(tol) <= 0
                    || worst.compareTo(noise) <= 0 && previous != null && worst.compareTo(previous.multiply(STALL)) >= 0) {
                break;
            }
            previous = worst;
        }
        return new ArrayList<>(List.of(z));
    }

    /**
     * Heuristic: approximations that agree to about half the working digits (typically the
     * members of a root cluster, rounded alike at the previous precision) are moved apart on
     * a small circle of that relative size, each in its own direction; the Aberth correction
     * of coinciding points is identical, so without this they would never separate.
     */
    private static void spreadCoincident(Cx[] z, int digits, MathContext mc) {
        BigDecimal near = BigDecimal.ONE.scaleByPowerOfTen(-(digits / 2 - 8));
        int n = z.length;
        for (int i = 0; i < n; i++) {
            BigDecimal scale = near.multiply(z[i].normEstimate().max(BigDecimal.ONE));
            for (int j = 0; j < n; j++) {
                if (j != i && z[i].subtract(z[j]).normEstimate().compareTo(scale) <= 0) {
                    double angle = 2 * Math.PI * i / n + 0.3;
                    Cx shift = new Cx(scale.multiply(new BigDecimal(Math.cos(angle))), scale.multiply(new BigDecimal(Math.sin(angle))));
                    z[i] = z[i].add(shift).round(mc);
                    break;
                }
            }
        }
    }

    /**
     * Heuristic: the same Aberth iteration in complex doubles, from a circle of radius
     * Fujiwara's bound, as cheap starting points for the BigDecimal iteration; null when a
     * coefficient ratio or an iterate leaves the double range.
     */
    private static List<Cx> seedsInDoubles(Poly q) {
        int n = q.degree();
        double[] c = new double[n + 1];
        double bound = 0;
        for (int k = 0; k <= n; k++) {
            c[k] = q.coefficient(k).doubleEstimate();
            if (!Double.isFinite(c[k])) {
                return null;
            }
            if (k < n && c[k] != 0) {
                bound = Math.max(bound, Math.pow(Math.abs(c[k]), 1.0 / (n - k)));
            }
        }
        double radius = 2 * Math.max(bound, Double.MIN_NORMAL);
        double[] re = new double[n];
        double[] im = new double[n];
        for (int k = 0; k < n; k++) {
            re[k] = radius * Math.cos(2 * Math.PI * k / n + 0.7);
            im[k] = radius * Math.sin(2 * Math.PI * k / n + 0.7);
        }
        for (int iter = 0; iter < 500 + 20 * n; iter++) {
            double worst = 0;
            for (int i = 0; i < n; i++) {
                double pr = 0;
                double pi = 0;
                double dr = 0;
                double di = 0;
                for (int k = n; k >= 0; k--) {
                    double ndr = dr * re[i] - di * im[i] + pr;
                    di = dr * im[i] + di * re[i] + pi;
                    dr = ndr;
                    double npr = pr * re[i] - pi * im[i] + c[k];
                    pi = pr * im[i] + pi * re[i];
                    pr = npr;
                }
                double dd = dr * dr + di * di;
                if (dd == 0) {
                    continue;
                }
                double nr = (pr * dr + pi * di) / dd;
                double ni = (pi * dr - pr * di) / dd;
                double sr = 0;
                double si = 0;
                for (int j = 0; j < n; j++) {
                    double xr = re[i] - re[j];
                    double xi = im[i] - im[j];
                    double xx = xr * xr + xi * xi;
                    if (j != i && xx != 0) {
                        sr += xr / xx;
                        si -= xi / xx;
                    }
                }
                double er = 1 - (nr * sr - ni * si);
                double ei = -(nr * si + ni * sr);
                double ee = er * er + ei * ei;
                double wr = ee == 0 ? nr : (nr * er + ni * ei) / ee;
                double wi = ee == 0 ? ni : (ni * er - nr * ei) / ee;
                re[i] -= wr;
                im[i] -= wi;
                worst = Math.max(worst, Math.hypot(wr, wi) / Math.max(1, Math.hypot(re[i], im[i])));
            }
            if (!Double.isFinite(worst)) {
                return null;
            }
            if (worst < 1e-14) {
                break;
            }
        }
        List<Cx> out = new ArrayList<>();
        for (int i = 0; i < n; i++) {
            out.add(new Cx(new BigDecimal(re[i]), new BigDecimal(im[i])));
        }
        return out;
    }

    private static Cx horner(List<Cx> coef, Cx z, MathContext mc) {
        Cx r = new Cx(BigDecimal.ZERO, BigDecimal.ZERO);
        for (int k = coef.size() - 1; k >= 0; k--) {
            r = r.multiply(z, mc).add(coef.get(k)).round(mc);
        }
        return r;
    }
}
