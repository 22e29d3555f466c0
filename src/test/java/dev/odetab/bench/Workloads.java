package dev.odetab.bench;

import dev.odetab.numeric.Format;
import dev.odetab.numeric.Rational;
import dev.odetab.numeric.Target;
import dev.odetab.ode.FunctionDef;
import dev.odetab.ode.family.Catalog;
import dev.odetab.tables.Column;
import dev.odetab.tables.Grid;
import dev.odetab.base.Progress;
import dev.odetab.tables.TableDef;
import dev.odetab.tables.TableKind;
import dev.odetab.tables.TableEvaluator;
import dev.odetab.tables.TableResult;
import java.io.IOException;
import java.lang.management.ManagementFactory;
import java.lang.management.ThreadMXBean;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import org.apfloat.Apfloat;
import org.apfloat.ApfloatMath;

/**
 * The benchmark workloads of the project's speed issue, each timed for odetab and, in the same
 * run, for apfloat 1.15.0 on points of the same grid (apfloat takes milliseconds per point, so
 * it runs on an evenly spaced sample; its figure is time per entry on that sample). Run with
 * {@code mvn -B -Pbench -DskipTests verify} (DEVELOPERS.md). Not a test: it asserts nothing and
 * prints a table. {@code -Dbench.workloads=W1,W4} picks workloads (default all four).
 *
 * <p>odetab's figures: W1–W3 in this JVM after warm-up runs (a smaller grid, then the table), first on one
 * thread (CPU time of the thread and wall time, the better of two runs), then on all cores
 * (wall time); W4 as a whole
 * process ({@code java -Xmx512m -jar target/odetab.jar build}), wall time and peak resident memory
 * (VmHWM from /proc).
 */
public final class Workloads {
    private static final ThreadMXBean THREADS = ManagementFactory.getThreadMXBean();

    private Workloads() {
    }

    public static void main(String[] args) throws Exception {
        Path jar = Path.of(args.length > 0 ? args[0] : "target/odetab.jar");
        List<String> which = List.of(System.getProperty("bench.workloads", "W1,W2,W3,W4").split(","));
        System.out.printf(Locale.ROOT, "odetab benchmark: %d cores, Java %s%n", Runtime.getRuntime().availableProcessors(),
                System.getProperty("java.version"));
        System.out.printf(Locale.ROOT, "%-4s %-34s %9s %12s %12s %12s %14s %9s%n", "", "workload", "entries", "cpu us/e 1t",
                "wall us/e 1t", "wall us/e Nt", "apfloat us/e", "ratio");
        if (which.contains("W1")) {
            w1();
        }
        if (which.contains("W2")) {
            w2();
        }
        if (which.contains("W3")) {
            w3();
        }
        if (which.contains("W4")) {
            w4(jar);
        }
    }

    private static FunctionDef family(String name, Map<String, Rational> params) throws Exception {
        return Catalog.lookup(name).orElseThrow().define(params);
    }

    private static TableDef table(FunctionDef f, Grid grid, List<String> columns, Format format) {
        List<Column> cols = new ArrayList<>();
        for (String c : columns) {
            cols.add(Column.parse(c));
        }
        return new TableDef("bench", f.name(), f, new TableKind.Values(grid), cols, Target.nearest(format), 4096, List.of("csv"));
    }

    /** Times odetab on the table: {cpu µs/entry on one thread, wall µs/entry on one thread, wall µs/entry on all cores}. */
    private static double[] odetab(TableDef t, TableDef warmUp, int entriesPerRow) throws Exception {
        TableEvaluator.evaluate(warmUp);
        TableEvaluator.evaluate(t);
        long cpu = Long.MAX_VALUE;
        long wall = Long.MAX_VALUE;
        TableResult r = null;
        for (int rep = 0; rep < 2; rep++) { // the better of two runs: the machine may be busy
            long c0 = THREADS.getCurrentThreadCpuTime();
            long w0 = System.nanoTime();
            r = TableEvaluator.evaluate(t);
            wall = Math.min(wall, System.nanoTime() - w0);
            cpu = Math.min(cpu, THREADS.getCurrentThreadCpuTime() - c0);
        }
        double entries = (double) r.rows().size() * entriesPerRow;
        int cores = Runtime.getRuntime().availableProcessors();
        ExecutorService pool = Executors.newFixedThreadPool(cores);
        long w2;
        long w3;
        try {
            w2 = System.nanoTime();
            TableEvaluator.evaluate(t, Progress.NONE, pool);
            w3 = System.nanoTime();
        } finally {
            pool.shutdownNow();
        }
        return new double[] {cpu / 1e3 / entries, wall / 1e3 / entries, (w3 - w2) / 1e3 / entries, entries};
    }

    private static void row(String id, String what, double[] o, double apfloat, int sample) {
        System.out.printf(Locale.ROOT, "%-4s %-34s %9d %12.3f %12.3f %12.3f %14.1f %9.0f   (apfloat on %d points)%n", id, what,
                (long) o[3], o[0], o[1], o[2], apfloat, apfloat / o[1], sample);
    }

    private static Apfloat exact(Rational x, long digits) {
        return new Apfloat(new java.math.BigDecimal(x.numerator()), digits).divide(new Apfloat(new java.math.BigDecimal(x.denominator()), digits));
    }

    /** W1: Ai and Ai' at x = −10 + i/5000, i = 0..100000, binary64. */
    private static void w1() throws Exception {
        FunctionDef ai = family("airy-ai", Map.of());
        Rational step = Rational.of(1, 5000);
        TableDef t = table(ai, new Grid.Uniform(Rational.of(-10), Rational.of(10), step), List.of("value", "derivative"),
                Format.BinaryFormat.BINARY64);
        TableDef warm = table(ai, new Grid.Uniform(Rational.of(-2), Rational.of(0), step), List.of("value", "derivative"),
                Format.BinaryFormat.BINARY64);
        double[] o = odetab(t, warm, 2);
        int sample = 0;
        long a0 = System.nanoTime();
        for (int i = 0; i <= 100000; i += 10000) {
            Rational xr = Rational.of(-10).add(step.multiply(Rational.of(i)));
            if (xr.isZero()) {
                continue; // apfloat's zero has infinite precision, which its Airy functions refuse
            }
            Apfloat x = exact(xr, 20);
            ApfloatMath.airyAi(x);
            ApfloatMath.airyAiPrime(x);
            sample++;
        }
        double apfloat = (System.nanoTime() - a0) / 1e3 / (2.0 * sample);
        row("W1", "Ai, Ai' on [-10, 10] step 1/5000", o, apfloat, sample);
    }

    /** W2: Legendre P_20 at x = −1 + i/1000, i = 0..2000, binary64 (the exact polynomial path). */
    private static void w2() throws Exception {
        FunctionDef p20 = family("legendre-p", Map.of("n", Rational.of(20)));
        Rational step = Rational.of(1, 1000);
        TableDef t = table(p20, new Grid.Uniform(Rational.of(-1), Rational.ONE, step), List.of("value"), Format.BinaryFormat.BINARY64);
        TableDef warm = table(p20, new Grid.Uniform(Rational.of(-1), Rational.ZERO, step), List.of("value"), Format.BinaryFormat.BINARY64);
        double[] o = odetab(t, warm, 1);
        int sample = 0;
        long a0 = System.nanoTime();
        Apfloat n = new Apfloat(20, 20);
        for (int i = 0; i <= 2000; i += 20) {
            Rational xr = Rational.of(-1).add(step.multiply(Rational.of(i)));
            if (xr.isZero()) {
                continue;
            }
            ApfloatMath.legendreP(n, exact(xr, 20));
            sample++;
        }
        double apfloat = (System.nanoTime() - a0) / 1e3 / sample;
        row("W2", "P_20 on [-1, 1] step 1/1000", o, apfloat, sample);
    }

    /**
     * W3: the Gauss–Legendre rule n = 100, nodes and weights, in binary64 and in decimal:40 (a
     * spec read like any other). apfloat: Newton's method on P_100 (three-term recurrence in apfloat) at 50 (70)
     * digits from binary64 seeds for a sample of nodes, and the weight 2/((1 − x²) P'(x)²) there.
     */
    private static void w3() throws Exception {
        Path dir = Files.createTempDirectory("odetab-bench");
        Path spec = dir.resolve("w3.toml");
        Files.writeString(spec, String.join("\n",
                "title = \"W3: Gauss-Legendre n = 100\"",
                "[functions.p100]", "family = \"legendre-p\"", "n = 100",
                "[tables.gl100_binary64]", "kind = \"quadrature\"", "function = \"p100\"", "columns = [\"node\", \"weight\"]",
                "format = \"binary64\"", "outputs = [\"csv\"]",
                "[tables.gl100_decimal40]", "kind = \"quadrature\"", "function = \"p100\"", "columns = [\"node\", \"weight\"]",
                "format = \"decimal:40\"", "outputs = [\"csv\"]", ""));
        List<TableDef> tables = dev.odetab.spec.SpecFile.load(spec).tables();
        // apfloat: a sample of 10 nodes, each from the binary64 node of odetab's own table as seed.
        TableResult seeds = TableEvaluator.evaluate(tables.get(0));
        for (TableDef t : tables) {
            double[] o = odetab(t, t, 2);
            int digits = t.format().name().equals("binary64") ? 40 : 60;
            long a0 = System.nanoTime();
            int sample = 0;
            Apfloat n = new Apfloat(100, digits + 10);
            Apfloat one = new Apfloat(1, digits + 10);
            for (int i = 0; i < 100; i += 10) {
                Apfloat x = new Apfloat(seeds.rows().get(i).entries().get(0).value().toBigDecimalExact(), digits + 10);
                Apfloat derivative = one;
                for (int it = 0; it < 3; it++) {
                    // P_100 and P_99 by the three-term recurrence (DLMF 18.9.1) in apfloat arithmetic
                    Apfloat q = one;
                    Apfloat p = x;
                    for (int k = 1; k < 100; k++) {
                        Apfloat next = new Apfloat(2L * k + 1, digits + 10).multiply(x).multiply(p)
                                .subtract(new Apfloat(k, digits + 10).multiply(q)).divide(new Apfloat(k + 1L, digits + 10))
                                .precision(digits + 10); // apfloat shrinks precision on cancellation; the recurrence is stable
                        q = p;
                        p = next;
                    }
                    // DLMF 18.9.20 (Legendre): (1 − x²) P_n'(x) = n (P_(n−1)(x) − x P_n(x))
                    derivative = n.multiply(q.subtract(x.multiply(p))).divide(one.subtract(x.multiply(x)));
                    if (p.signum() == 0) {
                        break; // converged to the working precision
                    }
                    x = x.subtract(p.divide(derivative)).precision(digits + 10);
                }
                new Apfloat(2, digits).divide(one.subtract(x.multiply(x)).multiply(derivative).multiply(derivative));
                sample++;
            }
            double apfloat = (System.nanoTime() - a0) / 1e3 / (2.0 * sample);
            row("W3", "Gauss-Legendre n = 100, " + t.format().name(), o, apfloat, sample);
        }
    }

    /** W4: Ai at 10^6 points on [−8, 4], binary32, as a whole process with a 512 MiB heap. */
    private static void w4(Path jar) throws IOException, InterruptedException {
        Path dir = Files.createTempDirectory("odetab-bench");
        Path spec = dir.resolve("w4.toml");
        Files.writeString(spec, String.join("\n",
                "title = \"W4: Ai at 10^6 points on [-8, 4], binary32\"",
                "[functions.ai]", "family = \"airy-ai\"",
                "[tables.w4]", "function = \"ai\"", "grid = { from = \"-8\", to = \"4\", step = \"12/999999\" }",
                "columns = [\"x\", \"value\"]", "format = \"binary32\"", "outputs = [\"csv\"]", ""));
        ProcessBuilder pb = new ProcessBuilder("java", "-Xmx512m", "-jar", jar.toString(), "build", spec.toString(), "--out",
                dir.resolve("out").toString());
        pb.redirectErrorStream(true);
        pb.redirectOutput(dir.resolve("log.txt").toFile());
        long w0 = System.nanoTime();
        Process p = pb.start();
        long peakKb = 0;
        Path status = Path.of("/proc/" + p.pid() + "/status");
        while (p.isAlive()) {
            try {
                for (String line : Files.readAllLines(status)) {
                    if (line.startsWith("VmHWM:")) {
                        peakKb = Math.max(peakKb, Long.parseLong(line.replaceAll("[^0-9]", "")));
                    }
                }
            } catch (IOException gone) {
                // the process ended between the check and the read
            }
            Thread.sleep(20);
        }
        double seconds = (System.nanoTime() - w0) / 1e9;
        int exit = p.exitValue();
        long lines;
        try (var s = Files.lines(dir.resolve("out").resolve("w4.csv"))) {
            lines = s.count();
        } catch (IOException e) {
            lines = -1;
        }
        int sample = 0;
        long a0 = System.nanoTime();
        for (int i = 0; i <= 999999; i += 100000) {
            Rational xr = Rational.of(-8).add(Rational.of(12L * i, 999999));
            if (xr.isZero()) {
                continue;
            }
            ApfloatMath.airyAi(exact(xr, 12));
            sample++;
        }
        double apfloat = (System.nanoTime() - a0) / 1e3 / sample;
        double perEntry = seconds * 1e6 / 1e6;
        System.out.printf(Locale.ROOT, "%-4s %-34s %9d %12s %12.3f %12s %14.1f %9.0f   (whole process: %.1f s, exit %d, peak RSS %d MiB,"
                + " %d CSV lines; apfloat on %d points)%n", "W4", "Ai on [-8, 4], 10^6 points, binary32", 1000000L, "-", perEntry, "-",
                apfloat, apfloat / perEntry, seconds, exit, peakKb / 1024, lines, sample);
    }
}
