package dev.odetab.audit;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.odetab.cli.CliRunner;
import java.awt.image.BufferedImage;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import javax.imageio.ImageIO;
import javax.xml.parsers.DocumentBuilderFactory;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.w3c.dom.Document;
import org.w3c.dom.NodeList;

/**
 * DESIGN.md "Command line" ({@code odetab audit}): tables built by odetab itself audit clean;
 * planted errors are found at their index with their size; exit codes 0, 1, 2; the plot files
 * are a valid PNG and SVG with one marker per entry; malformed files write nothing.
 */
class AuditTest {
    private static final int N = 33;
    private static final String SPEC = """
            [functions.ai]
            equation = "y'' = x*y"
            at = "0"
            value = "1/(3^(2/3)*gamma(2/3))"
            slope = "-1/(3^(1/3)*gamma(1/3))"

            [tables.ai64]
            function = "ai"
            grid = { from = "-2", to = "2", step = "1/8" }
            columns = ["x", "value", "derivative"]
            format = "binary64"
            outputs = ["csv", "c", "java"]

            [tables.ai32]
            function = "ai"
            grid = { from = "-2", to = "2", step = "1/8" }
            columns = ["x", "value"]
            format = "binary32"
            outputs = ["csv", "c"]

            [tables.ai32down]
            function = "ai"
            grid = { from = "-2", to = "2", step = "1/8" }
            columns = ["x", "value"]
            format = "binary32"
            rounding = "down"
            outputs = ["c"]

            [tables.ai16]
            function = "ai"
            grid = { from = "-2", to = "2", step = "1/8" }
            columns = ["x", "value"]
            format = "binary16"
            outputs = ["csv", "c"]

            [tables.aiq15]
            function = "ai"
            grid = { from = "-2", to = "2", step = "1/8" }
            columns = ["value"]
            format = "fixed:s16.15"
            outputs = ["csv", "c"]

            [tables.aidd]
            function = "ai"
            grid = { from = "-2", to = "2", step = "1/8" }
            columns = ["x", "value"]
            format = "double-double"
            outputs = ["csv"]

            [tables.ai128]
            function = "ai"
            grid = { from = "-2", to = "2", step = "1/8" }
            columns = ["x", "value"]
            format = "binary128"
            outputs = ["csv"]

            [tables.aidec]
            function = "ai"
            grid = { from = "-2", to = "2", step = "1/8" }
            columns = ["x", "value"]
            format = "decimal:25"
            outputs = ["csv"]
            """;

    @TempDir
    static Path dir;
    static Path spec;
    static Path out;

    @BeforeAll
    static void build() throws IOException {
        spec = dir.resolve("ai.toml");
        Files.writeString(spec, SPEC);
        out = dir.resolve("out");
        CliRunner.Result r = CliRunner.run("build", spec.toString(), "--out", out.toString(), "--jobs", "1");
        assertEquals(0, r.code(), r.err());
    }

    private static CliRunner.Result audit(String table, Path file, String... more) {
        List<String> args = new ArrayList<>(List.of("audit", spec + "#" + table, file.toString()));
        args.addAll(List.of(more));
        return CliRunner.run(args.toArray(String[]::new));
    }

    /** The error_ulps column of a report's audit.csv, by index. */
    private static double[] errors(Path report) throws IOException {
        List<String> lines = Files.readAllLines(report.resolve("audit.csv"));
        double[] e = new double[lines.size() - 1];
        for (int i = 1; i < lines.size(); i++) {
            e[i - 1] = Double.parseDouble(lines.get(i).split(",")[7]);
        }
        return e;
    }

    private static String[] row(Path report, int index) throws IOException {
        return Files.readAllLines(report.resolve("audit.csv")).get(index + 1).split(",");
    }

    // Source: odetab's own correctly rounded tables (DESIGN "Formats and rounding"): every entry within 0.5 ulp.
    @Test
    void ownTablesAuditCleanInEveryFormat() throws IOException {
        String[][] cases = {
            {"ai64", "ai64.c"}, {"ai64", "ai64.csv"}, {"ai64", "Ai64.java"}, {"ai32", "ai32.c"}, {"ai32", "ai32.csv"},
            {"ai16", "ai16.c"}, {"ai16", "ai16.csv"}, {"aiq15", "aiq15.c"}, {"aiq15", "aiq15.csv"},
            {"aidd", "aidd.csv"}, {"ai128", "ai128.csv"}, {"aidec", "aidec.csv"}};
        for (String[] c : cases) {
            Path report = dir.resolve("clean-" + c[1]);
            CliRunner.Result r = audit(c[0], out.resolve(c[1]), "--report", report.toString());
            assertEquals(0, r.code(), c[1] + ": " + r.out() + r.err());
            double[] e = errors(report);
            assertEquals(N, e.length, c[1]);
            for (int i = 0; i < N; i++) {
                assertTrue(Math.abs(e[i]) <= 0.5, c[1] + " entry " + i + ": " + e[i]);
            }
        }
        Path report = dir.resolve("clean-derivative");
        CliRunner.Result r = audit("ai64", out.resolve("ai64.c"), "--column", "derivative", "--report", report.toString());
        assertEquals(0, r.code(), r.err());
        assertTrue(r.out().contains("ai64_derivative"), r.out());
    }

    /** The binary64 values of ai64.csv, read back by Java's correctly rounded hex parser. */
    private static double[] values64() throws IOException {
        List<String> lines = Files.readAllLines(out.resolve("ai64.csv"));
        double[] v = new double[lines.size() - 1];
        for (int i = 1; i < lines.size(); i++) {
            v[i - 1] = Double.parseDouble(lines.get(i).split(",")[3]);
        }
        return v;
    }

    private static Path cArray(String name, double[] v) throws IOException {
        StringBuilder sb = new StringBuilder("/* planted */\n#define LEN 33\nstatic const double planted[LEN] = {\n");
        for (double d : v) {
            sb.append("    ").append(Double.toHexString(d)).append(",\n");
        }
        Path p = dir.resolve(name);
        Files.writeString(p, sb.append("};\n").toString());
        return p;
    }

    // Source: planted changes of Java doubles (Math.ulp, JLS §4.2.3); the audit must find each at its index with its size.
    @Test
    void plantedErrorsAreFoundWhereAndAsLargeAsPlanted() throws IOException {
        Path cleanReport = dir.resolve("planted-clean");
        assertEquals(0, audit("ai64", cArray("clean.c", values64()), "--report", cleanReport.toString()).code());
        double[] clean = errors(cleanReport);
        double[] v = values64();
        v[3] += Math.ulp(v[3]);          // +1 ulp (x = -1.625, inside its binade)
        v[10] -= 3 * Math.ulp(v[10]);    // -3 ulp
        v[20] = -v[20];                  // sign flip
        double t = v[25];
        v[25] = v[26];                   // swapped pair
        v[26] = t;
        v[30] *= 2;                      // wrong exponent
        Path report = dir.resolve("planted");
        CliRunner.Result r = audit("ai64", cArray("planted.c", v), "--report", report.toString());
        assertEquals(1, r.code(), r.out() + r.err());
        double[] e = errors(report);
        assertEquals(clean[3] + 1, e[3], 1e-3);
        assertEquals(clean[10] - 3, e[10], 1e-3);
        assertEquals("true", row(report, 20)[12], "wrong sign at 20");
        assertTrue(Math.abs(e[25]) > 1e6 && Math.abs(e[26]) > 1e6, e[25] + " " + e[26]);
        assertEquals("true", row(report, 30)[13], "wrong exponent at 30");
        for (int i = 0; i < N; i++) {
            boolean planted = i == 3 || i == 10 || i == 20 || i == 25 || i == 26 || i == 30;
            assertEquals(planted, Math.abs(e[i]) > 0.5, "entry " + i + ": " + e[i]);
            assertEquals(planted, row(report, i)[11].equals("true"), "beyond_tolerance at " + i);
        }
        assertTrue(r.out().contains("0.5 ulp: 6"), r.out());
        assertTrue(r.out().contains("wrong sign: 1, wrong exponent: 1"), r.out());
    }

    // Source: a binary32 table rounded down (DESIGN "Formats and rounding") is faithful but not correctly rounded.
    @Test
    void faithfulTablePassesAtOneUlpAndFailsAtHalf() throws IOException {
        Path down = out.resolve("ai32down.c");
        CliRunner.Result strict = audit("ai32", down, "--column", "value", "--report", dir.resolve("down-half").toString());
        assertEquals(1, strict.code(), strict.out() + strict.err());
        CliRunner.Result loose = audit("ai32", down, "--tolerance", "1", "--report", dir.resolve("down-one").toString());
        assertEquals(0, loose.code(), loose.out() + loose.err());
        for (double e : errors(dir.resolve("down-one"))) {
            assertTrue(e <= 0 && e > -1, "rounded down means entry <= exact, by less than 1 ulp: " + e);
        }
    }

    // Source: javax.imageio (PNG) and the JDK's XML parser (SVG); one curved path per entry, as ErrorPlot documents.
    @Test
    void plotsAreValidPngAndSvgWithOneMarkerPerEntry() throws Exception {
        Path report = dir.resolve("plot");
        assertEquals(0, audit("ai32", out.resolve("ai32.c"), "--report", report.toString()).code());
        BufferedImage img = ImageIO.read(report.resolve("error.png").toFile());
        assertNotNull(img, "PNG readable");
        assertEquals(ErrorPlot.WIDTH, img.getWidth());
        DocumentBuilderFactory f = DocumentBuilderFactory.newInstance();
        f.setNamespaceAware(true);
        f.setFeature("http://apache.org/xml/features/nonvalidating/load-external-dtd", false);
        Document doc = f.newDocumentBuilder().parse(report.resolve("error.svg").toFile());
        assertEquals("svg", doc.getDocumentElement().getLocalName());
        NodeList paths = doc.getElementsByTagNameNS("*", "path");
        int markers = 0;
        for (int i = 0; i < paths.getLength(); i++) {
            if (paths.item(i).getAttributes().getNamedItem("d").getNodeValue().contains("C")) {
                markers++;
            }
        }
        assertEquals(N, markers);
        byte[] again = ErrorPlotSvg.again(spec, out.resolve("ai32.c"), dir.resolve("plot-again"));
        assertTrue(java.util.Arrays.equals(Files.readAllBytes(report.resolve("error.svg")), again), "SVG is deterministic");
    }

    private static final Pattern POSITION = Pattern.compile(":(\\d+):(\\d+): ");

    private static void assertMalformed(String table, String name, String text, int line, int column, String words)
            throws IOException {
        Path p = dir.resolve(name);
        Files.writeString(p, text);
        Path report = dir.resolve("bad-" + name);
        CliRunner.Result r = audit(table, p, "--report", report.toString());
        assertEquals(2, r.code(), name + ": " + r.out() + r.err());
        Matcher m = POSITION.matcher(r.err());
        if (line > 0) {
            assertTrue(m.find(), name + ": " + r.err());
            assertEquals(line + ":" + column, m.group(1) + ":" + m.group(2), r.err());
        }
        assertTrue(r.err().contains(words), name + ": " + r.err());
        assertFalse(Files.exists(report), "nothing written for " + name);
    }

    // Source: C99 §6.7.8 initializer syntax; positions counted by hand in the texts below.
    @Test
    void malformedTablesAreBadInputWithAPositionAndWriteNothing() throws IOException {
        assertMalformed("ai64", "open.c", "// header\nconst double t[33] = {\n  0x1p-2, 0.5,\n", 2, 22, "never closed");
        assertMalformed("ai64", "garbage.c", "const double t[] = {\n  0.25, 0.5,\n  0.7o5, 1.0 };\n", 3, 3, "0.7o5");
        assertMalformed("ai64", "word.c", "const double t[] = { 0.25, oops };\n", 1, 28, "oops");
        assertMalformed("ai64", "nan.c", "const double t[] = {\n 0.25,\n  -NAN };\n", 3, 4, "NaN");
        assertMalformed("aiq15", "inf.c", "const int16_t t[] = { 1, INFINITY };\n", 1, 26, "INFINITY");
        assertMalformed("ai64", "nan.csv", "x,value\n-2,0.1\n-1.875,NaN\n", 3, 8, "NaN");
        assertMalformed("ai64", "short.c", "/* two */ static const double t[2] = { 0.1, 0.2 };\n", 0, 0,
                "has 2 entries, table ai64 has 33");
    }
}
