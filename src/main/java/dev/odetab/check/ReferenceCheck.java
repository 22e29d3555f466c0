package dev.odetab.check;

import dev.odetab.base.ExprException;
import dev.odetab.numeric.Ball;
import dev.odetab.numeric.BallFunctions;
import dev.odetab.numeric.IndependentCheck;
import dev.odetab.numeric.Rational;
import dev.odetab.ode.FunctionDef;
import dev.odetab.ode.family.Catalog;
import dev.odetab.ode.family.Family;
import dev.odetab.ode.family.ParameterException;
import dev.odetab.series.FunctionEvaluator;
import dev.odetab.series.GridWalk;
import dev.odetab.series.Jet;
import dev.odetab.series.PrecisionCapException;
import dev.odetab.series.PrecisionLoop;
import java.io.IOException;
import java.math.BigDecimal;
import java.math.MathContext;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.stream.Stream;

/**
 * {@code odetab check}: every published reference value shipped in {@code reference-data/}
 * recomputed, and a fixed set of identities, each reported pass/fail per source.
 *
 * <p>Trust level: Rigorous. A reference value v written with d significant digits stands for
 * the interval v ± ½ unit of its last digit; it passes when that interval meets the engine's
 * enclosure of the exact value (computed with about d + 10 digits). An identity passes when
 * its two sides, both enclosed in ball arithmetic, overlap. "Worst" reports the largest
 * |midpoint − v| in units of the reference's last digit (≤ 0.5 for a correctly rounded reference).
 *
 * <p>Last, one heuristic cross-check ({@link IndependentCheck}): the elementary functions of
 * {@code BallFunctions} against big-math, an independent implementation. A disagreement fails
 * the check; agreement proves nothing beyond the two implementations agreeing.
 *
 * <p>Derivation: docs/methods.md §15 (reference checks).
 */
public final class ReferenceCheck {
    private ReferenceCheck() {
    }

    /** The outcome for one source. */
    public record Outcome(String name, String source, int count, List<String> failures, double worstUnits) {
        public boolean passed() {
            return failures.isEmpty();
        }
    }

    /** A malformed reference file (a bug in the shipped data, reported with its position). */
    public static final class DataError extends Exception {
        private static final long serialVersionUID = 1L;

        DataError(String message) {
            super(message);
        }
    }

    /** The precision of the big-math cross-check: well beyond binary128 and decimal:34. */
    private static final int INDEPENDENT_BITS = 256;

    /** Every reference file of the folder (sorted by name), then the identities, then the big-math cross-check. */
    public static List<Outcome> run(Path dir) throws IOException, DataError {
        List<Outcome> r = new ArrayList<>();
        List<Path> files;
        try (Stream<Path> s = Files.list(dir)) {
            files = s.filter(p -> p.toString().endsWith(".csv")).sorted().toList();
        }
        for (Path f : files) {
            r.add(file(f));
        }
        Path zeros = dir.resolve("zeros");
        if (Files.isDirectory(zeros)) {
            try (Stream<Path> s = Files.list(zeros)) {
                for (Path f : s.filter(p -> p.toString().endsWith(".csv")).sorted().toList()) {
                    r.add(zerosFile(f));
                }
            }
        }
        r.addAll(identities());
        r.add(independent());
        return r;
    }

    /**
     * Heuristic: π, e, exp, log, √, ∛ and Γ at fixed rational points, our enclosures against
     * big-math's values; "worst" is how far big-math's value lies outside our ball, in units of
     * its last digit (0 when every ball contains it).
     */
    static Outcome independent() {
        List<String> failures = new ArrayList<>();
        double worst = 0;
        List<IndependentCheck.Outcome> all = IndependentCheck.standard(INDEPENDENT_BITS);
        for (IndependentCheck.Outcome o : all) {
            worst = Math.max(worst, o.units());
            if (!o.agrees()) {
                failures.add(o.label() + ": ours " + o.ours() + ", big-math " + o.theirs());
            }
        }
        return new Outcome("cross-check of BallFunctions", "big-math 2.3.2, an independent implementation", all.size(), failures, worst);
    }

    /** One row of a zeros file: the k-th zero of the function (of = value) or of its derivative. */
    private record ZeroRow(String where, String function, boolean ofDerivative, int k, BigDecimal zero) {
    }

    /**
     * Rigorous: a zeros file ({@code function,of,k,zero,other,source}). A zero z written with d
     * digits passes when the function (or its derivative) has strict opposite signs, proven by
     * enclosures, at z − ½ unit and z + ½ unit of its last digit: a zero lies in that interval
     * (intermediate value theorem). Neither the index k nor the {@code other} column is proven
     * here (the slow AiryZerosReferenceDataTest re-derives both); the outcome's worst figure is
     * not defined (NaN).
     */
    private static Outcome zerosFile(Path f) throws IOException, DataError {
        Map<String, List<ZeroRow>> groups = new java.util.LinkedHashMap<>();
        java.util.Set<String> sources = new java.util.LinkedHashSet<>();
        for (DataLine d : dataLines(f, "zeros/" + f.getFileName(), "function,of,k,zero,other,source")) {
            String where = d.where();
            String[] c = d.fields();
            if (!c[1].equals("derivative") && !c[1].equals("value")) {
                throw new DataError(where + ": 'of' must be value or derivative, got '" + c[1] + "'");
            }
            try {
                ZeroRow row = new ZeroRow(where, c[0], c[1].equals("derivative"), Integer.parseInt(c[2]), new BigDecimal(c[3]));
                groups.computeIfAbsent(c[0], k -> new ArrayList<>()).add(row);
            } catch (NumberFormatException e) {
                throw new DataError(where + ": " + e.getMessage());
            }
            sources.add(c[5]);
        }
        Tally tally = new Tally();
        for (List<ZeroRow> group : groups.values()) {
            FunctionDef fn = define(group.get(0).function(), "", group.get(0).where());
            int digits = group.stream().mapToInt(r -> r.zero().precision()).max().orElse(20);
            runGroup(group, digits, ZeroRow::where, (pending, prec) -> judgeZeros(fn, pending, prec, tally));
        }
        tally.worst = Double.NaN;
        return new Outcome("zeros/" + f.getFileName(), String.join("; ", sources), tally.count, tally.failures, tally.worst);
    }

    /** One round: judges the zeros whose two end enclosures exclude 0 (every zero at the cap); returns the others. */
    private static List<ZeroRow> judgeZeros(FunctionDef fn, List<ZeroRow> pending, int prec, Tally tally) throws DataError {
        List<Rational> ends = new ArrayList<>();
        for (ZeroRow row : pending) {
            Rational half = Rational.of(row.zero().ulp()).divide(Rational.TWO);
            ends.add(Rational.of(row.zero()).subtract(half));
            ends.add(Rational.of(row.zero()).add(half));
        }
        List<Jet> jets = enclose(fn, ends, prec, pending.get(0).where());
        List<ZeroRow> still = new ArrayList<>();
        for (int i = 0; i < pending.size(); i++) {
            ZeroRow row = pending.get(i);
            Ball lo = row.ofDerivative() ? jets.get(2 * i).derivative() : jets.get(2 * i).value();
            Ball hi = row.ofDerivative() ? jets.get(2 * i + 1).derivative() : jets.get(2 * i + 1).value();
            boolean decided = !lo.containsZero() && !hi.containsZero();
            if (!decided && prec < CAP_BITS) {
                still.add(row);
                continue;
            }
            tally.count++;
            if (!decided || lo.mid().signum() == hi.mid().signum()) {
                tally.failures.add(row.where() + ": zero " + row.k() + " of " + row.function() + (row.ofDerivative() ? "'" : "")
                        + ": no proven sign change between the ends of " + row.zero() + " ± ½ unit of its last digit");
            }
        }
        return still;
    }

    /** One row of a reference file. */
    private record Row(String where, String function, String params, Rational x, boolean derivative, BigDecimal value, String source) {
    }

    private static final int CAP_BITS = 1 << 15;

    private static Outcome file(Path f) throws IOException, DataError {
        Map<String, List<Row>> groups = new java.util.LinkedHashMap<>();
        java.util.Set<String> sources = new java.util.LinkedHashSet<>();
        for (DataLine d : dataLines(f, f.getFileName().toString(), "function,parameters,x,quantity,value,source")) {
            String where = d.where();
            String[] c = d.fields();
            if (!c[3].equals("derivative") && !c[3].equals("value")) {
                throw new DataError(where + ": quantity must be value or derivative, got '" + c[3] + "'");
            }
            try {
                Row row = new Row(where, c[0], c[1], Rational.parse(c[2]), c[3].equals("derivative"), new BigDecimal(c[4]), c[5]);
                groups.computeIfAbsent(c[0] + "|" + c[1], k -> new ArrayList<>()).add(row);
            } catch (NumberFormatException e) {
                throw new DataError(where + ": " + e.getMessage());
            }
            sources.add(c[5]);
        }
        Tally tally = new Tally();
        for (List<Row> group : groups.values()) {
            FunctionDef fn = define(group.get(0).function(), group.get(0).params(), group.get(0).where());
            int digits = group.stream().mapToInt(r -> r.value().precision()).max().orElse(20);
            runGroup(group, digits, Row::where, (pending, prec) -> judge(fn, pending, prec, tally));
        }
        // one source per file; where rows cite different equations of it, all are named
        return new Outcome(f.getFileName().toString(), String.join("; ", sources), tally.count, tally.failures, tally.worst);
    }

    /** A data line of a reference file: where it is ({@code file:line}) and its six fields. */
    private record DataLine(String where, String[] fields) {
    }

    /** The data lines of a reference file (comments, the header and blank lines skipped), each with six fields. */
    private static List<DataLine> dataLines(Path f, String shown, String header) throws IOException, DataError {
        List<String> lines = Files.readAllLines(f, StandardCharsets.UTF_8);
        List<DataLine> r = new ArrayList<>();
        for (int ln = 0; ln < lines.size(); ln++) {
            String line = lines.get(ln);
            if (line.startsWith("#") || line.startsWith("function,") || line.isBlank()) {
                continue;
            }
            String where = shown + ":" + (ln + 1);
            String[] c = line.split(",", -1);
            if (c.length != 6) {
                throw new DataError(where + ":1: expected 6 fields (" + header + "), found " + c.length);
            }
            r.add(new DataLine(where, c));
        }
        return r;
    }

    /** Runs the precision loop over one function's rows, from about {@code digits} + 10 digits up to the cap. */
    private static <R> void runGroup(List<R> group, int digits, java.util.function.Function<R, String> where,
            PrecisionLoop.Round<R, DataError, RuntimeException> round) throws DataError {
        try {
            PrecisionLoop.runBatch(group, round, (int) Math.ceil((digits + 10) * 3.33),
                    CAP_BITS, still -> "the precision cap of " + CAP_BITS + " bits cannot judge " + where.apply(still.get(0)));
        } catch (PrecisionCapException e) {
            throw new DataError(e.getMessage());
        }
    }

    /** What the rows judged so far found. */
    private static final class Tally {
        private final List<String> failures = new ArrayList<>();
        private double worst;
        private int count;
    }

    /**
     * One round of the precision loop: judges the rows whose enclosure at {@code prec} is
     * narrower than a quarter of the reference's last digit, and every row at the cap (so the
     * cap is never left with rows); returns the others.
     */
    private static List<Row> judge(FunctionDef fn, List<Row> pending, int prec, Tally tally) throws DataError {
        List<Rational> xs = pending.stream().map(Row::x).toList();
        List<Jet> jets = enclose(fn, xs, prec, pending.get(0).where());
        List<Row> still = new ArrayList<>();
        for (int i = 0; i < pending.size(); i++) {
            Row row = pending.get(i);
            Ball b = row.derivative() ? jets.get(i).derivative() : jets.get(i).value();
            BigDecimal unit = row.value().ulp();
            if (b.rad().compareTo(unit.divide(BigDecimal.valueOf(4))) > 0 && prec < CAP_BITS) {
                still.add(row);
                continue;
            }
            tally.count++;
            tally.worst = Math.max(tally.worst, b.mid().subtract(row.value()).abs().divide(unit, MathContext.DECIMAL64).doubleValue());
            if (!b.addError(unit.divide(BigDecimal.valueOf(2))).contains(row.value())) {
                tally.failures.add(row.where() + ": " + row.function() + (row.params().isEmpty() ? "" : " (" + row.params() + ")")
                        + (row.derivative() ? " derivative" : " value") + " at x = " + row.x().toDecimalOrFraction()
                        + ": reference " + row.value() + " is not consistent with the enclosure " + b);
            }
        }
        return still;
    }

    private static FunctionDef define(String name, String params, String where) throws DataError {
        Family family = Catalog.lookup(name).orElseThrow(() -> new DataError(where + ": unknown family '" + name + "'"));
        Map<String, Rational> values = new HashMap<>();
        if (!params.isBlank()) {
            for (String p : params.split(";")) {
                String[] kv = p.split("=", 2);
                values.put(kv[0].strip(), Rational.parse(kv[1].strip()));
            }
        }
        try {
            return family.define(values);
        } catch (ParameterException e) {
            throw new DataError(where + ": " + e.getMessage());
        }
    }

    /** Identities that need no outside digits: Wronskians, recurrences, closed forms (all as ball overlap). */
    static List<Outcome> identities() throws DataError {
        List<Outcome> r = new ArrayList<>();
        int p = 200;
        try {
            r.add(airyWronskian(p));
            r.add(weberGaussian(p));
            r.add(hermiteFunctionRecurrence(p));
            // DLMF 18.9.1 (Table 18.9.1), three-term recurrences written as a_n p_(n+1) = (b_n + c_n x) p_n − d_n p_(n−1).
            r.add(recurrence("legendre-p", "(n+1) P_n+1 = (2n+1) x P_n - n P_n-1", new String[] {"-0.7", "1/3", "0.9"},
                    (n, x) -> new Rational[] {Rational.of(n + 1), x.multiply(Rational.of(2 * n + 1)), Rational.of(n)}, p));
            r.add(recurrence("chebyshev-t", "T_n+1 = 2x T_n - T_n-1", new String[] {"-0.7", "1/3", "0.9"},
                    (n, x) -> new Rational[] {Rational.ONE, x.multiply(Rational.of(2)), Rational.ONE}, p));
            r.add(recurrence("hermite-h", "H_n+1 = 2x H_n - 2n H_n-1", new String[] {"-2.5", "1/3", "3"},
                    (n, x) -> new Rational[] {Rational.ONE, x.multiply(Rational.of(2)), Rational.of(2L * n)}, p));
            r.add(recurrence("laguerre-l", "(n+1) L_n+1 = (2n+1-x) L_n - n L_n-1", new String[] {"0.5", "3", "10.25"},
                    (n, x) -> new Rational[] {Rational.of(n + 1), Rational.of(2 * n + 1).subtract(x), Rational.of(n)}, p));
            r.add(legendreWronskian(p));
        } catch (ExprException | ParameterException e) {
            throw new DataError("identity check: " + e.getMessage());
        }
        return r;
    }

    /** DLMF 9.2.7: W{Ai, Bi} = Ai Bi' − Ai' Bi = 1/π, as ball overlap. */
    private static Outcome airyWronskian(int p) throws ExprException, ParameterException {
        FunctionDef ai = Catalog.lookup("airy-ai").orElseThrow().define(Map.of());
        FunctionDef bi = Catalog.lookup("airy-bi").orElseThrow().define(Map.of());
        Ball invPi = Ball.ONE.divide(BallFunctions.pi(p), p);
        List<String> fails = new ArrayList<>();
        String[] xs = {"-7.5", "-1", "0", "1/3", "2", "4.25"};
        for (String xs1 : xs) {
            Jet a = FunctionEvaluator.enclose(ai, Rational.parse(xs1), p).jet();
            Jet b = FunctionEvaluator.enclose(bi, Rational.parse(xs1), p).jet();
            Ball w = a.value().multiply(b.derivative(), p).subtract(a.derivative().multiply(b.value(), p), p);
            if (!w.overlaps(invPi)) {
                fails.add("W{Ai, Bi}(" + xs1 + ") = " + w + " does not contain 1/pi");
            }
        }
        return new Outcome("identity W{Ai, Bi} = 1/pi", "DLMF 9.2.7", xs.length, fails, 0);
    }

    /** DLMF 12.7.2: U(−1/2, x) = e^(−x²/4), as ball overlap. */
    private static Outcome weberGaussian(int p) throws ExprException, ParameterException {
        FunctionDef u = Catalog.lookup("weber-u").orElseThrow().define(Map.of("a", Rational.of(-1, 2)));
        List<String> fails = new ArrayList<>();
        String[] ux = {"-3", "-0.5", "1", "2.75"};
        for (String s : ux) {
            Rational x = Rational.parse(s);
            Ball v = FunctionEvaluator.enclose(u, x, p).jet().value();
            Ball e = BallFunctions.exp(Ball.of(x.multiply(x).divide(Rational.of(-4)), p), p);
            if (!v.overlaps(e)) {
                fails.add("U(-1/2, " + s + ") = " + v + " differs from exp(-x^2/4) = " + e);
            }
        }
        return new Outcome("identity U(-1/2, x) = exp(-x^2/4)", "DLMF 12.7.2", ux.length, fails, 0);
    }

    /** DLMF 18.9.1 for the orthonormal Hermite functions: x ψ_n = sqrt((n+1)/2) ψ_{n+1} + sqrt(n/2) ψ_{n−1}. */
    private static Outcome hermiteFunctionRecurrence(int p) throws ExprException, ParameterException {
        List<String> fails = new ArrayList<>();
        int count = 0;
        for (int n = 1; n <= 12; n += 5) {
            FunctionDef lo = Catalog.lookup("hermite-function").orElseThrow().define(Map.of("n", Rational.of(n - 1)));
            FunctionDef mid = Catalog.lookup("hermite-function").orElseThrow().define(Map.of("n", Rational.of(n)));
            FunctionDef hi = Catalog.lookup("hermite-function").orElseThrow().define(Map.of("n", Rational.of(n + 1)));
            for (String s : new String[] {"-2.5", "0.75", "3"}) {
                Rational x = Rational.parse(s);
                Ball left = FunctionEvaluator.enclose(mid, x, p).jet().value().multiply(x, p);
                Ball right = BallFunctions.sqrt(Ball.of(Rational.of(n + 1, 2), p), p).multiply(FunctionEvaluator.enclose(hi, x, p).jet().value(), p)
                        .add(BallFunctions.sqrt(Ball.of(Rational.of(n, 2), p), p).multiply(FunctionEvaluator.enclose(lo, x, p).jet().value(), p), p);
                count++;
                if (!left.overlaps(right)) {
                    fails.add("x psi_" + n + "(" + s + ") = " + left + " but the recurrence gives " + right);
                }
            }
        }
        return new Outcome("identity x psi_n = sqrt((n+1)/2) psi_n+1 + sqrt(n/2) psi_n-1", "DLMF 18.9.1 (orthonormal form)", count, fails, 0);
    }

    /** DLMF 14.2.4 with μ = 0: W{P_n, Q_n} = P_n Q_n' − P_n' Q_n = 1/(1 − x²) on −1 &lt; x &lt; 1, as containment. */
    private static Outcome legendreWronskian(int p) throws ExprException, ParameterException {
        List<String> fails = new ArrayList<>();
        int count = 0;
        for (int n : new int[] {0, 3, 10}) {
            FunctionDef pn = Catalog.lookup("legendre-p").orElseThrow().define(Map.of("n", Rational.of(n)));
            FunctionDef qn = Catalog.lookup("legendre-q").orElseThrow().define(Map.of("n", Rational.of(n)));
            for (String s : new String[] {"-0.5", "1/3", "0.875"}) {
                Rational x = Rational.parse(s);
                Jet a = FunctionEvaluator.enclose(pn, x, p).jet();
                Jet b = FunctionEvaluator.enclose(qn, x, p).jet();
                Ball w = a.value().multiply(b.derivative(), p).subtract(a.derivative().multiply(b.value(), p), p);
                Rational expected = Rational.ONE.divide(Rational.ONE.subtract(x.multiply(x)));
                count++;
                if (!w.contains(expected)) {
                    fails.add("W{P_" + n + ", Q_" + n + "}(" + s + ") = " + w + " does not contain 1/(1-x^2) = " + expected.toDecimalOrFraction());
                }
            }
        }
        return new Outcome("identity W{P_n, Q_n} = 1/(1-x^2)", "DLMF 14.2.4 (mu = 0)", count, fails, 0);
    }

    /** The coefficients (a_n, b_n + c_n x, d_n) of a three-term recurrence at degree n and point x. */
    private interface Recurrence {
        Rational[] at(int n, Rational x);
    }

    /** a_n p_(n+1)(x) = (b_n + c_n x) p_n(x) − d_n p_(n−1)(x) at n = 5 and 20, both sides enclosed. */
    private static Outcome recurrence(String family, String formula, String[] xs, Recurrence coefficients, int p)
            throws ExprException, ParameterException {
        Family f = Catalog.lookup(family).orElseThrow();
        List<String> fails = new ArrayList<>();
        int count = 0;
        for (int n : new int[] {5, 20}) {
            FunctionDef lo = f.define(Map.of("n", Rational.of(n - 1)));
            FunctionDef mid = f.define(Map.of("n", Rational.of(n)));
            FunctionDef hi = f.define(Map.of("n", Rational.of(n + 1)));
            for (String s : xs) {
                Rational x = Rational.parse(s);
                Rational[] c = coefficients.at(n, x);
                Ball left = FunctionEvaluator.enclose(hi, x, p).jet().value().multiply(c[0], p);
                Ball right = FunctionEvaluator.enclose(mid, x, p).jet().value().multiply(c[1], p)
                        .subtract(FunctionEvaluator.enclose(lo, x, p).jet().value().multiply(c[2], p), p);
                count++;
                if (!left.overlaps(right)) {
                    fails.add(family + " n = " + n + ", x = " + s + ": " + left + " but the recurrence gives " + right);
                }
            }
        }
        return new Outcome("identity " + formula, "DLMF 18.9.1", count, fails, 0);
    }

    /** The engine's enclosures at the points; a normalization that cannot be evaluated is a data error at {@code where}. */
    private static List<Jet> enclose(FunctionDef fn, List<Rational> points, int prec, String where) throws DataError {
        try {
            return GridWalk.enclose(fn, points, prec);
        } catch (ExprException e) {
            throw new DataError(where + ": " + e.getMessage());
        }
    }
}
