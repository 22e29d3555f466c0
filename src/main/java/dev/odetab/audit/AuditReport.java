package dev.odetab.audit;

import dev.odetab.base.Json;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.TreeMap;

/**
 * The summary, the per-entry CSV and the JSON summary of an audit.
 *
 * <p>Trust level: Heuristic (presentation): the numbers are the audit's midpoint errors
 * printed as doubles; the counts beyond 0.5, 1, 2 and 10 ulp use those midpoints, the
 * tolerance verdict uses the rigorous decision of {@link Auditor}. Percentiles are nearest-rank
 * over |error|: the k-th smallest with k = ceil(p/100 · n). Output is deterministic
 * ({@link Locale#ROOT}, {@code \n}, no timestamps).
 */
public final class AuditReport {
    /** The thresholds counted in the summary, in ulps. */
    static final double[] THRESHOLDS = {0.5, 1, 2, 10};
    static final int WORST = 10;

    private AuditReport() {
    }

    /** Heuristic: nearest-rank percentile p (0 &lt; p &lt;= 100) of |error|. */
    static double percentile(AuditResult a, double p) {
        double[] s = a.rows().stream().mapToDouble(r -> Math.abs(r.ulps())).sorted().toArray();
        return s.length == 0 ? 0 : s[Math.max(0, (int) Math.ceil(p / 100 * s.length) - 1)];
    }

    /** Heuristic: the entries by decreasing |error| (ties by index), at most {@link #WORST}. */
    static List<AuditResult.Row> worst(AuditResult a) {
        return a.rows().stream().sorted(Comparator.comparingDouble((AuditResult.Row r) -> -Math.abs(r.ulps()))
                .thenComparingInt(AuditResult.Row::index)).limit(WORST).toList();
    }

    /** Rigorous: the number of entries beyond the tolerance, as {@link Auditor} decided them. */
    public static long beyondTolerance(AuditResult a) {
        return a.rows().stream().filter(AuditResult.Row::beyond).count();
    }

    /** Heuristic: the terminal summary. */
    public static String summary(AuditResult a) {
        StringBuilder sb = new StringBuilder();
        sb.append(String.format(Locale.ROOT, "audit of %s (%s, %d entries) against table %s (%s, %s, %s)%n",
                a.entries().source(), a.entries().name(), a.rows().size(), a.table().name(), a.column(),
                a.table().format().name(), a.table().rounding().name().toLowerCase(Locale.ROOT).replace('_', '-')));
        sb.append(String.format(Locale.ROOT, "  max |error|     %s ulp%n", ulps(percentile(a, 100))));
        sb.append(String.format(Locale.ROOT, "  median |error|  %s ulp%n", ulps(percentile(a, 50))));
        sb.append(String.format(Locale.ROOT, "  99th percentile %s ulp%n", ulps(percentile(a, 99))));
        StringBuilder counts = new StringBuilder("  entries beyond");
        for (double t : THRESHOLDS) {
            counts.append(String.format(Locale.ROOT, "  %s ulp: %d", trim(t), count(a, t)));
        }
        sb.append(counts).append('\n');
        sb.append(String.format(Locale.ROOT, "  wrong sign: %d, wrong exponent: %d%n",
                a.rows().stream().filter(AuditResult.Row::wrongSign).count(),
                a.rows().stream().filter(AuditResult.Row::wrongExponent).count()));
        sb.append("  worst entries (index, x, entry, exact, error):\n");
        for (AuditResult.Row r : worst(a)) {
            sb.append(String.format(Locale.ROOT, "    %6d  x = %-14s %-24s %-28s %s ulp%n", r.index(),
                    r.x().toDecimalOrFraction(), r.item().text(), r.exact(), ulps(r.ulps())));
        }
        long beyond = beyondTolerance(a);
        sb.append(beyond == 0
                ? String.format(Locale.ROOT, "  verdict: every entry is within %s ulp%n", trim(a.tolerance()))
                : String.format(Locale.ROOT, "  verdict: %d entr%s exceed%s the tolerance of %s ulp%n", beyond,
                        beyond == 1 ? "y" : "ies", beyond == 1 ? "s" : "", trim(a.tolerance())));
        return sb.toString();
    }

    /** Heuristic: entries whose midpoint error exceeds {@code threshold} ulps. */
    static long count(AuditResult a, double threshold) {
        return a.rows().stream().filter(r -> Math.abs(r.ulps()) > threshold).count();
    }

    /** Heuristic: the per-entry CSV (RFC 4180, header first). */
    public static byte[] csv(AuditResult a) {
        StringBuilder sb = new StringBuilder("index,x,entry,line,column,exact,exact_digits,error_ulps,error_bound_ulps,absolute_error,relative_error,beyond_tolerance,wrong_sign,wrong_exponent\n");
        for (AuditResult.Row r : a.rows()) {
            sb.append(r.index()).append(',').append(r.x().toDecimalOrFraction()).append(',')
                    .append(quote(r.item().text())).append(',').append(r.item().line()).append(',').append(r.item().column())
                    .append(',').append(r.exact()).append(',').append(r.exactDigits()).append(',').append(ulps(r.ulps())).append(',')
                    .append(String.format(Locale.ROOT, "%.3g", r.ulpsRadiusBound())).append(',')
                    .append(String.format(Locale.ROOT, "%.6g", r.absolute())).append(',')
                    .append(String.format(Locale.ROOT, "%.6g", r.relative())).append(',')
                    .append(r.beyond()).append(',').append(r.wrongSign()).append(',').append(r.wrongExponent()).append('\n');
        }
        return sb.toString().getBytes(StandardCharsets.UTF_8);
    }

    /** Heuristic: the JSON summary for machines. */
    public static byte[] json(AuditResult a) {
        Map<String, Object> m = new LinkedHashMap<>();
        m.put("file", a.entries().source());
        m.put("array_or_column", a.entries().name());
        m.put("table", a.table().name());
        m.put("column", a.column());
        m.put("format", a.table().format().name());
        m.put("entries", a.rows().size());
        m.put("tolerance_ulps", a.tolerance());
        m.put("max_error_ulps", round(percentile(a, 100)));
        m.put("median_error_ulps", round(percentile(a, 50)));
        m.put("p99_error_ulps", round(percentile(a, 99)));
        Map<String, Object> beyond = new TreeMap<>();
        for (double t : THRESHOLDS) {
            beyond.put(trim(t), count(a, t));
        }
        m.put("count_beyond_ulps", beyond);
        m.put("count_beyond_tolerance", beyondTolerance(a));
        m.put("wrong_sign", a.rows().stream().filter(AuditResult.Row::wrongSign).count());
        m.put("wrong_exponent", a.rows().stream().filter(AuditResult.Row::wrongExponent).count());
        List<Object> w = new ArrayList<>();
        for (AuditResult.Row r : worst(a)) {
            Map<String, Object> e = new LinkedHashMap<>();
            e.put("index", r.index());
            e.put("x", r.x().toDecimalOrFraction());
            e.put("entry", r.item().text());
            e.put("exact", r.exact());
            e.put("exact_digits", r.exactDigits());
            e.put("error_ulps", round(r.ulps()));
            w.add(e);
        }
        m.put("worst", w);
        m.put("passed", beyondTolerance(a) == 0);
        return Json.write(m).getBytes(StandardCharsets.UTF_8);
    }

    private static String quote(String s) {
        return s.contains(",") || s.contains("\"") ? "\"" + s.replace("\"", "\"\"") + "\"" : s;
    }

    private static double round(double ulps) {
        return Double.parseDouble(ulps(ulps));
    }

    /** An error in ulps with 4 decimals (the audit settles it to about 1e-3 ulp). */
    static String ulps(double u) {
        return Double.isInfinite(u) ? (u > 0 ? "Infinity" : "-Infinity") : String.format(Locale.ROOT, "%.4f", u);
    }

    private static String trim(double t) {
        return t == Math.rint(t) && Math.abs(t) < 1e15 ? Long.toString((long) t) : Double.toString(t);
    }
}
