package dev.odetab.tables;

import dev.odetab.numeric.Ball;
import dev.odetab.numeric.BallFunctions;
import dev.odetab.numeric.Rational;
import java.math.BigDecimal;
import java.math.BigInteger;
import java.math.MathContext;
import java.util.AbstractList;
import java.util.ArrayList;
import java.util.List;
import java.util.Objects;

/**
 * The given points of a values or taylor table (from/to/step, Chebyshev nodes, a list); a grid
 * never goes through a binary double. Kinds whose points are found (zeros, Gauss nodes) have none:
 * see {@link TableKind}.
 *
 * <p>Derivation: docs/methods.md §16 (grids of irrational points).
 */
public sealed interface Grid {
    /**
     * The points in table order, as exact rationals; for a grid with irrational points
     * (Chebyshev nodes) a rational near each node, used as the center of the last series step.
     */
    List<Rational> points();

    /** Number of points. */
    default int size() {
        return points().size();
    }

    /** The exact point i, or null when it is irrational. */
    default Rational exactPoint(int i) {
        return points().get(i);
    }

    /**
     * The rational used for point i: the point itself when it is exact, otherwise a rational near
     * the irrational node (the center of the last series step); the i-th element of {@link #points()}.
     */
    default Rational center(int i) {
        Rational exact = exactPoint(i);
        return exact != null ? exact : points().get(i);
    }

    /** A ball containing point i (exact points give exact balls). */
    default Ball node(int i, int precBits) {
        return Ball.of(exactPoint(i), precBits);
    }

    /** True when some point is irrational: the table then holds the correctly rounded node. */
    default boolean hasIrrationalPoints() {
        return false;
    }

    /** One line for provenance. */
    String describe();

    /** from, from + step, …, to; step divides to − from exactly (checked by the spec reader). */
    record Uniform(Rational from, Rational to, Rational step) implements Grid {
        /** The points as a list that computes each one when read (a long grid is never held in memory). */
        @Override
        public List<Rational> points() {
            int n = count();
            return new AbstractList<>() {
                @Override
                public Rational get(int i) {
                    Objects.checkIndex(i, n);
                    return exactPoint(i);
                }

                @Override
                public int size() {
                    return n;
                }
            };
        }

        @Override
        public Rational exactPoint(int i) {
            // from = a/b, step = c/d: x_i = (a d + i c b) / (b d), in longs when nothing can overflow.
            BigInteger a = from.numerator();
            BigInteger b = from.denominator();
            BigInteger c = step.numerator();
            BigInteger d = step.denominator();
            if (a.bitLength() < 63 && b.bitLength() < 63 && c.bitLength() < 63 && d.bitLength() < 63) {
                try {
                    long bd = Math.multiplyExact(b.longValue(), d.longValue());
                    long num = Math.addExact(Math.multiplyExact(a.longValue(), d.longValue()),
                            Math.multiplyExact(Math.multiplyExact((long) i, c.longValue()), b.longValue()));
                    return Rational.of(num, bd);
                } catch (ArithmeticException overflow) {
                    // exact BigInteger arithmetic below
                }
            }
            return from.add(step.multiply(Rational.of(i)));
        }

        @Override
        public int size() {
            return count();
        }

        /** Number of points: (to − from)/step + 1. */
        public int count() {
            return to.subtract(from).divide(step).numerator().intValueExact() + 1;
        }

        @Override
        public String describe() {
            return "from " + from.toDecimalOrFraction() + " to " + to.toDecimalOrFraction() + " step "
                    + step.toDecimalOrFraction() + " (" + count() + " points)";
        }
    }

    /**
     * Chebyshev nodes on [from, to], ascending: first kind x = m + h·cos((2k−1)π/(2n)),
     * k = n … 1; second kind (extrema, endpoints included) x = m + h·cos(kπ/(n−1)),
     * k = n−1 … 0; m = (from + to)/2, h = (to − from)/2. The cosine is rational exactly when
     * the angle is a multiple of π/3 or π/2 (Niven's theorem: cos qπ rational for rational q
     * only at 0, ±1/2, ±1); such nodes are exact, all others irrational and enclosed in balls.
     */
    record Chebyshev(int kind, int n, Rational from, Rational to) implements Grid {
        /** The angle of point i as a rational multiple q of π (i counts from the left end). */
        Rational angle(int i) {
            int k = n - i;
            return kind == 1 ? Rational.of(2L * k - 1, 2L * n) : Rational.of(k - 1, n - 1);
        }

        private static Rational rationalCos(Rational q) {
            // q modulo 2, in [0, 2), onto the cases of Niven's theorem
            Rational m2 = q.subtract(Rational.of(q.divide(Rational.TWO).floor()).multiply(Rational.TWO));
            if (m2.equals(Rational.ZERO)) {
                return Rational.ONE;
            }
            if (m2.equals(Rational.ONE)) {
                return Rational.ONE.negate();
            }
            if (m2.equals(Rational.of(1, 2)) || m2.equals(Rational.of(3, 2))) {
                return Rational.ZERO;
            }
            if (m2.equals(Rational.of(1, 3)) || m2.equals(Rational.of(5, 3))) {
                return Rational.of(1, 2);
            }
            if (m2.equals(Rational.of(2, 3)) || m2.equals(Rational.of(4, 3))) {
                return Rational.of(-1, 2);
            }
            return null;
        }

        private Rational mid() {
            return from.add(to).divide(Rational.TWO);
        }

        private Rational half() {
            return to.subtract(from).divide(Rational.TWO);
        }

        @Override
        public int size() {
            return n;
        }

        @Override
        public Rational exactPoint(int i) {
            Rational c = rationalCos(angle(i));
            return c == null ? null : mid().add(half().multiply(c));
        }

        /** Rigorous: a ball containing node i (exact for Niven nodes; otherwise π and cos as proven balls). */
        @Override
        public Ball node(int i, int precBits) {
            Rational exact = exactPoint(i);
            if (exact != null) {
                return Ball.of(exact, precBits);
            }
            Ball theta = BallFunctions.pi(precBits + 10).multiply(angle(i), precBits + 10);
            Ball c = BallFunctions.cos(theta, precBits + 10);
            return c.multiply(half(), precBits + 10).add(Ball.of(mid(), precBits + 10), precBits);
        }

        @Override
        public List<Rational> points() {
            List<Rational> r = new ArrayList<>(n);
            for (int i = 0; i < n; i++) {
                r.add(center(i));
            }
            return r;
        }

        @Override
        public Rational center(int i) {
            Rational exact = exactPoint(i);
            return exact != null ? exact : Rational.of(node(i, 128).mid().round(new MathContext(30)));
        }

        @Override
        public boolean hasIrrationalPoints() {
            for (int i = 0; i < n; i++) {
                if (exactPoint(i) == null) {
                    return true;
                }
            }
            return false;
        }

        @Override
        public String describe() {
            return "Chebyshev nodes of the " + (kind == 1 ? "first" : "second") + " kind, n = " + n + ", on ["
                    + from.toDecimalOrFraction() + ", " + to.toDecimalOrFraction()
                    + "] (irrational nodes: x holds each node correctly rounded)";
        }
    }

    /** Explicit points, in the order given. */
    record Points(List<Rational> points) implements Grid {
        public Points {
            points = List.copyOf(points);
        }

        @Override
        public Rational exactPoint(int i) {
            return points.get(i);
        }

        @Override
        public String describe() {
            StringBuilder sb = new StringBuilder("points");
            for (Rational p : points) {
                sb.append(' ').append(p.toDecimalOrFraction());
            }
            return sb.toString();
        }
    }
}
