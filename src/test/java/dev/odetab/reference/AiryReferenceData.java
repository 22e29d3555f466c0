package dev.odetab.reference;

import java.io.IOException;
import java.math.BigDecimal;
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
 * The Airy reference file {@code reference-data/airy-apfloat-1.15.0.csv}: Ai, Ai', Bi, Bi' at
 * x = −30 + 9i/100, i = 0 … 500, computed by apfloat 1.15.0 (ApfloatMath.airyAi, airyAiPrime,
 * airyBi, airyBiPrime) at 85 digits and written with 80 significant digits. apfloat takes
 * seconds per point near x = −30, so the values are computed once, committed, and re-checked
 * against live apfloat by a slow test ({@code AiryReferenceDataTest}).
 */
public final class AiryReferenceData {
    public static final Path FILE = Path.of("reference-data/airy-apfloat-1.15.0.csv");
    public static final int COUNT = 501;
    static final long PRECISION = 85;
    static final int DIGITS = 80;

    private AiryReferenceData() {
    }

    public static BigDecimal point(int i) {
        return BigDecimal.valueOf(-3000 + 9L * i, 2);
    }

    /** One row: x and the four values, as written in the file. */
    public record Row(BigDecimal x, BigDecimal ai, BigDecimal aiPrime, BigDecimal bi, BigDecimal biPrime) {
    }

    static String[] compute(BigDecimal x) {
        Apfloat ax = new Apfloat(x, PRECISION);
        Apfloat[] v = {ApfloatMath.airyAi(ax), ApfloatMath.airyAiPrime(ax), ApfloatMath.airyBi(ax), ApfloatMath.airyBiPrime(ax)};
        String[] r = new String[4];
        for (int k = 0; k < 4; k++) {
            r[k] = new BigDecimal(v[k].toString(true)).round(new java.math.MathContext(DIGITS)).toString();
        }
        return r;
    }

    /** The rows of the file (layout: function,parameters,x,quantity,value,source; four lines per x). */
    public static List<Row> read() throws IOException {
        List<Row> rows = new ArrayList<>();
        List<BigDecimal> values = new ArrayList<>();
        for (String line : Files.readAllLines(FILE, StandardCharsets.UTF_8)) {
            if (line.startsWith("#") || line.startsWith("function,")) {
                continue;
            }
            String[] c = line.split(",");
            values.add(new BigDecimal(c[4]));
            if (values.size() == 4) {
                rows.add(new Row(new BigDecimal(c[2]), values.get(0), values.get(1), values.get(2), values.get(3)));
                values.clear();
            }
        }
        return rows;
    }

    /** Writes the file (about ten minutes of apfloat on two cores). */
    public static void main(String[] args) throws Exception {
        ExecutorService pool = Executors.newFixedThreadPool(Runtime.getRuntime().availableProcessors());
        List<Future<String[]>> futures = new ArrayList<>();
        for (int i = 0; i < COUNT; i++) {
            BigDecimal x = point(i);
            futures.add(pool.submit(() -> compute(x)));
        }
        StringBuilder sb = new StringBuilder();
        sb.append("# Airy functions Ai, Ai', Bi, Bi' (DLMF 9.2) at x = -30 + 9i/100, i = 0..500.\n");
        sb.append("# source: apfloat 1.15.0 (org.apfloat.ApfloatMath.airyAi, airyAiPrime, airyBi, airyBiPrime), 85-digit working precision,\n");
        sb.append("# written with 80 significant digits; library-generated, re-checked by AiryReferenceDataTest (slow tag).\n");
        sb.append("function,parameters,x,quantity,value,source\n");
        String[] functions = {"airy-ai", "airy-ai", "airy-bi", "airy-bi"};
        String[] quantities = {"value", "derivative", "value", "derivative"};
        for (int i = 0; i < COUNT; i++) {
            String[] r = futures.get(i).get();
            for (int k = 0; k < 4; k++) {
                sb.append(functions[k]).append(",,").append(point(i).toPlainString()).append(',').append(quantities[k]).append(',')
                        .append(r[k]).append(",apfloat 1.15.0\n");
            }
        }
        pool.shutdown();
        Files.writeString(FILE, sb.toString(), StandardCharsets.UTF_8);
    }
}
