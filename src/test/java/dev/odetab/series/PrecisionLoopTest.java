package dev.odetab.series;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.odetab.numeric.Ball;
import dev.odetab.numeric.DecimalDigits;
import dev.odetab.numeric.Format;
import dev.odetab.numeric.Rational;
import dev.odetab.ode.FunctionDef;
import dev.odetab.ode.family.Airy;
import java.math.BigDecimal;
import java.math.MathContext;
import java.math.RoundingMode;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.junit.jupiter.api.Test;

/**
 * The one precision driver: its starting rule, the batch form (only the undecided items are
 * walked again, at doubled precision), the single-value form against outside digits, and the
 * cap exception.
 */
class PrecisionLoopTest {
    @Test
    void startingRuleIsTheFormatsBitsPlusGuardBits() {
        assertEquals(53, Format.parse("binary64").significantBits());
        assertEquals(93, PrecisionLoop.chooseStartBits(Format.parse("binary64")));
        assertEquals(107 + 40, PrecisionLoop.chooseStartBits(Format.parse("double-double")));
        // 40 digits carry ceil(40 · log2 10) + 1 = 134 bits
        assertEquals(134 + 40, PrecisionLoop.chooseStartBits(Format.parse("decimal:40")));
        assertEquals(16 + 40, PrecisionLoop.chooseStartBits(Format.parse("fixed:s16.15")));
    }

    @Test
    void batchRewalksOnlyTheUndecidedItems() throws Exception {
        // item k is decided once the precision reaches 100·k bits
        List<List<Integer>> asked = new ArrayList<>();
        List<Integer> precs = new ArrayList<>();
        int last = PrecisionLoop.runBatch(List.of(1, 2, 3, 4, 5), (pending, prec) -> {
            asked.add(pending);
            precs.add(prec);
            return pending.stream().filter(k -> 100 * k > prec).toList();
        }, 100, 4096, still -> "unused");
        assertEquals(List.of(List.of(1, 2, 3, 4, 5), List.of(2, 3, 4, 5), List.of(3, 4, 5), List.of(5)), asked);
        assertEquals(List.of(100, 200, 400, 800), precs);
        assertEquals(800, last);
    }

    @Test
    void batchAtTheCapThrowsTheOneCapExceptionNamingWhatIsLeft() {
        List<Integer> precs = new ArrayList<>();
        PrecisionCapException e = assertThrows(PrecisionCapException.class, () -> PrecisionLoop.runBatch(List.of(7, 8, 9),
                (pending, prec) -> {
                    precs.add(prec);
                    return pending.stream().filter(k -> k != 8).toList();
                }, 100, 300, still -> "the precision cap of 300 bits cannot decide " + still));
        assertEquals(List.of(100, 200, 300), precs);
        assertEquals("the precision cap of 300 bits cannot decide [7, 9]", e.getMessage());
        assertEquals(300, e.capBits());
        assertEquals(null, e.lastEnclosure());
    }

    @Test
    void aStartAboveTheCapIsClampedToIt() {
        List<Integer> precs = new ArrayList<>();
        assertThrows(PrecisionCapException.class, () -> PrecisionLoop.runBatch(List.of(1), (pending, prec) -> {
            precs.add(prec);
            return pending;
        }, 93, 64, still -> "cap"));
        assertEquals(List.of(64), precs);
    }

    @Test
    void singleValueAtTheCapKeepsItsLastEnclosure() {
        Ball wide = Ball.of(BigDecimal.ONE, new BigDecimal("0.5"));
        PrecisionCapException e = assertThrows(PrecisionCapException.class,
                () -> PrecisionLoop.run(prec -> wide, b -> Optional.empty(), 53, 93, 200));
        assertEquals(200, e.capBits());
        assertSame(wide, e.lastEnclosure());
        assertTrue(e.getMessage().startsWith("the precision cap of 200 bits was reached before the rounding could be decided"),
                e.getMessage());
    }

    @Test
    void singleValueDecidesAiryAgainstApfloatDigits() throws Exception {
        // Ai(−12) from reference-data/airy-apfloat-1.15.0.csv (apfloat 1.15.0, 80 digits), to 40 digits
        BigDecimal ai = new BigDecimal("-0.066555175054373129474189662359596526307870406001620453862969737921424387147006257");
        FunctionDef f = Airy.ai().define(Map.of());
        Start start = Start.of(f);
        PrecisionLoop.Outcome<BigDecimal> out = PrecisionLoop.run(prec -> Continuation.evaluate(start, Rational.of(-12), prec).jet().value(),
                b -> DecimalDigits.round(b, 40), 134, 166, 4096);
        assertEquals(ai.round(new MathContext(40, RoundingMode.HALF_EVEN)), out.result());
        // and the deciding enclosure contains the reference, up to half a unit of its 80th digit
        assertTrue(out.enclosure().addError(new BigDecimal("5e-82")).contains(ai), out.enclosure().toString());
    }
}
