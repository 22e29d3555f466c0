package dev.odetab.series;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.odetab.numeric.Ball;
import dev.odetab.numeric.DDBall;
import dev.odetab.numeric.Rational;
import dev.odetab.ode.FunctionDef;
import dev.odetab.ode.family.Airy;
import dev.odetab.ode.family.Catalog;
import java.io.IOException;
import java.math.BigDecimal;
import java.math.MathContext;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;

/**
 * The double-double walk against outside values: apfloat 1.15.0's Ai, Ai', Bi, Bi' at
 * x = −30 + 9i/100 (reference-data/airy-apfloat-1.15.0.csv, 80 digits), and against the
 * BigDecimal engine's own 256-bit enclosures (which must lie inside every fast ball).
 */
class FastWalkTest {
    private static Map<String, BigDecimal> reference() throws IOException {
        Map<String, BigDecimal> m = new HashMap<>();
        for (String line : Files.readAllLines(Path.of("reference-data/airy-apfloat-1.15.0.csv"))) {
            if (line.startsWith("#") || line.startsWith("function")) {
                continue;
            }
            String[] f = line.split(",");
            m.put(f[0] + " " + f[2] + " " + f[3], new BigDecimal(f[4]));
        }
        return m;
    }

    private static boolean contains(DDBall b, BigDecimal v, BigDecimal slack) {
        Ball big = b.toBall();
        return big.addError(slack).contains(v);
    }

    @Test
    void airyOnTheApfloatGridIsEnclosedAndNarrow() throws Exception {
        Map<String, BigDecimal> ref = reference();
        Rational h = Rational.of(9, 100);
        for (String name : List.of("airy-ai", "airy-bi")) {
            FunctionDef f = Catalog.lookup(name).orElseThrow().define(Map.of());
            // Runs of 12 points (about one unit, like the evaluator's chunks) from several starts.
            for (int first : new int[] {0, 111, 222, 300, 333, 350, 400}) {
                Rational x0 = Rational.of(-30).add(h.multiply(Rational.of(first)));
                Jet start = FunctionEvaluator.enclose(f, x0, 512).jet();
                DDBall[][] jets = FastWalk.walk(Airy.EQUATION, x0, start, h, 12);
                assertNotNull(jets);
                for (int k = 0; k < jets.length; k++) {
                    int i = first + k;
                    assertNotNull(jets[k], name + ": the walk stopped at point " + i);
                    String x = new BigDecimal(-30).add(new BigDecimal("0.09").multiply(BigDecimal.valueOf(i))).setScale(2).toPlainString();
                    BigDecimal v = ref.get(name + " " + x + " value");
                    BigDecimal d = ref.get(name + " " + x + " derivative");
                    BigDecimal slack = v.abs().add(d.abs()).scaleByPowerOfTen(-78);
                    assertTrue(contains(jets[k][0], v, slack), name + "(" + x + ") = " + v + " not in " + jets[k][0]);
                    assertTrue(contains(jets[k][1], d, slack), name + "'(" + x + ") = " + d + " not in " + jets[k][1]);
                    // Narrow enough to decide binary64 almost always: radius below 2^-80 of max(|y|, |y'|).
                    double size = Math.max(Math.abs(v.doubleValue()), Math.abs(d.doubleValue()));
                    assertTrue(jets[k][0].rad() < size * 0x1p-80, name + "(" + x + ") too wide: " + jets[k][0]);
                    assertTrue(jets[k][1].rad() < size * 0x1p-80, name + "'(" + x + ") too wide: " + jets[k][1]);
                }
            }
        }
    }

    @Test
    void everyFastBallContainsTheBigDecimalEnclosure() throws Exception {
        FunctionDef f = Catalog.lookup("airy-ai").orElseThrow().define(Map.of());
        Rational x0 = Rational.of(-10);
        Rational h = Rational.of(1, 5000);
        Jet start = FunctionEvaluator.enclose(f, x0, FastWalk.START_BITS).jet();
        DDBall[][] jets = FastWalk.walk(Airy.EQUATION, x0, start, h, 2001);
        for (int i = 0; i < jets.length; i += 250) {
            Rational x = x0.add(h.multiply(Rational.of(i)));
            Jet exact = FunctionEvaluator.enclose(f, x, 256).jet();
            Ball fast = jets[i][0].toBall();
            assertTrue(fast.contains(exact.value()), "Ai(" + x + "): " + exact.value() + " not inside " + fast);
            assertTrue(jets[i][1].toBall().contains(exact.derivative()), "Ai'(" + x + ")");
            assertTrue(fast.rad().compareTo(exact.value().mid().abs().multiply(new BigDecimal("1e-24"), MathContext.DECIMAL64)) < 0,
                    "fast ball too wide at " + x + ": " + fast);
        }
    }
}
