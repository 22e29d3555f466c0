package dev.odetab.tables;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;

import dev.odetab.numeric.Format;
import dev.odetab.numeric.OutOfRange;
import dev.odetab.numeric.Rational;
import dev.odetab.numeric.RoundingMode;
import dev.odetab.ode.FunctionDef;
import dev.odetab.ode.family.Airy;
import dev.odetab.ode.family.HermiteFunction;
import java.math.BigDecimal;
import java.util.List;
import java.util.Map;
import org.apfloat.Apfloat;
import org.apfloat.ApfloatMath;
import org.junit.jupiter.api.Test;

/** Certified zeros (METHODS §6) against apfloat 1.15.0 root polishing and exact cases. */
class ZeroFinderTest {
    private static final long P = 60;

    private static TableResult zeros(FunctionDef f, String from, String to, int count, boolean ofDerivative, List<Column> cols,
            Format format) throws Exception {
        Grid.ZeroSearch z = new Grid.ZeroSearch(Rational.parse(from), Rational.parse(to), count, ofDerivative);
        return TableEvaluator.evaluate(new TableDef("z", f.name(), f, z, cols, format, RoundingMode.NEAREST_EVEN, OutOfRange.ERROR,
                4096, List.of("csv")));
    }

    @Test
    void firstZerosOfAiMatchApfloatPolishing() throws Exception {
        FunctionDef ai = Airy.ai().define(Map.of());
        TableResult r = zeros(ai, "0", "-20", 6, false, List.of(Column.parse("x"), Column.parse("derivative")), Format.BinaryFormat.BINARY64);
        assertEquals(6, r.rows().size());
        for (int k = 0; k < 6; k++) {
            // Newton's method in apfloat from odetab's zero: x ← x − Ai(x)/Ai'(x), 50-digit agreement
            Apfloat x = new Apfloat(new BigDecimal(r.rows().get(k).entries().get(0).value().toBigDecimalExact().toPlainString()), P);
            for (int it = 0; it < 6; it++) {
                x = x.subtract(ApfloatMath.airyAi(x).divide(ApfloatMath.airyAiPrime(x)));
            }
            BigDecimal ref = new BigDecimal(x.toString(true));
            BigDecimal slope = new BigDecimal(ApfloatMath.airyAiPrime(x).toString(true));
            assertEquals(Double.doubleToRawLongBits(ref.doubleValue()), r.rows().get(k).entries().get(0).bits().longValue(), "zero " + (k + 1));
            assertEquals(Double.doubleToRawLongBits(slope.doubleValue()), r.rows().get(k).entries().get(1).bits().longValue(), "Ai' at zero " + (k + 1));
            assertNull(r.rows().get(k).x(), "an Airy zero is irrational");
        }
        // DLMF 9.9 (from memory): a_1 = −2.33810741045976703849, the first zero of Ai.
        assertEquals(-2.338107410459767, r.rows().get(0).entries().get(0).value().doubleEstimate());
    }

    @Test
    void oddFunctionHasItsZeroExactlyAtTheNormalizationPoint() throws Exception {
        // ψ_3 is odd (DLMF 18.6.1 parity): zeros 0 and ±sqrt(3/2) (H_3 = 8x³ − 12x, DLMF 18.5.13 / Table 18.3.1)
        FunctionDef h3 = new HermiteFunction().define(Map.of("n", Rational.of(3)));
        TableResult r = zeros(h3, "-5", "5", 0, false, List.of(Column.parse("x")), Format.BinaryFormat.BINARY32);
        assertEquals(3, r.rows().size());
        assertEquals(Rational.ZERO, r.rows().get(1).x());
        float s = (float) Math.sqrt(1.5);
        assertEquals(Float.floatToRawIntBits(-s), r.rows().get(0).entries().get(0).bits().intValue());
        assertEquals(Float.floatToRawIntBits(s), r.rows().get(2).entries().get(0).bits().intValue());
    }

    @Test
    void anIntervalWithoutZerosGivesAnEmptyTable() throws Exception {
        // Ai > 0 on [0, ∞) (DLMF 9.9: all zeros of Ai are negative)
        FunctionDef ai = Airy.ai().define(Map.of());
        assertEquals(0, zeros(ai, "0", "3", 0, false, List.of(Column.parse("x")), Format.BinaryFormat.BINARY64).rows().size());
    }
}
