package dev.odetab.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.InputStream;
import java.math.BigDecimal;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.ArrayList;
import java.util.HexFormat;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.TreeMap;
import java.util.concurrent.TimeUnit;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Stream;
import org.apache.commons.math3.analysis.polynomials.PolynomialFunction;
import org.apache.commons.math3.analysis.polynomials.PolynomialsUtils;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Issue 8, streaming: a long table builds in a heap of fixed size, far below what its rows,
 * literals and output files would take in memory. A child JVM with {@code -Xmx} builds a
 * binary32 table of P_2 (an exact polynomial, so evaluation is cheap); the build must succeed,
 * the CSV must have one line per row plus the header, chosen rows must hold the correctly
 * rounded values, every SHA-256 of manifest.json must match its file, and no temporary file
 * may remain, in the output folder or in the child's {@code java.io.tmpdir}.
 *
 * <p>Reference values: P_2's coefficients from commons-math3 3.6.1
 * ({@link PolynomialsUtils#createLegendrePolynomial}, -1/2 and 3/2, exact as doubles), summed
 * exactly in BigDecimal at the exact grid point and rounded to binary32 by
 * {@link Float#parseFloat} (Java SE: IEEE 754-2019 roundTiesToEven, §4.3.1).
 */
class LongTableMemoryTest {
    /**
     * 50,000 rows of x, P_2 and P_2' in CSV and C in a 16 MiB heap. Before rows and outputs were
     * streamed, the same spec failed with OutOfMemoryError at -Xmx32m (measured); now the heap
     * needed does not depend on the number of rows.
     */
    @Test
    void fiftyThousandRowsBuildInSixteenMebibytes(@TempDir Path tmp) throws Exception {
        build(tmp, 50_000, List.of("x", "value", "derivative"), "[\"csv\", \"c\"]", "16m", 10);
    }

    /** The size issue 8 names: 10^7 binary32 entries within a 512 MiB heap (several minutes). */
    @Test
    @Tag("slow")
    void tenMillionEntriesBuildInFiveHundredTwelveMebibytes(@TempDir Path tmp) throws Exception {
        build(tmp, 10_000_000, List.of("x", "value"), "[\"csv\"]", "512m", 120);
    }

    private static void build(Path tmp, int rows, List<String> columns, String outputs, String heap, long minutes) throws Exception {
        BigDecimal stepExact = BigDecimal.ONE.divide(BigDecimal.valueOf(rows)); // rows = 2^a 5^b: a terminating decimal
        String step = stepExact.toPlainString();
        String to = BigDecimal.ONE.subtract(stepExact).toPlainString();
        Path spec = tmp.resolve("long.toml");
        Files.writeString(spec, String.join("\n", "title = \"Quillmere Instruments: a long calibration table\"",
                "[functions.p2]", "family = \"legendre-p\"", "n = 2", "[tables.calibration]", "function = \"p2\"",
                "grid = { from = \"0\", to = \"" + to + "\", step = \"" + step + "\" }",
                "columns = [\"" + String.join("\", \"", columns) + "\"]", "format = \"binary32\"", "outputs = " + outputs, ""));
        Path out = tmp.resolve("out");
        Path childTmp = Files.createDirectory(tmp.resolve("java-tmp"));
        String java = Path.of(System.getProperty("java.home"), "bin", "java").toString();
        Process p = new ProcessBuilder(java, "-Xmx" + heap, "-Djava.io.tmpdir=" + childTmp, "-cp", System.getProperty("java.class.path"),
                "dev.odetab.cli.Main", "build", spec.toString(), "--out", out.toString())
                .redirectOutput(tmp.resolve("stdout").toFile()).redirectError(tmp.resolve("stderr").toFile()).start();
        if (!p.waitFor(minutes, TimeUnit.MINUTES)) {
            p.destroyForcibly();
            throw new AssertionError("the build took more than " + minutes + " minutes");
        }
        String err = Files.readString(tmp.resolve("stderr"));
        assertEquals(0, p.exitValue(), "exit code; stderr: " + err);
        assertEquals("", err, "stderr (no progress bar when stderr is not a terminal)");
        try (Stream<Path> left = Files.list(childTmp)) {
            assertEquals(List.of(), left.toList(), "temporary files left in java.io.tmpdir");
        }
        checkManifest(out);
        checkCsv(out.resolve("calibration.csv"), rows, stepExact, columns);
    }

    /** Every file of the folder is listed in manifest.json with its SHA-256 (Java SE MessageDigest), and nothing else is there. */
    private static void checkManifest(Path out) throws IOException, NoSuchAlgorithmException {
        String manifest = Files.readString(out.resolve("manifest.json"));
        Map<String, String> listed = new TreeMap<>();
        Matcher m = Pattern.compile("\"path\": \"([^\"]+)\",\\s*\"sha256\": \"([0-9a-f]{64})\"").matcher(manifest);
        while (m.find()) {
            listed.put(m.group(1), m.group(2));
        }
        Map<String, String> actual = new TreeMap<>();
        try (Stream<Path> files = Files.list(out)) {
            for (Path f : files.toList()) {
                String name = f.getFileName().toString();
                if (!name.equals("manifest.json")) {
                    actual.put(name, sha256(f));
                }
            }
        }
        assertEquals(listed, actual, "manifest.json against the files in " + out);
    }

    private static String sha256(Path f) throws IOException, NoSuchAlgorithmException {
        MessageDigest md = MessageDigest.getInstance("SHA-256");
        try (InputStream in = Files.newInputStream(f)) {
            byte[] b = new byte[1 << 16];
            for (int n = in.read(b); n >= 0; n = in.read(b)) {
                md.update(b, 0, n);
            }
        }
        return HexFormat.of().formatHex(md.digest());
    }

    /** One line per row plus the header; rows 1, a third of the way, and the last checked against the reference. */
    private static void checkCsv(Path csv, int rows, BigDecimal step, List<String> columns) throws IOException {
        PolynomialFunction p2 = PolynomialsUtils.createLegendrePolynomial(2);
        List<PolynomialFunction> refs = List.of(p2, p2.polynomialDerivative());
        List<Integer> checked = List.of(1, rows / 3, rows - 1);
        List<String> seen = new ArrayList<>();
        long lines = 0;
        try (BufferedReader r = Files.newBufferedReader(csv, StandardCharsets.UTF_8)) {
            for (String line = r.readLine(); line != null; line = r.readLine()) {
                if (checked.contains((int) lines - 1)) {
                    seen.add(line);
                }
                lines++;
            }
        }
        assertEquals(rows + 1L, lines, "CSV lines");
        for (int k = 0; k < checked.size(); k++) {
            BigDecimal x = step.multiply(BigDecimal.valueOf(checked.get(k)));
            String[] cells = seen.get(k).split(",");
            assertEquals(x.stripTrailingZeros().toPlainString(), cells[0], "x of row " + checked.get(k));
            for (int c = 1; c < columns.size(); c++) {
                double[] coefficients = refs.get(c - 1).getCoefficients();
                BigDecimal exact = BigDecimal.ZERO;
                for (int i = coefficients.length - 1; i >= 0; i--) {
                    exact = exact.multiply(x).add(new BigDecimal(coefficients[i]));
                }
                float expected = Float.parseFloat(exact.toString());
                assertEquals(String.format(Locale.ROOT, "%08x", Float.floatToRawIntBits(expected)),
                        String.format(Locale.ROOT, "%08x", Float.floatToRawIntBits(Float.parseFloat(cells[2 * c + 1]))),
                        columns.get(c) + " of row " + checked.get(k) + " (exact " + exact + ")");
            }
        }
    }
}
