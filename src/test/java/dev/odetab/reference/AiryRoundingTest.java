package dev.odetab.reference;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.odetab.numeric.Entry;
import dev.odetab.numeric.Format;
import dev.odetab.numeric.Rational;
import dev.odetab.numeric.RoundingMode;
import dev.odetab.numeric.Target;
import dev.odetab.ode.FunctionDef;
import dev.odetab.ode.family.Airy;
import dev.odetab.tables.Column;
import dev.odetab.tables.Grid;
import dev.odetab.tables.TableDef;
import dev.odetab.tables.TableKind;
import dev.odetab.tables.TableEvaluator;
import dev.odetab.tables.TableResult;
import java.math.BigDecimal;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;

/**
 * Ai, Ai', Bi, Bi' at the 501 points x = −30 + 9i/100 of reference-data/airy-apfloat-1.15.0.csv
 * (apfloat 1.15.0 at 80 digits): odetab's binary64 and binary32 entries equal the reference
 * rounded by an independent path, Java's correctly rounded BigDecimal.doubleValue/floatValue
 * (Java SE API, round half to even); the {@code down} entry never exceeds the reference and the
 * {@code up} entry is never below it (IEEE 754-2019 §4.3.2).
 */
class AiryRoundingTest {
    private static TableResult table(FunctionDef f, Format format, RoundingMode mode) throws Exception {
        Grid grid = new Grid.Uniform(Rational.of(-30), Rational.of(15), Rational.of(9, 100));
        return TableEvaluator.evaluate(new TableDef("airy", f.name(), f, new TableKind.Values(grid), List.of(Column.parse("value"), Column.parse("derivative")), Target.of(format, mode), 8192, List.of("csv")));
    }

    @Test
    void binaryEntriesEqualTheIndependentlyRoundedReference() throws Exception {
        List<AiryReferenceData.Row> ref = AiryReferenceData.read();
        assertEquals(AiryReferenceData.COUNT, ref.size());
        int checked = 0;
        for (boolean bi : new boolean[] {false, true}) {
            FunctionDef f = (bi ? Airy.bi() : Airy.ai()).define(Map.of());
            TableResult b64 = table(f, Format.BinaryFormat.BINARY64, RoundingMode.NEAREST_EVEN);
            TableResult b32 = table(f, Format.BinaryFormat.BINARY32, RoundingMode.NEAREST_EVEN);
            TableResult down = table(f, Format.BinaryFormat.BINARY64, RoundingMode.DOWN);
            TableResult up = table(f, Format.BinaryFormat.BINARY32, RoundingMode.UP);
            for (int i = 0; i < ref.size(); i++) {
                AiryReferenceData.Row row = ref.get(i);
                assertEquals(0, row.x().compareTo(AiryReferenceData.point(i)), "reference row " + i);
                BigDecimal[] values = bi ? new BigDecimal[] {row.bi(), row.biPrime()} : new BigDecimal[] {row.ai(), row.aiPrime()};
                for (int c = 0; c < 2; c++) {
                    BigDecimal v = values[c];
                    String what = (bi ? "Bi" : "Ai") + (c == 1 ? "'" : "") + "(" + row.x() + ")";
                    assertEquals(Double.doubleToRawLongBits(v.doubleValue()), b64.rows().get(i).entries().get(c).bits().longValue(), what + " binary64");
                    assertEquals(Float.floatToRawIntBits(v.floatValue()), b32.rows().get(i).entries().get(c).bits().intValue(), what + " binary32");
                    // the reference has 80 digits: allow its own last-digit uncertainty
                    Rational tol = Rational.of(v.abs().scaleByPowerOfTen(-78));
                    Rational exactRef = Rational.of(v);
                    Entry d = down.rows().get(i).entries().get(c);
                    Entry u = up.rows().get(i).entries().get(c);
                    assertTrue(d.value().compareTo(exactRef.add(tol)) <= 0, what + ": down entry above the value");
                    assertTrue(u.value().compareTo(exactRef.subtract(tol)) >= 0, what + ": up entry below the value");
                    checked++;
                }
            }
        }
        System.out.println("Airy rounding against apfloat 1.15.0 at 80 digits: " + checked + " values, binary64 and binary32, nearest, down and up");
    }
}
