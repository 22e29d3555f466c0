package dev.odetab.series;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.odetab.numeric.Ball;
import dev.odetab.numeric.Rational;
import dev.odetab.ode.FunctionDef;
import dev.odetab.ode.family.Airy;
import java.io.IOException;
import java.math.BigDecimal;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Map;
import org.apfloat.Apfloat;
import org.apfloat.ApfloatMath;
import org.junit.jupiter.api.Test;

/**
 * The ordinary-point start against outside digits: Ai(0), Ai'(0) (DLMF 9.2.3–9.2.4) by apfloat
 * 1.15.0 at 80 digits, and the walk from the start to points of
 * reference-data/airy-apfloat-1.15.0.csv (80 significant digits, apfloat 1.15.0).
 */
class StartTest {
    private static final FunctionDef AI = Airy.ai().define(Map.of());

    private static BigDecimal decimal(Apfloat a) {
        return new BigDecimal(a.toString(true));
    }

    @Test
    void ordinaryStartEnclosesTheNormalizationConstants() throws Exception {
        // Ai(0) = 3^(−2/3)/Γ(2/3), Ai'(0) = −3^(−1/3)/Γ(1/3)
        Apfloat third = new Apfloat(1, 80).divide(new Apfloat(3, 80));
        Apfloat twoThirds = third.add(third);
        BigDecimal ai0 = decimal(ApfloatMath.pow(new Apfloat(3, 80), twoThirds.negate()).divide(ApfloatMath.gamma(twoThirds)));
        BigDecimal aip0 = decimal(ApfloatMath.pow(new Apfloat(3, 80), third.negate()).divide(ApfloatMath.gamma(third)).negate());
        Start start = Start.of(AI);
        assertEquals(Rational.ZERO, start.point());
        for (int bits : new int[] {64, 200}) {
            Jet j = start.jet(bits);
            // an 80-digit decimal is within 10^-79 relative of the constant: widen it by that much
            assertTrue(j.value().add(Ball.of(BigDecimal.ZERO, new BigDecimal("1e-80")), bits).contains(ai0), bits + ": " + j.value());
            assertTrue(j.derivative().add(Ball.of(BigDecimal.ZERO, new BigDecimal("1e-80")), bits).contains(aip0), bits + ": " + j.derivative());
        }
        // two precisions give overlapping enclosures, and a precision asked again is the same balls
        Jet lo = start.jet(64);
        Jet hi = start.jet(200);
        assertTrue(lo.value().overlaps(hi.value()) && lo.derivative().overlaps(hi.derivative()));
        assertTrue(hi.value().rad().compareTo(lo.value().rad()) < 0);
        assertSame(hi, start.jet(200));
    }

    @Test
    void walksFromTheStartEncloseApfloatValues() throws Exception {
        Start start = Start.of(AI);
        for (String xs : new String[] {"-30.00", "-12.00", "6.00", "15.00"}) {
            Jet j = Continuation.evaluate(start, Rational.parse(xs), 200).jet();
            BigDecimal[] want = reference(xs);
            assertTrue(j.value().add(Ball.of(BigDecimal.ZERO, ulp80(want[0])), 200).contains(want[0]), xs + ": " + j.value());
            assertTrue(j.derivative().add(Ball.of(BigDecimal.ZERO, ulp80(want[1])), 200).contains(want[1]), xs + ": " + j.derivative());
        }
    }

    /** Half a unit in the 80th significant digit of v: the rounding error of the published value. */
    private static BigDecimal ulp80(BigDecimal v) {
        return BigDecimal.ONE.movePointLeft(80 - (v.precision() - v.scale())).divide(BigDecimal.valueOf(2));
    }

    private static BigDecimal[] reference(String x) throws IOException {
        BigDecimal[] out = new BigDecimal[2];
        for (String line : Files.readAllLines(Path.of("reference-data/airy-apfloat-1.15.0.csv"), StandardCharsets.UTF_8)) {
            String[] f = line.split(",");
            if (f.length == 6 && f[0].equals("airy-ai") && f[2].equals(x)) {
                out[f[3].equals("value") ? 0 : 1] = new BigDecimal(f[4]);
            }
        }
        return out;
    }
}
