package dev.odetab.ode;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.odetab.expr.Poly;
import dev.odetab.numeric.Rational;
import java.math.BigDecimal;
import java.util.ArrayList;
import java.util.List;
import org.apache.commons.math3.analysis.solvers.LaguerreSolver;
import org.apache.commons.math3.complex.Complex;
import org.apfloat.Apcomplex;
import org.apfloat.ApcomplexMath;
import org.apfloat.Apfloat;
import org.apfloat.ApfloatMath;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;

class SingularPointsTest {
    private static final long REF_DIGITS = 80;

    /** Σ c[i] x^i with integer coefficients, lowest degree first. */
    private static Poly poly(long... c) {
        Rational[] r = new Rational[c.length];
        for (int i = 0; i < c.length; i++) {
            r[i] = Rational.of(c[i]);
        }
        return Poly.of(r);
    }

    private static Equation eq(Poly p2, Poly p1, Poly p0) {
        return new Equation(p2, p1, p0);
    }

    private static BigDecimal dec(Apfloat a) {
        return new BigDecimal(a.toString(true));
    }

    private static List<String> exactOf(List<SingularPoint> pts) {
        List<String> out = new ArrayList<>();
        for (SingularPoint p : pts) {
            out.add(p.exact());
        }
        return out;
    }

    private static void assertPairwiseDisjoint(List<SingularPoint> pts) {
        for (int i = 0; i < pts.size(); i++) {
            for (int j = i + 1; j < pts.size(); j++) {
                assertTrue(pts.get(i).location().isDisjointFrom(pts.get(j).location()), pts.get(i) + " / " + pts.get(j));
            }
        }
    }

    @Test
    void legendreHasRegularSingularPointsPlusMinusOne() {
        // (1 - x^2) y'' - 2x y' + n(n+1) y = 0 with n = 5: DLMF 14.2.1 / Table 18.8.1
        Equation legendre = eq(poly(1, 0, -1), poly(0, -2), poly(30));
        List<SingularPoint> pts = SingularPoints.of(legendre);
        assertEquals(List.of("-1", "1"), exactOf(pts));
        for (SingularPoint p : pts) {
            assertEquals(SingularPoint.Kind.REGULAR, p.kind());
            assertEquals(1, p.multiplicity());
            assertTrue(p.real());
        }
        assertEquals("x = 1 (regular, simple root of P2)", pts.get(1).toString());
        // nearest singular points ±1 (DLMF 14.2.1): radius exactly 1 at 0 and 1/2 at 1/2
        assertEquals(0, SingularPoints.radiusLowerBound(legendre, Rational.ZERO).compareTo(BigDecimal.ONE));
        assertEquals(0, SingularPoints.radiusLowerBound(legendre, Rational.of(1, 2)).compareTo(new BigDecimal("0.5")));
        assertEquals(0, SingularPoints.radiusLowerBound(legendre, Rational.of(-3)).compareTo(BigDecimal.valueOf(2)));
    }

    @Test
    void radiusAtASingularPointIsRejected() {
        Equation legendre = eq(poly(1, 0, -1), poly(0, -2), poly(30));
        assertThrows(IllegalArgumentException.class, () -> SingularPoints.radiusLowerBound(legendre, Rational.ONE));
    }

    @Test
    void complexSingularPointsAreFoundExactly() {
        // (x^2 + 4) y'' + y = 0: P2 vanishes at ±2i exactly
        Equation e = eq(poly(4, 0, 1), Poly.ZERO, poly(1));
        List<SingularPoint> pts = SingularPoints.of(e);
        assertEquals(List.of("-2i", "2i"), exactOf(pts));
        for (SingularPoint p : pts) {
            assertEquals(SingularPoint.Kind.REGULAR, p.kind());
            assertFalse(p.real());
        }
        assertTrue(pts.get(0).location().contains(BigDecimal.ZERO, BigDecimal.valueOf(-2)));
        assertTrue(pts.get(1).location().contains(BigDecimal.ZERO, BigDecimal.valueOf(2)));
        assertEquals("x = 2i (regular, simple root of P2)", pts.get(1).toString());
        assertEquals(0, SingularPoints.radiusLowerBound(e, Rational.ZERO).compareTo(BigDecimal.valueOf(2)));
        // |1 - 2i| = sqrt 5; reference digits: apfloat 1.15.0 ApfloatMath.sqrt at 80 digits
        BigDecimal sqrt5 = dec(ApfloatMath.sqrt(new Apfloat(5, REF_DIGITS)));
        BigDecimal bound = SingularPoints.radiusLowerBound(e, Rational.ONE);
        assertTrue(bound.compareTo(sqrt5) <= 0, bound + " > sqrt 5");
        assertTrue(bound.compareTo(sqrt5.subtract(new BigDecimal("1e-20"))) >= 0, bound + " too far below sqrt 5");
    }

    @Test
    void gaussianRationalPointsPrintExactly() {
        // P2 = (x + 1/2)^2 + 9 has roots -1/2 ± 3i; P2 = x^2 + 1 has roots ±i
        Equation e = eq(Poly.of(Rational.of(37, 4), Rational.ONE, Rational.ONE), Poly.ZERO, poly(1));
        assertEquals(List.of("-1/2 - 3i", "-1/2 + 3i"), exactOf(SingularPoints.of(e)));
        assertEquals(List.of("-i", "i"), exactOf(SingularPoints.of(eq(poly(1, 0, 1), Poly.ZERO, poly(1)))));
        // 9x^2 + 4 has roots ±(2/3)i
        assertEquals(List.of("-(2/3)i", "(2/3)i"), exactOf(SingularPoints.of(eq(poly(4, 0, 9), Poly.ZERO, poly(1)))));
    }

    @Test
    void airyHasNoSingularPoint() {
        // y'' - x y = 0 (DLMF 9.2.1): entire solutions
        Equation airy = eq(poly(1), Poly.ZERO, poly(0, -1));
        assertTrue(SingularPoints.of(airy).isEmpty());
        assertNull(SingularPoints.radiusLowerBound(airy, Rational.of(7)));
    }

    @Test
    void commonFactorIsRemovedFirst() {
        // x y'' + x y = 0 is y'' + y = 0 after dividing by x
        Equation e = eq(poly(0, 1), Poly.ZERO, poly(0, 1));
        assertTrue(SingularPoints.of(e).isEmpty());
        assertNull(SingularPoints.radiusLowerBound(e, Rational.ZERO));
    }

    @Test
    void fuchsClassificationAtZero() {
        // x^3 y'' + y = 0: k = 3 needs ord P0 >= 1, but P0(0) = 1 -> irregular
        SingularPoint a = SingularPoints.of(eq(poly(0, 0, 0, 1), Poly.ZERO, poly(1))).get(0);
        assertEquals("0", a.exact());
        assertEquals(3, a.multiplicity());
        assertEquals(SingularPoint.Kind.IRREGULAR, a.kind());
        // x^2 y'' + y' + y = 0: k = 2 needs ord P1 >= 1, but P1(0) = 1 -> irregular
        SingularPoint b = SingularPoints.of(eq(poly(0, 0, 1), poly(1), poly(1))).get(0);
        assertEquals(2, b.multiplicity());
        assertEquals(SingularPoint.Kind.IRREGULAR, b.kind());
        assertEquals("x = 0 (irregular, double root of P2)", b.toString());
        // x^2 y'' + y = 0: ord P0 = 0 >= k - 2 = 0 -> regular
        assertEquals(SingularPoint.Kind.REGULAR, SingularPoints.of(eq(poly(0, 0, 1), Poly.ZERO, poly(1))).get(0).kind());
        // Bessel x^2 y'' + x y' + (x^2 - nu^2) y = 0, nu = 1/3: regular at 0 (DLMF 10.2.1)
        Equation bessel = eq(poly(0, 0, 1), poly(0, 1), Poly.of(Rational.of(-1, 9), Rational.ZERO, Rational.ONE));
        List<SingularPoint> pts = SingularPoints.of(bessel);
        assertEquals(1, pts.size());
        assertEquals(SingularPoint.Kind.REGULAR, pts.get(0).kind());
        assertEquals(2, pts.get(0).multiplicity());
    }

    @Test
    void mixedMultiplicitiesAreClassifiedPerRoot() {
        // P2 = x^2 (x - 1) = x^3 - x^2
        Poly p2 = poly(0, 0, -1, 1);
        // P1 = x, P0 = 1: at 0 (k = 2) P1(0) = 0 -> regular; at 1 (k = 1) regular
        List<SingularPoint> reg = SingularPoints.of(eq(p2, poly(0, 1), poly(1)));
        assertEquals(List.of("0", "1"), exactOf(reg));
        assertEquals(2, reg.get(0).multiplicity());
        assertEquals(SingularPoint.Kind.REGULAR, reg.get(0).kind());
        assertEquals(1, reg.get(1).multiplicity());
        assertEquals(SingularPoint.Kind.REGULAR, reg.get(1).kind());
        // P1 = 1 instead: at 0 P1(0) != 0 -> irregular; 1 stays regular
        List<SingularPoint> irr = SingularPoints.of(eq(p2, poly(1), poly(1)));
        assertEquals(SingularPoint.Kind.IRREGULAR, irr.get(0).kind());
        assertEquals(SingularPoint.Kind.REGULAR, irr.get(1).kind());
    }

    @Test
    void regularPartAgreesWithOrdersAtRationalRoots() {
        // identity: the gcd test equals the definition ord_s P1 >= k-1, ord_s P0 >= k-2 (DLMF 2.7(ii))
        Poly f = poly(0, 1).multiply(poly(-1, 1)).multiply(poly(2, 1)).multiply(poly(-3, 1));
        Poly p1 = poly(0, 1).pow(2).multiply(poly(2, 1)).multiply(poly(-3, 1).pow(2));
        Poly p0 = poly(0, 1).multiply(poly(-1, 1)).multiply(poly(-3, 1));
        int k = 3;
        Poly r = SingularPoints.regularPart(f, k, p1, p0);
        for (long s : new long[] {0, 1, -2, 3}) {
            Rational at = Rational.of(s);
            boolean byOrder = p1.orderAt(at) >= k - 1 && p0.orderAt(at) >= k - 2;
            assertEquals(byOrder, r.evaluate(at).isZero(), "root " + s);
        }
        assertEquals(poly(0, 1).multiply(poly(-3, 1)), r);
    }

    @Test
    void squareFreeDecompositionMultipliesBack() {
        // identity: p = Π f_k^k with f_k pairwise coprime
        Poly p = poly(-1, 1).pow(3).multiply(poly(1, 0, 1).pow(2)).multiply(poly(2, 1)).multiply(poly(0, 1).pow(5));
        List<Poly> f = SingularPoints.squareFreeDecomposition(p.scale(Rational.of(7)));
        Poly product = Poly.ONE;
        for (int k = 1; k < f.size(); k++) {
            product = product.multiply(f.get(k).pow(k));
        }
        assertEquals(p, product);
        assertEquals(poly(2, 1), f.get(1));
        assertEquals(poly(1, 0, 1), f.get(2));
        assertEquals(poly(-1, 1), f.get(3));
        assertEquals(poly(0, 1), f.get(5));
    }

    /** Roots of Σ c[i] x^i: commons-math3 3.6.1 LaguerreSolver seeds, polished by Newton in apfloat 1.15.0 at 80 digits. */
    private static List<Apcomplex> referenceRoots(long... c) {
        double[] d = new double[c.length];
        for (int i = 0; i < c.length; i++) {
            d[i] = c[i];
        }
        List<Apcomplex> out = new ArrayList<>();
        for (Complex z : new LaguerreSolver().solveAllComplex(d, 0.3)) {
            out.add(newton(c, new Apcomplex(new Apfloat(z.getReal(), REF_DIGITS), new Apfloat(z.getImaginary(), REF_DIGITS))));
        }
        return out;
    }

    /** Ten Newton steps for Σ c[i] x^i in apfloat 1.15.0 arithmetic at the precision of the seed. */
    private static Apcomplex newton(long[] c, Apcomplex seed) {
        Apcomplex x = seed;
        for (int it = 0; it < 10; it++) {
            Apcomplex v = Apcomplex.ZERO;
            Apcomplex dv = Apcomplex.ZERO;
            for (int i = c.length - 1; i >= 0; i--) {
                dv = dv.multiply(x).add(v);
                v = v.multiply(x).add(new Apfloat(c[i], seed.precision()));
            }
            x = x.subtract(v.divide(dv));
        }
        return x;
    }

    private static List<Apcomplex> referenceRoots(Poly p) {
        long[] c = new long[p.degree() + 1];
        for (int i = 0; i < c.length; i++) {
            c[i] = p.coefficient(i).numerator().longValueExact();
        }
        return referenceRoots(c);
    }

    private static void assertEachReferenceInExactlyOneDisk(List<Apcomplex> refs, List<SingularPoint> pts) {
        assertEquals(refs.size(), pts.size());
        boolean[] used = new boolean[pts.size()];
        for (Apcomplex r : refs) {
            int hits = 0;
            int which = -1;
            for (int i = 0; i < pts.size(); i++) {
                if (pts.get(i).location().contains(dec(r.real()), dec(r.imag()))) {
                    hits++;
                    which = i;
                }
            }
            assertEquals(1, hits, "reference root " + r + " in " + pts);
            assertFalse(used[which]);
            used[which] = true;
        }
    }

    @Test
    void cubeRootsOfTwoAreIsolatedAndClassifiedReal() {
        // P2 = x^3 - 2: roots 2^(1/3) e^(2 pi i k/3); references from apfloat 1.15.0 ApcomplexMath.allRoots
        List<SingularPoint> pts = SingularPoints.of(eq(poly(-2, 0, 0, 1), Poly.ZERO, poly(1)));
        assertPairwiseDisjoint(pts);
        List<Apcomplex> refs = List.of(ApcomplexMath.allRoots(new Apcomplex(new Apfloat(2, REF_DIGITS)), 3));
        assertEachReferenceInExactlyOneDisk(refs, pts);
        assertEachReferenceInExactlyOneDisk(referenceRoots(-2, 0, 0, 1), pts);
        int real = 0;
        for (SingularPoint p : pts) {
            assertNull(p.exact());
            boolean expectReal = p.location().im().abs().compareTo(BigDecimal.ONE) < 0;
            assertEquals(expectReal, p.real(), p.toString());
            real += p.real() ? 1 : 0;
        }
        assertEquals(1, real);
        BigDecimal cbrt2 = dec(ApfloatMath.cbrt(new Apfloat(2, REF_DIGITS)));
        // sorted by real part: the conjugate pair at -2^(1/3)/2 first, lower half-plane first, then 2^(1/3)
        assertTrue(pts.get(2).location().contains(cbrt2, BigDecimal.ZERO));
        assertTrue(pts.get(0).location().im().signum() < 0 && pts.get(1).location().im().signum() > 0);
        // distance from 0 to every root is 2^(1/3): the bound lies just below it
        BigDecimal bound = SingularPoints.radiusLowerBound(eq(poly(-2, 0, 0, 1), Poly.ZERO, poly(1)), Rational.ZERO);
        assertTrue(bound.compareTo(cbrt2) <= 0);
        assertTrue(bound.compareTo(cbrt2.subtract(new BigDecimal("1e-25"))) >= 0, bound.toString());
    }

    @Test
    void quinticWithoutClosedFormRoots() {
        // x^5 - x - 1: irreducible, one real root; references: commons-math3 3.6.1 LaguerreSolver + apfloat Newton
        List<SingularPoint> pts = SingularPoints.of(eq(poly(-1, -1, 0, 0, 0, 1), Poly.ZERO, poly(1)));
        assertPairwiseDisjoint(pts);
        assertEachReferenceInExactlyOneDisk(referenceRoots(-1, -1, 0, 0, 0, 1), pts);
        assertEquals(1, pts.stream().filter(SingularPoint::real).count());
    }

    @Test
    void mixedExactAndIrrationalRootsAcrossClasses() {
        // P2 = (x^2 - 2)^2 (x - 1/3)(x^2 + 1), P1 = 0, P0 = 1: sqrt 2 double roots are regular (ord P0 = 0 >= 0)
        Poly p2 = poly(-2, 0, 1).pow(2).multiply(Poly.of(Rational.of(-1, 3), Rational.ONE)).multiply(poly(1, 0, 1));
        List<SingularPoint> pts = SingularPoints.of(eq(p2, Poly.ZERO, poly(1)));
        assertPairwiseDisjoint(pts);
        assertEquals(5, pts.size());
        BigDecimal sqrt2 = dec(ApfloatMath.sqrt(new Apfloat(2, REF_DIGITS)));
        assertTrue(pts.get(0).location().contains(sqrt2.negate(), BigDecimal.ZERO));
        assertEquals(2, pts.get(0).multiplicity());
        assertTrue(pts.get(0).real());
        assertEquals("-i", pts.get(1).exact());
        assertEquals("i", pts.get(2).exact());
        assertEquals("1/3", pts.get(3).exact());
        assertTrue(pts.get(4).location().contains(sqrt2, BigDecimal.ZERO));
        // the exact 1/3 is the nearest singular point to 0
        BigDecimal third = SingularPoints.radiusLowerBound(eq(p2, Poly.ZERO, poly(1)), Rational.ZERO);
        assertTrue(third.compareTo(new BigDecimal("0.3333333333333333333333333333333333333333")) == 0, third.toString());
    }

    @Test
    void closeRealRootsAreSeparated() {
        // Mignotte-type x^7 - 2 (10^6 x - 1)^2: two real roots 1e-6 ± about 7e-28, with five others
        Poly p2 = Poly.X.pow(7).add(poly(-1, 1_000_000).pow(2).scale(Rational.of(-2)));
        Equation e = eq(p2, Poly.ZERO, poly(1));
        List<SingularPoint> pts = SingularPoints.of(e);
        assertEquals(7, pts.size());
        assertPairwiseDisjoint(pts);
        assertEquals(3, pts.stream().filter(SingularPoint::real).count());
        // reference: x^7 = 2 (10^6 x - 1)^2 gives x ≈ 1e-6 ± sqrt(1e-42 / 2) / 1e6; polished by apfloat
        // Newton at 200 digits (evaluating near 1e-6 cancels about 42 of them)
        long[] c = new long[8];
        for (int i = 0; i < 8; i++) {
            c[i] = p2.coefficient(i).numerator().longValueExact();
        }
        BigDecimal micro = new BigDecimal("1e-6");
        for (int k = 0; k < 2; k++) {
            Apfloat seed = new Apfloat("1e-6", 200).add(new Apfloat(k == 0 ? "-7.0710678e-28" : "7.0710678e-28", 200));
            Apcomplex root = newton(c, new Apcomplex(seed));
            SingularPoint p = pts.get(2 + k);
            assertTrue(p.location().contains(dec(root.real()), dec(root.imag())), root + " not in " + p.location());
            assertTrue(p.real());
        }
        BigDecimal distance = SingularPoints.radiusLowerBound(e, Rational.ZERO);
        assertTrue(distance.compareTo(new BigDecimal("0.99999999999999999999e-6")) > 0 && distance.compareTo(micro) < 0, distance.toString());
    }

    @Test
    void degreeTwentyPerturbedWilkinson() {
        // Π_{i=1..20} (x - i) + 2^-23 x^19 (Wilkinson's perturbation): ten real roots and five conjugate pairs
        Poly w = Poly.ONE;
        for (int i = 1; i <= 20; i++) {
            w = w.multiply(poly(-i, 1));
        }
        w = w.add(Poly.X.pow(19).scale(Rational.of(1, 1L << 23)));
        List<SingularPoint> pts = SingularPoints.of(eq(w, Poly.ZERO, poly(1)));
        assertEquals(20, pts.size());
        assertPairwiseDisjoint(pts);
        assertEquals(10, pts.stream().filter(SingularPoint::real).count());
        for (int i = 10; i < 20; i += 2) {
            // conjugate pairs come out with exactly conjugate centers, lower half-plane first
            assertEquals(pts.get(i).location().re(), pts.get(i + 1).location().re());
            assertEquals(pts.get(i).location().im().negate(), pts.get(i + 1).location().im());
            assertTrue(pts.get(i).location().im().signum() < 0);
        }
    }

    @Test
    void isolationRejectsInputsThatBreakItsPreconditions() {
        // a double root can never get an isolating Weierstrass disk: refused up front
        assertThrows(IllegalArgumentException.class, () -> RootIsolation.isolate(List.of(poly(-2, 0, 1).pow(2))));
        assertThrows(IllegalArgumentException.class, () -> RootIsolation.isolate(List.of(poly(-2, 0, 1), poly(-2, 0, 1).multiply(poly(1, 1)))));
    }

    @Test
    void clusterBelowTheStartingPrecisionIsResolved() {
        // (x^2 - 2)^2 - 10^-250: pairs sqrt(2 ± 10^-125), about 3.5e-126 apart: needs about 1024 bits
        Poly q = poly(-2, 0, 1).pow(2).subtract(Poly.constant(Rational.of(java.math.BigInteger.ONE, java.math.BigInteger.TEN.pow(250))));
        List<SingularPoint> pts = SingularPoints.of(eq(q, Poly.ZERO, poly(1)));
        assertEquals(4, pts.size());
        assertPairwiseDisjoint(pts);
        // reference: sqrt(2 ± 10^-125) by apfloat 1.15.0 ApfloatMath.sqrt at 800 digits (the sum carries
        // only the digits of its terms, hence the explicit precision)
        Apfloat tiny = new Apfloat("1e-125", 800);
        Apfloat two = new Apfloat(2, 800);
        assertTrue(pts.get(2).location().contains(dec(ApfloatMath.sqrt(two.subtract(tiny).precision(800))), BigDecimal.ZERO));
        assertTrue(pts.get(3).location().contains(dec(ApfloatMath.sqrt(two.add(tiny).precision(800))), BigDecimal.ZERO));
        assertTrue(pts.get(0).location().contains(dec(ApfloatMath.sqrt(two.add(tiny).precision(800)).negate()), BigDecimal.ZERO));
        assertTrue(pts.stream().allMatch(SingularPoint::real));
    }

    @Test
    @Tag("slow")
    void rootsCloserThanThePrecisionCapAreReportedNotGuessed() {
        // (x^2 - 2)^2 - 10^-1400: two roots about 10^-700 apart near each of ±sqrt 2, finer than 2048 bits (617 digits)
        Poly q = poly(-2, 0, 1).pow(2).subtract(Poly.constant(Rational.of(java.math.BigInteger.ONE, java.math.BigInteger.TEN.pow(1400))));
        assertThrows(ArithmeticException.class, () -> SingularPoints.of(eq(q, Poly.ZERO, poly(1))));
    }
}
