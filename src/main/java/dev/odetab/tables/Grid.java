package dev.odetab.tables;

import dev.odetab.numeric.Rational;
import java.util.ArrayList;
import java.util.List;

/** The points of a table, exact rationals; a grid never goes through a binary double. */
public sealed interface Grid {
    /** The points in table order. */
    List<Rational> points();

    /** One line for provenance. */
    String describe();

    /** from, from + step, …, to; step divides to − from exactly (checked by the spec reader). */
    record Uniform(Rational from, Rational to, Rational step) implements Grid {
        @Override
        public List<Rational> points() {
            int n = count();
            List<Rational> r = new ArrayList<>(n);
            for (int i = 0; i < n; i++) {
                r.add(from.add(step.multiply(Rational.of(i))));
            }
            return r;
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

    /** Explicit points, in the order given. */
    record Points(List<Rational> points) implements Grid {
        public Points {
            points = List.copyOf(points);
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
