package dev.odetab.tables.quadrature;

import dev.odetab.tables.Column;
import dev.odetab.tables.Grid;
import dev.odetab.tables.OutOfRangeException;
import dev.odetab.tables.TableDef;
import dev.odetab.tables.TableEvaluator;
import dev.odetab.tables.TableKind;
import dev.odetab.tables.TableResult;
import dev.odetab.series.PrecisionCapException;
import dev.odetab.series.PrecisionLoop;
import dev.odetab.numeric.Ball;
import dev.odetab.numeric.BallFunctions;
import dev.odetab.numeric.Entry;
import dev.odetab.numeric.Format;
import dev.odetab.numeric.Precision;
import dev.odetab.numeric.Rational;
import dev.odetab.numeric.Rounding;
import dev.odetab.ode.Equation;
import dev.odetab.ode.family.OrthogonalFamily;
import dev.odetab.series.Jet;
import dev.odetab.series.LocalSeries;
import dev.odetab.series.Recurrence;
import dev.odetab.series.StepChooser;
import java.math.BigDecimal;
import java.math.BigInteger;
import java.math.MathContext;
import java.math.RoundingMode;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Optional;
import java.util.OptionalInt;

/**
 * Gauss quadrature rules as tables: the n nodes ascending and their weights, each entry correctly
 * rounded from a proven enclosure (docs/methods.md §6).
 *
 * <p>Trust level: Rigorous. Nodes. The zeros of p_n are simple and lie in the open interval of
 * orthogonality (DLMF 18.2(vi)). Eigenvalues of the Jacobi matrix in doubles (Golub and Welsch
 * 1969, by Sturm-sequence bisection) only seed the proof. Near each seed s a short dyadic center
 * c is taken; p_n(c) and p_n'(c) are computed exactly ({@link GaussPolynomial.Evaluator}),
 * and the family's differential equation (DLMF 18.8) carries them to c + t by the Taylor series
 * of {@link LocalSeries}, whose tail bound is rigorous for points and for balls. Newton's method
 * on the midpoints brings t close to the zero; then one interval Newton step (Moore 1966):
 * with X = [t − ρ, t + ρ], if p_n' over X excludes 0 and N = t − p_n(t)/p_n'(X) lies inside X,
 * X holds exactly one zero and it lies in N. Evaluating over a short step from an exact center
 * keeps the enclosures tight (a three-term recurrence run in ball arithmetic would widen its
 * radii like the majorant recurrence, losing about n bits). Count: the n enclosures are checked
 * pairwise disjoint, so they hold n distinct zeros of a polynomial of degree n, that is all of
 * them. Symmetric families compute the positive nodes and mirror them (p_n(−x) = (−1)^n p_n(x),
 * DLMF 18.6.1); for odd n the middle node is exactly 0. A node that is a rational zero at a
 * rounding boundary is found exactly: when its ball cannot be rounded, the boundaries inside it
 * are tested by exact evaluation. Chebyshev rules use their closed forms (DLMF 3.5(v)), with the
 * nodes that Niven's theorem makes rational kept exact ({@link Grid.Chebyshev}). Symmetric rules
 * with n = 2 or 3 have x² = r rational, read off the recurrence, so their weights are exact
 * rationals times the family constant.
 *
 * <p>Weights: w = K / g(x, p_n'(x)) ({@link GaussPolynomial}), with p_n' enclosed over X. Precision:
 * Ziv's loop per node, from the format's bits plus guard bits, doubling up to the table's cap
 * ({@link PrecisionCapException} beyond it).
 *
 * <p>Underflow (IEEE 754-2019 §7.5: tiny results): a weight whose correctly rounded binary entry
 * is below the smallest normal number 2^emin (subnormal or zero) is an error, or, with
 * {@code weight_underflow = "flush"}, written as +0 and flagged 1 in the {@code weight_flag} column.
 */
public final class GaussRule {
    /** A center lies on a dyadic grid of spacing about 2^-CENTER_BITS times the distance to the nearest other zero or end. */
    private static final int CENTER_BITS = 10;
    private static final MathContext STEP_CONTEXT = new MathContext(24, RoundingMode.HALF_EVEN);

    private GaussRule() {
    }

    /** Enclosures of one node and its weight; the exact fields, when not null, replace the balls. */
    private record Enclosure(Rational exactNode, Ball node, Rational exactWeight, Ball weight) {
        Ball nodeBall(int precBits) {
            return exactNode != null ? Ball.of(exactNode, precBits) : node;
        }

        Ball weightBall(int precBits) {
            return exactWeight != null ? Ball.of(exactWeight, precBits) : weight;
        }
    }

    /** One node (and its mirror) of the rule: enclosures at a working precision. */
    private interface NodeSource {
        Enclosure enclose(int precBits) throws NeedsPrecision;
    }

    /** The enclosures at this precision do not suffice (a heuristic step failed; the precision loop goes on). */
    private static final class NeedsPrecision extends Exception {
        private static final long serialVersionUID = 1L;

        NeedsPrecision() {
            super(null, null, false, false);
        }
    }

    /** A decided row, the enclosure it was decided from, and whether its weight underflows the format. */
    private record Decided(List<Entry> entries, Enclosure enclosure, BigDecimal relative, int precBits, boolean underflow) {
    }

    /**
     * Rigorous: the rule of {@code q} as the rows of table {@code t} (class comment).
     *
     * @throws PrecisionCapException when the precision cap cannot decide a row or separate the nodes
     * @throws OutOfRangeException when a weight underflows (policy "error") or a fixed-point entry is out of range
     */
    public static TableResult table(TableDef t, TableKind.Quadrature q)
            throws PrecisionCapException, OutOfRangeException {
        GaussPolynomial f = q.rule();
        int n = f.n();
        List<NodeSource> sources = new ArrayList<>();
        OptionalInt chebyshevKind = f.family().chebyshevNodes();
        boolean mirror = f.symmetric() && chebyshevKind.isEmpty();
        if (chebyshevKind.isPresent()) {
            for (int i = 0; i < n; i++) {
                sources.add(chebyshevNode(f, chebyshevKind.getAsInt(), i));
            }
        } else if (mirror && n <= 3) {
            if (n > 1) {
                sources.add(squareRootNode(f));
            }
        } else {
            int first = mirror ? (n + 1) / 2 : 0;
            double[] seeds = eigenvaluesEstimate(f, first, n);
            Equation eq = t.function().equation();
            GaussPolynomial.Evaluator exact = f.new Evaluator();
            for (int i = 0; i < seeds.length; i++) {
                sources.add(new NewtonNode(f, exact, eq, seeds[i], gapEstimate(f, seeds, i, mirror), t));
            }
        }
        Optional<NodeSource> middle = mirror && n % 2 == 1
                ? Optional.of(exactNode(f, Rational.ZERO, f.new Evaluator().at(Rational.ZERO).slopeExact())) : Optional.empty();
        List<Decided> positive = new ArrayList<>();
        List<Decided> negative = new ArrayList<>();
        for (NodeSource s : sources) {
            Decided[] d = decide(t, q, s, mirror);
            positive.add(d[0]);
            if (mirror) {
                negative.add(0, d[1]);
            }
        }
        List<Decided> rows = new ArrayList<>(negative);
        if (middle.isPresent()) {
            rows.add(decide(t, q, middle.get(), false)[0]);
        }
        rows.addAll(positive);
        checkDisjoint(t, rows);
        if (!q.flushUnderflow()) {
            checkNoUnderflow(t, q, rows);
        }
        List<TableResult.Row> out = new ArrayList<>();
        BigDecimal maxRel = BigDecimal.ZERO;
        int maxPrec = 0;
        for (Decided d : rows) {
            out.add(new TableResult.Row(d.enclosure().exactNode(), d.entries()));
            maxRel = maxRel.max(d.relative());
            maxPrec = Math.max(maxPrec, d.precBits());
        }
        return new TableResult(t, out, maxRel, maxPrec);
    }

    /** Ziv's loop for one source: its row, and with {@code mirror} the row of the negated node. */
    private static Decided[] decide(TableDef t, TableKind.Quadrature q, NodeSource s, boolean mirror)
            throws PrecisionCapException, OutOfRangeException {
        int prec = PrecisionLoop.chooseStartBits(t.format());
        while (true) {
            try {
                Enclosure e = s.enclose(prec);
                Decided plus = row(t, q, e, prec);
                Decided minus = mirror && plus != null ? row(t, q, negate(e), prec) : null;
                if (plus != null && (!mirror || minus != null)) {
                    return new Decided[] {plus, minus};
                }
            } catch (NeedsPrecision ignored) {
                // the loop below raises the precision
            }
            prec = PrecisionLoop.raise(prec, t.capBits(), () -> "table " + t.name() + ": the precision cap of " + t.capBits()
                    + " bits cannot decide a node of the " + q.rule().describe() + " near x = "
                    + approximateNode(s) + " (raise precision_cap_bits, or an entry may be an exact rounding boundary)");
        }
    }

    private static String approximateNode(NodeSource s) {
        try {
            Enclosure e = s.enclose(64);
            return e.nodeBall(64).mid().round(new MathContext(12)).toString();
        } catch (NeedsPrecision e) {
            return "?";
        }
    }

    private static Enclosure negate(Enclosure e) {
        return new Enclosure(e.exactNode() == null ? null : e.exactNode().negate(), e.node() == null ? null : e.node().negate(),
                e.exactWeight(), e.weight());
    }

    /** The entries of one row, or null when some enclosure is too wide to decide its entry. */
    private static Decided row(TableDef t, TableKind.Quadrature q, Enclosure e, int prec)
            throws OutOfRangeException {
        Format format = t.format();
        int wp = prec + 20;
        Ball node = e.nodeBall(wp);
        Ball weight = e.weightBall(wp);
        Optional<Entry> nodeEntry = e.exactNode() != null ? Optional.of(round(t, e.exactNode())) : decide(t, node);
        Optional<Entry> weightEntry = e.exactWeight() != null ? Optional.of(round(t, e.exactWeight())) : decide(t, weight);
        if (nodeEntry.isEmpty() || weightEntry.isEmpty()) {
            return null;
        }
        Entry w = weightEntry.get();
        boolean underflow = underflows(w, format) && t.columns().stream().anyMatch(c -> c.name().equals("weight"));
        boolean flushed = underflow && q.flushUnderflow();
        if (flushed) {
            w = round(t, Rational.ZERO);
        }
        BigDecimal relative = relativeRadius(node).max(relativeRadius(weight));
        List<Entry> entries = new ArrayList<>();
        for (Column c : t.columns()) {
            Entry entry;
            switch (c.name()) {
                case "node" -> entry = nodeEntry.get();
                case "weight" -> entry = w;
                case "weight_flag" -> entry = round(t, flushed ? Rational.ONE : Rational.ZERO);
                default -> {
                    Ball scaled = weight.multiply(q.rule().scale(node, wp), wp);
                    Optional<Entry> se = decide(t, scaled);
                    if (se.isEmpty()) {
                        return null;
                    }
                    entry = se.get();
                    relative = relative.max(relativeRadius(scaled));
                }
            }
            if (entry.kind() == Entry.Kind.OUT_OF_RANGE) {
                throw new OutOfRangeException("table " + t.name() + ": the " + c.name() + " at the node x = "
                        + approximate(node) + " lies outside the range of " + format.name()
                        + " (out_of_range = \"error\"; choose a wider format or out_of_range = \"saturate\")");
            }
            entries.add(entry);
        }
        return new Decided(entries, e, relative, prec, underflow);
    }

    /** With weight_underflow = "error": every underflowing weight, counted and located, stops the table. */
    private static void checkNoUnderflow(TableDef t, TableKind.Quadrature q, List<Decided> rows) throws OutOfRangeException {
        List<Decided> tiny = rows.stream().filter(Decided::underflow).toList();
        if (tiny.isEmpty()) {
            return;
        }
        String first = approximate(tiny.get(0).enclosure().nodeBall(tiny.get(0).precBits() + 20));
        String last = approximate(tiny.get(tiny.size() - 1).enclosure().nodeBall(tiny.get(tiny.size() - 1).precBits() + 20));
        throw new OutOfRangeException("table " + t.name() + ": " + (tiny.size() == 1 ? "the weight at the node x = " + first
                + " underflows " : tiny.size() + " weights, at nodes from x = " + first + " to x = " + last + ", underflow ")
                + t.format().name() + (tiny.size() == 1 ? " (its correctly rounded value lies" : " (their correctly rounded values lie")
                + " below the smallest normal number); set weight_underflow = \"flush\" (" + (tiny.size() == 1 ? "it becomes" : "they become")
                + " 0, flagged 1 in the column weight_flag)" + q.rule().scaledWeightFormula().map(formula -> " or use the column scaled_weight ("
                + formula + ", which does not underflow) instead of weight").orElse(" or choose a wider format"));
    }

    private static Entry round(TableDef t, Rational exact) {
        return Rounding.round(exact, t.target());
    }

    private static Optional<Entry> decide(TableDef t, Ball b) {
        return Rounding.decide(b, t.target());
    }

    /** Exact: the entry is subnormal or zero in a binary format (binary64 thresholds for double-double). */
    static boolean underflows(Entry e, Format f) {
        if (f.normalEmin().isEmpty()) {
            return false;
        }
        int emin = f.normalEmin().getAsInt();
        return e.kind() == Entry.Kind.ZERO || e.kind() == Entry.Kind.FINITE && e.value().abs().compareTo(Rational.TWO.pow(emin)) < 0;
    }

    private static String approximate(Ball b) {
        return b.mid().round(new MathContext(12)).stripTrailingZeros().toPlainString();
    }

    /** Heuristic measure for provenance: radius / (|mid| − radius), as {@link TableResult} reports it. */
    private static BigDecimal relativeRadius(Ball b) {
        if (b.isExact()) {
            return BigDecimal.ZERO;
        }
        BigDecimal low = b.absLower();
        return low.signum() == 0 ? b.rad() : b.rad().divide(low, new MathContext(3, RoundingMode.UP));
    }

    /** Rigorous part of the count: consecutive node enclosures, ascending, must be disjoint. */
    private static void checkDisjoint(TableDef t, List<Decided> rows) throws PrecisionCapException {
        for (int i = 1; i < rows.size(); i++) {
            Ball left = rows.get(i - 1).enclosure().nodeBall(rows.get(i - 1).precBits() + 20);
            Ball right = rows.get(i).enclosure().nodeBall(rows.get(i).precBits() + 20);
            if (left.upper().compareTo(right.lower()) >= 0) {
                throw new PrecisionCapException("table " + t.name() + ": the nodes near x = " + approximate(left)
                        + " and x = " + approximate(right) + " could not be separated (two seeds led to one zero)", t.capBits());
            }
        }
    }

    /**
     * The exact node x with p_n'(x) = d: its weight exactly when K is rational, otherwise K
     * enclosed at the precision asked for and divided by the exact g.
     */
    private static NodeSource exactNode(GaussPolynomial f, Rational x, Rational d) {
        OrthogonalFamily.WeightConstant k = f.weightConstant();
        Rational g = f.weightDenominatorExact(x, d);
        Rational exactWeight = k.isRational() ? k.rational().divide(g) : null;
        return prec -> new Enclosure(x, null, exactWeight, exactWeight != null ? null : k.enclose(prec + 20).divide(g, prec + 20));
    }

    // ------------------------------------------------------------------ closed forms

    /**
     * Chebyshev node i (ascending) of a rule whose nodes are the Chebyshev points of the given kind
     * ({@link OrthogonalFamily#chebyshevNodes}): T_n: x = cos((2k−1)π/(2n)), w = π/n; U_n: x = cos(kπ/(n+1)),
     * w = π/(n+1) · (1 − x²) = π/(n+1) sin²(kπ/(n+1)) (DLMF 3.5(v); A&amp;S 25.4.38, 25.4.40). The
     * nodes are the points of {@link Grid.Chebyshev} on [−1, 1] (first kind, or the interior
     * points of the second kind with n + 2 points).
     */
    private static NodeSource chebyshevNode(GaussPolynomial f, int chebyshevKind, int i) {
        boolean first = chebyshevKind == 1;
        Grid.Chebyshev grid = first ? new Grid.Chebyshev(1, f.n(), Rational.of(-1), Rational.ONE)
                : new Grid.Chebyshev(2, f.n() + 2, Rational.of(-1), Rational.ONE);
        int index = first ? i : i + 1;
        Rational exact = grid.exactPoint(index);
        return prec -> {
            int wp = prec + 20;
            Ball pi = BallFunctions.pi(wp);
            if (first) {
                return new Enclosure(exact, exact == null ? grid.node(index, wp) : null, null, pi.divide(Rational.of(f.n()), wp));
            }
            Ball x = exact == null ? grid.node(index, wp) : Ball.of(exact, wp);
            Ball oneMinusX2 = exact == null ? Ball.ONE.subtract(x, wp).multiply(Ball.ONE.add(x, wp), wp)
                    : Ball.of(Rational.ONE.subtract(exact.multiply(exact)), wp);
            return new Enclosure(exact, exact == null ? x : null, null, pi.multiply(oneMinusX2, wp).divide(Rational.of(f.n() + 1L), wp));
        };
    }

    /**
     * The positive node of a symmetric rule with n = 2 or 3, where p_2 = a x² − C_1 with
     * a = A_1 A_0, and p_3 = x (a x² − b) with a = A_2 A_1 A_0, b = A_2 C_1 + C_2 A_0 (the
     * recurrence with B_k = 0): x² = r = C_1/a, resp. b/a, and p_n'(x)² = 4a² r, resp.
     * (3a r − b)² = 4b². Exact: r and p_n'(x)², so g and, for a rational K, the weight.
     */
    private static NodeSource squareRootNode(GaussPolynomial f) {
        Rational[] t0 = f.threeTerm(0);
        Rational[] t1 = f.threeTerm(1);
        Rational r;
        Rational d2;
        if (f.n() == 2) {
            Rational a = t1[0].multiply(t0[0]);
            r = t1[2].divide(a);
            d2 = a.multiply(a).multiply(r).multiply(4);
        } else {
            Rational[] t2 = f.threeTerm(2);
            Rational a = t2[0].multiply(t1[0]).multiply(t0[0]);
            Rational b = t2[0].multiply(t1[2]).add(t2[2].multiply(t0[0]));
            r = b.divide(a);
            d2 = b.multiply(b).multiply(4);
        }
        Rational root = rationalSquareRoot(r);
        Rational g = f.weightDenominatorFromSquares(r, d2);
        OrthogonalFamily.WeightConstant k = f.weightConstant();
        Rational exactWeight = k.isRational() ? k.rational().divide(g) : null;
        return prec -> {
            int wp = prec + 20;
            Ball x = root != null ? null : BallFunctions.sqrt(Ball.of(r, wp + 10), wp);
            return new Enclosure(root, x, exactWeight, exactWeight != null ? null : k.enclose(wp).divide(g, wp));
        };
    }

    /** √r when r is the square of a rational, else null. */
    private static Rational rationalSquareRoot(Rational r) {
        BigInteger p = r.numerator().sqrt();
        BigInteger q = r.denominator().sqrt();
        return p.multiply(p).equals(r.numerator()) && q.multiply(q).equals(r.denominator()) ? Rational.of(p, q) : null;
    }

    // ------------------------------------------------------------------ seeds

    /**
     * Heuristic: the eigenvalues with indices from … to − 1 (ascending) of the Jacobi matrix of
     * {@link GaussPolynomial#monicRecurrenceEstimate}, by bisection on the Sturm count: the number of
     * negative pivots of J − xI = LDLᵀ, d_0 = α_0 − x, d_k = α_k − x − β_k/d_(k−1), is the number
     * of eigenvalues below x. Gerschgorin's disks bound the search. Seeds only.
     */
    static double[] eigenvaluesEstimate(GaussPolynomial f, int from, int to) {
        double[][] ab = f.monicRecurrenceEstimate();
        double[] alpha = ab[0];
        double[] beta = ab[1];
        int n = alpha.length;
        double lo = Double.POSITIVE_INFINITY;
        double hi = Double.NEGATIVE_INFINITY;
        for (int k = 0; k < n; k++) {
            double r = (k > 0 ? Math.sqrt(beta[k]) : 0) + (k + 1 < n ? Math.sqrt(beta[k + 1]) : 0);
            lo = Math.min(lo, alpha[k] - r);
            hi = Math.max(hi, alpha[k] + r);
        }
        double[] r = new double[to - from];
        double left = lo;
        for (int idx = from; idx < to; idx++) {
            double a = left;
            double b = hi;
            while (true) {
                double m = 0.5 * (a + b);
                if (m <= a || m >= b) {
                    break;
                }
                if (countBelowEstimate(alpha, beta, m) > idx) {
                    b = m;
                } else {
                    a = m;
                }
            }
            r[idx - from] = 0.5 * (a + b);
            left = a;
        }
        return r;
    }

    /**
     * Heuristic: the distance from seed i to the nearest other zero (the mirror images and 0
     * included for symmetric rules) or end of the interval of orthogonality.
     */
    private static double gapEstimate(GaussPolynomial f, double[] seeds, int i, boolean mirror) {
        double s = seeds[i];
        double gap = Double.POSITIVE_INFINITY;
        if (i > 0) {
            gap = s - seeds[i - 1];
        } else if (mirror) {
            gap = f.n() % 2 == 1 ? s : 2 * s;
        }
        if (i + 1 < seeds.length) {
            gap = Math.min(gap, seeds[i + 1] - s);
        }
        return switch (f.family().interval()) {
            case FINITE -> Math.min(gap, 1 - Math.abs(s));
            case HALF_LINE -> Math.min(gap, s);
            case REAL_LINE -> gap;
        };
    }

    private static int countBelowEstimate(double[] alpha, double[] beta, double x) {
        double d = alpha[0] - x;
        int count = d < 0 ? 1 : 0;
        for (int k = 1; k < alpha.length; k++) {
            if (d == 0) {
                d = Double.MIN_NORMAL;
            }
            d = alpha[k] - x - beta[k] / d;
            if (d < 0) {
                count++;
            }
        }
        return count;
    }

    // ------------------------------------------------------------------ proof by interval Newton

    /** One zero of p_n near a seed, proven by interval Newton from an exact center (class comment). */
    private static final class NewtonNode implements NodeSource {
        private final GaussPolynomial f;
        private final GaussPolynomial.Evaluator exact;
        private final TableDef table;
        private final Rational center;
        private final GaussPolynomial.ExactJet atCenter;
        private final Recurrence recurrence;
        private final BigDecimal scale;
        /** The latest Newton point t (node ≈ center + t), kept across precisions. */
        private BigDecimal t = BigDecimal.ZERO;

        NewtonNode(GaussPolynomial f, GaussPolynomial.Evaluator exact, Equation eq, double seed, double gap, TableDef table) {
            this.f = f;
            this.exact = exact;
            this.table = table;
            this.center = shortDyadic(seed, gap);
            this.atCenter = exact.at(center);
            this.recurrence = atCenter.isZero() ? null : new Recurrence(eq, center);
            BigDecimal c = center.toBigDecimalExact().abs();
            this.scale = c.signum() == 0 ? BigDecimal.ONE.scaleByPowerOfTen(-18) : c;
        }

        /**
         * The seed rounded to a multiple of 2^(e − CENTER_BITS), 2^e &lt;= gap: a short exact dyadic,
         * since the integers of the exact evaluation grow by its bits at every step, and close
         * enough that the Taylor series from it converges fast over the distance to the zero.
         */
        private static Rational shortDyadic(double seed, double gap) {
            int e = Math.getExponent(Math.min(gap, Math.max(Math.abs(seed), 1e-300)));
            double unit = Math.scalb(1.0, e - CENTER_BITS);
            return Rational.of(new BigDecimal(Math.rint(seed / unit) * unit));
        }

        @Override
        public Enclosure enclose(int precBits) throws NeedsPrecision {
            if (recurrence == null) {
                return exactNode(f, center, atCenter.slopeExact()).enclose(precBits);
            }
            int wp = precBits + 20;
            int maxTerms = StepChooser.chooseMaxTerms(wp);
            Ball y0 = atCenter.valueBall(wp);
            Ball y1 = atCenter.slopeBall(wp);
            int digits = Precision.digits10(wp);
            BigDecimal tol = scale.scaleByPowerOfTen(-digits);
            int quantum = digits + 3 - (scale.precision() - scale.scale());
            try {
                Jet j = null;
                for (int it = 0; ; it++) {
                    j = LocalSeries.sum(recurrence, y0, y1, Rational.of(t), maxTerms, wp).jet();
                    if (j.derivative().containsZero() || it > 64) {
                        throw new NeedsPrecision();
                    }
                    BigDecimal step = j.value().mid().divide(j.derivative().mid(), STEP_CONTEXT);
                    if (step.abs().compareTo(tol) <= 0) {
                        break;
                    }
                    t = t.subtract(step).setScale(quantum, RoundingMode.HALF_EVEN);
                }
                Ball v = j.value();
                Ball d = j.derivative();
                BigDecimal rho = v.mid().abs().add(v.rad()).multiply(BigDecimal.valueOf(4))
                        .divide(d.absLower(), new MathContext(4, RoundingMode.UP)).add(tol);
                for (int attempt = 0; attempt < 5; attempt++) {
                    Ball x = Ball.of(t, rho);
                    Ball dx = LocalSeries.sum(recurrence, y0, y1, x, maxTerms, wp).jet().derivative();
                    if (dx.containsZero()) {
                        throw new NeedsPrecision();
                    }
                    Ball newton = Ball.exact(t).subtract(v.divide(dx, wp), wp);
                    if (newton.lower().compareTo(x.lower()) > 0 && newton.upper().compareTo(x.upper()) < 0) {
                        Ball node = Ball.of(center, wp).add(newton, wp);
                        Optional<NodeSource> exact = exactAtBoundary(node);
                        if (exact.isPresent()) {
                            return exact.get().enclose(precBits);
                        }
                        Ball w = f.weightConstant().enclose(wp).divide(f.weightDenominator(node, dx, wp), wp);
                        return new Enclosure(null, node, null, w);
                    }
                    rho = rho.multiply(BigDecimal.valueOf(16));
                }
                throw new NeedsPrecision();
            } catch (LocalSeries.StepTooLongException e) {
                throw new NeedsPrecision();
            }
        }

        /**
         * Exact: when the node's ball cannot be rounded, the rounding boundaries inside it (the
         * entries of its two ends and their midpoint) and 0 are tested by exact evaluation; a
         * boundary that is a zero of p_n is the node exactly.
         */
        private Optional<NodeSource> exactAtBoundary(Ball node) {
            if (decide(table, node).isPresent() && decide(table, node.negate()).isPresent()) {
                return Optional.empty();
            }
            Entry low = round(table, Rational.of(node.lower()));
            Entry high = round(table, Rational.of(node.upper()));
            List<Rational> candidates = new ArrayList<>(List.of(Rational.ZERO));
            if (low.value() != null && high.value() != null) {
                candidates.addAll(Arrays.asList(low.value(), high.value(), low.value().add(high.value()).divide(Rational.TWO)));
            }
            for (Rational q : candidates) {
                if (node.contains(q)) {
                    GaussPolynomial.ExactJet jet = exact.at(q);
                    if (jet.isZero()) {
                        return Optional.of(exactNode(f, q, jet.slopeExact()));
                    }
                }
            }
            return Optional.empty();
        }
    }
}
