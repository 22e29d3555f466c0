package dev.odetab.ode;

import dev.odetab.expr.Poly;
import dev.odetab.numeric.ComplexBall;
import dev.odetab.numeric.Rational;
import java.math.BigDecimal;
import java.math.MathContext;
import java.math.RoundingMode;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;

/**
 * The singular points of P2 y'' + P1 y' + P0 y = 0, located, classified and isolated.
 *
 * <p>Mathematics. Work on the reduced equation (common factors removed, P2 monic; {@link
 * Equation#reduced()}); its singular points are the complex roots of P2 (docs/methods.md §1, DLMF
 * 2.7(i)).
 * <ol>
 * <li>Square-free decomposition P2 = Π_k f_k^k with f_k square-free and pairwise coprime
 * (Yun's algorithm; Yun, "On square-free decomposition algorithms", SYMSAC 1976; von zur
 * Gathen &amp; Gerhard, Modern Computer Algebra, Algorithm 14.21): the roots of f_k are the
 * roots of P2 of multiplicity exactly k.
 * <li>Fuchs (DLMF 2.7(i), 2.7(ii)): a root s of multiplicity k is regular iff
 * P1/P2 has at most a simple pole and P0/P2 at most a double pole there, that is
 * ord_s P1 &gt;= k − 1 and ord_s P0 &gt;= k − 2. Since ord_s P &gt;= m iff P, P', …, P^(m−1) vanish
 * at s, the regular roots of f_k are exactly the roots of
 * r_k = gcd(f_k, P1, P1', …, P1^(k−2), P0, P0', …, P0^(k−3)) (empty lists for small k: every
 * simple root is regular), and the irregular ones the roots of f_k / r_k. All of this is exact
 * rational polynomial arithmetic.
 * <li>The roots of each of these class polynomials are isolated by {@link RootIsolation}.
 * </ol>
 *
 * <p>Derivation: docs/methods.md §12 (singular points).
 */
public final class SingularPoints {
    /** Significant digits of {@link #radiusLowerBound}. */
    static final int DISTANCE_DIGITS = 40;
    private static final MathContext FLOOR = new MathContext(DISTANCE_DIGITS, RoundingMode.FLOOR);

    private SingularPoints() {
    }

    /** A class polynomial: its roots all have this multiplicity and this kind. */
    private record RootClass(Poly poly, int multiplicity, SingularPoint.Kind kind) {
    }

    /** A located singular point with its exact value kept as rationals for distances. */
    private record Located(SingularPoint point, RootIsolation.Root root) {
    }

    /**
     * Trust level: Rigorous (multiplicity, kind and exact values are Exact). Every root of the
     * reduced P2 once, sorted by the center of its disk (real part, then imaginary part).
     * Guarantees: each {@link SingularPoint#location()} contains exactly one distinct root of
     * the reduced P2 and the disks are pairwise disjoint; {@code exact}, when not null, was
     * verified by exact Gaussian-rational evaluation; {@code real} is proven either way.
     * Empty when the reduced P2 is constant (no singular point, e.g. Airy).
     * Sources: DLMF 2.7(i)/(ii) (Fuchs), docs/methods.md §1, the papers cited at {@link RootIsolation}.
     *
     * @throws ArithmeticException when the roots cannot be separated at the precision cap
     *                             ({@link RootIsolation#MAX_PREC_BITS} bits)
     */
    public static List<SingularPoint> of(Equation eq) {
        List<SingularPoint> out = new ArrayList<>();
        for (Located l : locate(eq)) {
            out.add(l.point);
        }
        return out;
    }

    private static List<Located> locate(Equation eq) {
        Equation r = eq.reduced();
        List<RootClass> classes = classify(r);
        List<Poly> polys = new ArrayList<>();
        for (RootClass c : classes) {
            polys.add(c.poly);
        }
        List<Located> out = new ArrayList<>();
        if (polys.isEmpty()) {
            return out;
        }
        List<List<RootIsolation.Root>> roots = RootIsolation.isolate(polys);
        for (int k = 0; k < classes.size(); k++) {
            RootClass c = classes.get(k);
            for (RootIsolation.Root root : roots.get(k)) {
                String exact = root.isExact() ? gaussianText(root.exactRe(), root.exactIm()) : null;
                out.add(new Located(new SingularPoint(root.disk(), exact, c.multiplicity, c.kind, root.real()), root));
            }
        }
        out.sort(Comparator.comparing((Located l) -> l.point.location().re())
                .thenComparing(l -> l.point.location().im()));
        return out;
    }

    /**
     * Trust level: Rigorous. A lower bound, rounded down to {@value #DISTANCE_DIGITS} digits,
     * of the distance from {@code at} to the nearest singular point: min over the singular
     * points of |at − center| − radius (exact distances for exactly known points), clamped at
     * zero. By Fuchs' theorem every solution's power series at an ordinary point converges in
     * the open disk reaching the nearest singular point (docs/methods.md §1; DLMF 2.7(i)), so this is a
     * guaranteed radius of convergence of every solution. Returns null when there is no
     * singular point (infinite radius).
     *
     * @throws IllegalArgumentException when {@code at} is a singular point (exact test, {@link Equation#isOrdinary})
     * @throws ArithmeticException      as {@link #of(Equation)}
     */
    public static BigDecimal radiusLowerBound(Equation eq, Rational at) {
        if (!eq.isOrdinary(at)) {
            throw new IllegalArgumentException(at + " is a singular point of " + eq);
        }
        List<Located> points = locate(eq);
        if (points.isEmpty()) {
            return null;
        }
        BigDecimal best = null;
        for (Located l : points) {
            BigDecimal d = distanceLower(l, at);
            best = best == null ? d : best.min(d);
        }
        return best;
    }

    /** |at − s| rounded down, for one singular point s; zero when the disk reaches {@code at}. */
    private static BigDecimal distanceLower(Located l, Rational at) {
        RootIsolation.Root root = l.root;
        if (root.isExact()) {
            Rational dx = at.subtract(root.exactRe());
            if (root.exactIm().isZero()) {
                return dx.abs().toBigDecimal(FLOOR);
            }
            Rational squared = dx.multiply(dx).add(root.exactIm().multiply(root.exactIm()));
            return ComplexBall.sqrtDown(squared.toBigDecimal(FLOOR), DISTANCE_DIGITS);
        }
        ComplexEnclosure disk = l.point.location();
        Rational dx = at.subtract(Rational.of(disk.re()));
        Rational dy = Rational.of(disk.im());
        Rational squared = dx.multiply(dx).add(dy.multiply(dy));
        BigDecimal center = ComplexBall.sqrtDown(squared.toBigDecimal(FLOOR), DISTANCE_DIGITS);
        BigDecimal d = center.subtract(disk.radius()).round(FLOOR);
        return d.signum() > 0 ? d : BigDecimal.ZERO;
    }

    /** Exact: the class polynomials of the reduced equation (constant ones left out). */
    private static List<RootClass> classify(Equation reduced) {
        List<Poly> f = squareFreeDecomposition(reduced.p2());
        List<RootClass> out = new ArrayList<>();
        for (int k = 1; k < f.size(); k++) {
            Poly fk = f.get(k);
            if (fk.isConstant()) {
                continue;
            }
            Poly regular = regularPart(fk, k, reduced.p1(), reduced.p0());
            Poly irregular = fk.divideExact(regular);
            if (!regular.isConstant()) {
                out.add(new RootClass(regular, k, SingularPoint.Kind.REGULAR));
            }
            if (!irregular.isConstant()) {
                out.add(new RootClass(irregular, k, SingularPoint.Kind.IRREGULAR));
            }
        }
        return out;
    }

    /**
     * Exact: r_k = gcd(f_k, P1, …, P1^(k−2), P0, …, P0^(k−3)), monic; the factor of the
     * square-free f_k whose roots s satisfy ord_s P1 &gt;= k − 1 and ord_s P0 &gt;= k − 2.
     */
    static Poly regularPart(Poly fk, int k, Poly p1, Poly p0) {
        Poly g = fk.monic();
        Poly d = p1;
        for (int j = 0; j <= k - 2; j++) {
            g = g.gcd(d);
            d = d.derivative();
        }
        d = p0;
        for (int j = 0; j <= k - 3; j++) {
            g = g.gcd(d);
            d = d.derivative();
        }
        return g;
    }

    /**
     * Trust level: Exact. Yun's square-free decomposition of a non-zero polynomial p: a list
     * f with f[0] = 1 (unused) and p = lc(p) · Π_{k&gt;=1} f[k]^k, each f[k] monic, square-free
     * and coprime to the others. Recurrence (characteristic 0): a_0 = gcd(p, p'),
     * b_1 = p/a_0, d_1 = p'/a_0 − b_1'; then f[k] = gcd(b_k, d_k), b_{k+1} = b_k/f[k],
     * d_{k+1} = d_k/f[k] − b_{k+1}', until b is constant (Yun 1976).
     */
    static List<Poly> squareFreeDecomposition(Poly p) {
        List<Poly> f = new ArrayList<>();
        f.add(Poly.ONE);
        if (p.isConstant()) {
            return f;
        }
        Poly monic = p.monic();
        Poly dp = monic.derivative();
        Poly a = monic.gcd(dp);
        Poly b = monic.divideExact(a);
        Poly d = dp.divideExact(a).subtract(b.derivative());
        while (!b.isConstant()) {
            Poly fk = b.gcd(d);
            f.add(fk);
            b = b.divideExact(fk);
            d = d.divideExact(fk).subtract(b.derivative());
        }
        return f;
    }

    /** {@code "1"}, {@code "-2i"}, {@code "i"}, {@code "-1/2 + 3i"}, {@code "(3/2)i"}. */
    static String gaussianText(Rational a, Rational b) {
        if (b.isZero()) {
            return a.toString();
        }
        Rational m = b.abs();
        String imag = m.equals(Rational.ONE) ? "i" : (m.isInteger() ? m + "i" : "(" + m + ")i");
        if (a.isZero()) {
            return (b.signum() < 0 ? "-" : "") + imag;
        }
        return a + (b.signum() < 0 ? " - " : " + ") + imag;
    }
}
