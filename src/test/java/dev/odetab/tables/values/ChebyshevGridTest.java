package dev.odetab.tables.values;

import dev.odetab.tables.Column;
import dev.odetab.tables.Grid;
import dev.odetab.tables.TableDef;
import dev.odetab.tables.TableKind;
import dev.odetab.tables.TableEvaluator;
import dev.odetab.tables.TableResult;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;

import dev.odetab.numeric.Format;
import dev.odetab.numeric.Rational;
import dev.odetab.numeric.Target;
import dev.odetab.ode.FunctionDef;
import dev.odetab.ode.family.HermiteFunction;
import java.math.BigDecimal;
import java.util.List;
import java.util.Map;
import org.apfloat.Apfloat;
import org.apfloat.ApfloatMath;
import org.junit.jupiter.api.Test;

/**
 * Tables on Chebyshev nodes (irrational points): the node column and the values must equal
 * apfloat 1.15.0 (ApfloatMath.cos, hermiteH) at 60 digits rounded by Java's correctly rounded
 * BigDecimal.doubleValue (Java SE API).
 */
class ChebyshevGridTest {
    private static final long P = 60;

    @Test
    void nodesAndValuesAreCorrectlyRounded() throws Exception {
        FunctionDef psi3 = new HermiteFunction().define(Map.of("n", Rational.of(3)));
        for (int kind : new int[] {1, 2}) {
            Grid.Chebyshev grid = new Grid.Chebyshev(kind, 9, Rational.of(-3), Rational.of(5));
            TableDef t = new TableDef("cheb", "psi3", psi3, new TableKind.Values(grid), List.of(Column.parse("x"), Column.parse("value")), Target.nearest(Format.BinaryFormat.BINARY64), 4096, List.of("csv"));
            TableResult r = TableEvaluator.evaluate(t);
            Apfloat pi = ApfloatMath.pi(P);
            for (int i = 0; i < 9; i++) {
                int k = 9 - i;
                // x_k = 1 + 4 cos(θ_k), θ_k = (2k−1)π/18 (first kind) or (k−1)π/8 (second kind)
                Apfloat theta = kind == 1 ? pi.multiply(new Apfloat(2 * k - 1, P)).divide(new Apfloat(18, P))
                        : pi.multiply(new Apfloat(k - 1, P)).divide(new Apfloat(8, P));
                Apfloat x = new Apfloat(1, P).add(new Apfloat(4, P).multiply(ApfloatMath.cos(theta)));
                Apfloat norm = ApfloatMath.sqrt(new Apfloat(48, P).multiply(ApfloatMath.sqrt(pi)));
                Apfloat v = ApfloatMath.hermiteH(new Apfloat(3, P), x).multiply(ApfloatMath.exp(x.multiply(x).negate().divide(new Apfloat(2, P))))
                        .divide(norm);
                double xd = new BigDecimal(x.toString(true)).doubleValue();
                double vd = new BigDecimal(v.toString(true)).doubleValue();
                var row = r.rows().get(i);
                String what = "kind " + kind + ", node " + i;
                assertEquals(Double.doubleToRawLongBits(xd), row.entries().get(0).bits().longValue(), what + " x");
                assertEquals(Double.doubleToRawLongBits(vd), row.entries().get(1).bits().longValue(), what + " value");
            }
        }
    }

    @Test
    void nivenNodesAreExact() {
        // cos(π/2) = 0 and cos(π/3) = 1/2 exactly (Niven's theorem): the middle node of an odd first-kind
        // grid and the ends of a second-kind grid are exact rationals; the others are irrational.
        Grid.Chebyshev first = new Grid.Chebyshev(1, 3, Rational.of(-1), Rational.ONE);
        assertEquals(Rational.ZERO, first.exactPoint(1));
        assertNull(first.exactPoint(0));
        Grid.Chebyshev second = new Grid.Chebyshev(2, 4, Rational.of(-1), Rational.ONE);
        assertEquals(Rational.of(-1), second.exactPoint(0));
        assertEquals(Rational.of(-1, 2), second.exactPoint(1));
        assertEquals(Rational.ONE, second.exactPoint(3));
    }
}
