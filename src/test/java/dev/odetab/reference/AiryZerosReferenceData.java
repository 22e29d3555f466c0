package dev.odetab.reference;

import java.io.IOException;
import java.math.BigDecimal;
import java.math.MathContext;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import org.apfloat.Apfloat;
import org.apfloat.ApfloatMath;

/**
 * The reference file {@code reference-data/zeros/airy-zeros-apfloat-1.15.0.csv} (in its own folder:
 * its layout is not the value layout that {@code odetab check} reads): the first 50 zeros
 * a_k, a'_k, b_k, b'_k of Ai, Ai', Bi, Bi' (DLMF 9.9(i)) and the other function at each
 * (Ai'(a_k), Ai(a'_k), Bi'(b_k), Bi(b'_k)), polished by Newton's method in apfloat 1.15.0 at
 * 70 digits and written with 50 significant digits.
 *
 * <p>The Newton iteration starts from the asymptotic forms of DLMF 9.9.6–9.9.9 (three terms of
 * T and U, DLMF 9.9.18–9.9.19), so the file owes nothing to odetab. Zeros of y use
 * x ← x − y/y'; zeros of y' use x ← x − y'/y'' with y'' = x y (DLMF 9.2.1). It stops when the
 * correction is below 10^−60; apfloat's Airy functions take seconds per point near x = −40,
 * so the values are computed once, committed, and re-checked against live apfloat by a slow
 * test ({@code AiryZerosReferenceDataTest}).
 */
public final class AiryZerosReferenceData {
    public static final Path FILE = Path.of("reference-data/zeros/airy-zeros-apfloat-1.15.0.csv");
    public static final int COUNT = 50;
    static final long PRECISION = 70;
    static final int DIGITS = 50;

    private AiryZerosReferenceData() {
    }

    /** The four zero sequences of DLMF 9.9(i), in the file's order. */
    public enum Kind {
        AI("airy-ai", "value"), AI_PRIME("airy-ai", "derivative"), BI("airy-bi", "value"), BI_PRIME("airy-bi", "derivative");

        public final String function;
        public final String of;

        Kind(String function, String of) {
            this.function = function;
            this.of = of;
        }

        boolean bi() {
            return this == BI || this == BI_PRIME;
        }

        boolean derivative() {
            return this == AI_PRIME || this == BI_PRIME;
        }
    }

    /** One zero: k, the zero, and the other function there (y' at a zero of y, y at a zero of y'). */
    public record Row(Kind kind, int k, BigDecimal zero, BigDecimal other) {
    }

    /**
     * The asymptotic approximation of the k-th zero (DLMF 9.9.6–9.9.9): a_k ~ −T(3π/8 (4k − 1)),
     * a'_k ~ −U(3π/8 (4k − 3)), b_k ~ −T(3π/8 (4k − 3)), b'_k ~ −U(3π/8 (4k − 1)), with T and U
     * of DLMF 9.9.18–9.9.19 through the t^(−4) term (coefficients from memory).
     */
    public static Apfloat asymptotic(Kind kind, int k, long precision) {
        boolean lateShift = kind == Kind.AI || kind == Kind.BI_PRIME;
        Apfloat t = ApfloatMath.pi(precision).multiply(new Apfloat(3L * (4L * k - (lateShift ? 1 : 3)), precision))
                .divide(new Apfloat(8, precision));
        Apfloat[] c = kind.derivative() ? uCoefficients(precision) : tCoefficients(precision);
        Apfloat inv2 = new Apfloat(1, precision).divide(t.multiply(t));
        Apfloat sum = c[0].add(c[1].multiply(inv2)).add(c[2].multiply(inv2).multiply(inv2));
        Apfloat cbrt = ApfloatMath.cbrt(t);
        return cbrt.multiply(cbrt).multiply(sum).negate();
    }

    /**
     * The first neglected term of the expansion {@link #asymptotic} uses, t^(2/3) |c_3| t^(−6)
     * (c_3 = 77125/82944 for T, −181223/207360 for U; DLMF 9.9.18–9.9.19, from memory).
     */
    public static Apfloat firstNeglected(Kind kind, int k, long precision) {
        boolean lateShift = kind == Kind.AI || kind == Kind.BI_PRIME;
        Apfloat t = ApfloatMath.pi(precision).multiply(new Apfloat(3L * (4L * k - (lateShift ? 1 : 3)), precision))
                .divide(new Apfloat(8, precision));
        Apfloat c3 = kind.derivative() ? ratio(181223, 207360, precision) : ratio(77125, 82944, precision);
        Apfloat cbrt = ApfloatMath.cbrt(t);
        return cbrt.multiply(cbrt).multiply(c3).divide(ApfloatMath.pow(t, 6));
    }

    /** T(t) = t^(2/3)(1 + 5/48 t^−2 − 5/36 t^−4 + …) (DLMF 9.9.18, from memory). */
    private static Apfloat[] tCoefficients(long p) {
        return new Apfloat[] {new Apfloat(1, p), ratio(5, 48, p), ratio(-5, 36, p)};
    }

    /** U(t) = t^(2/3)(1 − 7/48 t^−2 + 35/288 t^−4 − …) (DLMF 9.9.19, from memory). */
    private static Apfloat[] uCoefficients(long p) {
        return new Apfloat[] {new Apfloat(1, p), ratio(-7, 48, p), ratio(35, 288, p)};
    }

    private static Apfloat ratio(long a, long b, long p) {
        return new Apfloat(a, p).divide(new Apfloat(b, p));
    }

    private static Apfloat y(Kind kind, Apfloat x) {
        return kind.bi() ? ApfloatMath.airyBi(x) : ApfloatMath.airyAi(x);
    }

    private static Apfloat dy(Kind kind, Apfloat x) {
        return kind.bi() ? ApfloatMath.airyBiPrime(x) : ApfloatMath.airyAiPrime(x);
    }

    /** The k-th zero and the other function there, by Newton's method in apfloat (class comment). */
    static Row compute(Kind kind, int k) {
        Apfloat x = asymptotic(kind, k, PRECISION);
        Apfloat tolerance = new Apfloat(new BigDecimal("1e-60"), PRECISION);
        for (int it = 0; it < 40; it++) {
            Apfloat v = y(kind, x);
            Apfloat d = dy(kind, x);
            // zeros of y: x − y/y'; zeros of y': x − y'/(x y), since y'' = x y (DLMF 9.2.1)
            Apfloat step = kind.derivative() ? d.divide(x.multiply(v)) : v.divide(d);
            x = x.subtract(step);
            if (ApfloatMath.abs(step).compareTo(tolerance) < 0) {
                Apfloat other = kind.derivative() ? y(kind, x) : dy(kind, x);
                MathContext mc = new MathContext(DIGITS);
                return new Row(kind, k, new BigDecimal(x.toString(true)).round(mc), new BigDecimal(other.toString(true)).round(mc));
            }
        }
        throw new IllegalStateException("Newton's method did not converge for " + kind + " zero " + k);
    }

    /** The rows of the file (layout: function,of,k,zero,other,source). */
    public static List<Row> read() throws IOException {
        List<Row> rows = new ArrayList<>();
        for (String line : Files.readAllLines(FILE, StandardCharsets.UTF_8)) {
            if (line.startsWith("#") || line.startsWith("function,")) {
                continue;
            }
            String[] c = line.split(",");
            Kind kind = null;
            for (Kind kd : Kind.values()) {
                if (kd.function.equals(c[0]) && kd.of.equals(c[1])) {
                    kind = kd;
                }
            }
            rows.add(new Row(kind, Integer.parseInt(c[2]), new BigDecimal(c[3]), new BigDecimal(c[4])));
        }
        return rows;
    }

    /** The rows of one kind, k = 1 … 50 in order. */
    public static List<Row> read(Kind kind) throws IOException {
        return read().stream().filter(r -> r.kind() == kind).toList();
    }

    /** Writes the file (hours of apfloat on two cores). */
    public static void main(String[] args) throws Exception {
        ExecutorService pool = Executors.newFixedThreadPool(Runtime.getRuntime().availableProcessors());
        List<Future<Row>> futures = new ArrayList<>();
        for (Kind kind : Kind.values()) {
            for (int k = 1; k <= COUNT; k++) {
                int kk = k;
                futures.add(pool.submit(() -> compute(kind, kk)));
            }
        }
        StringBuilder sb = new StringBuilder();
        sb.append("# The first 50 zeros of Ai, Ai', Bi, Bi' (a_k, a'_k, b_k, b'_k of DLMF 9.9(i)) and, in 'other', the other\n");
        sb.append("# function there: Ai'(a_k), Ai(a'_k), Bi'(b_k), Bi(b'_k).\n");
        sb.append("# source: apfloat 1.15.0 (ApfloatMath.airyAi, airyAiPrime, airyBi, airyBiPrime), Newton's method at 70 digits from\n");
        sb.append("# the asymptotic forms of DLMF 9.9.6-9.9.9 until the correction is below 1e-60; written with 50 significant digits;\n");
        sb.append("# library-generated, re-checked by AiryZerosReferenceDataTest (slow tag).\n");
        sb.append("function,of,k,zero,other,source\n");
        for (Future<Row> f : futures) {
            Row r = f.get();
            sb.append(r.kind().function).append(',').append(r.kind().of).append(',').append(r.k()).append(',')
                    .append(r.zero().toString()).append(',').append(r.other().toString()).append(",apfloat 1.15.0\n");
            System.err.println(r.kind() + " " + r.k() + " " + r.zero());
        }
        pool.shutdown();
        Files.writeString(FILE, sb.toString(), StandardCharsets.UTF_8);
    }
}
