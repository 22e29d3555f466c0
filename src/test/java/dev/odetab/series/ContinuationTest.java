package dev.odetab.series;

import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.odetab.expr.Poly;
import dev.odetab.numeric.Ball;
import dev.odetab.numeric.Rational;
import dev.odetab.ode.Equation;
import java.math.BigDecimal;
import org.apfloat.Apfloat;
import org.apfloat.ApfloatMath;
import org.junit.jupiter.api.Test;

/**
 * The series engine on its own: the state at 0 is taken from apfloat (a ball of radius
 * 10^-95 around its 110-digit value), then continued by the engine; the result must contain
 * apfloat's value at the target (apfloat 1.15.0, ApfloatMath.airyAi / airyAiPrime).
 */
class ContinuationTest {
    private static final Equation AIRY = new Equation(Poly.ONE, Poly.ZERO, Poly.X.negate());

    private static Ball around(Apfloat v) {
        return Ball.of(new BigDecimal(v.toString(true)), new BigDecimal("1e-95"));
    }

    @Test
    void airyAiAtSeveralPointsIsEnclosed() {
        // DLMF 9.2.3, 9.2.4: Ai(0) = 1/(3^(2/3) Γ(2/3)), Ai'(0) = −1/(3^(1/3) Γ(1/3)), with apfloat's gamma.
        Apfloat one = new Apfloat(1, 110);
        Apfloat three = new Apfloat(3, 110);
        Apfloat ai0 = one.divide(ApfloatMath.cbrt(new Apfloat(9, 110)).multiply(ApfloatMath.gamma(new Apfloat(2, 110).divide(three))));
        Apfloat aip0 = one.divide(ApfloatMath.cbrt(three).multiply(ApfloatMath.gamma(one.divide(three)))).negate();
        Jet start = new Jet(around(ai0), around(aip0));
        for (String xs : new String[] {"1/3", "-7.25", "5", "-12", "8", "0.001"}) {
            Rational x = Rational.parse(xs);
            Continuation.Result r = Continuation.evaluate(AIRY, Rational.ZERO, start, x, 200);
            Apfloat ax = new Apfloat(new BigDecimal(x.numerator()), 80).divide(new Apfloat(new BigDecimal(x.denominator()), 80));
            BigDecimal ai = new BigDecimal(ApfloatMath.airyAi(ax).toString(true));
            BigDecimal aip = new BigDecimal(ApfloatMath.airyAiPrime(ax).toString(true));
            Ball v = r.jet().value();
            Ball d = r.jet().derivative();
            System.out.printf("x=%s steps=%d terms=%d rad=%s drad=%s%n", xs, r.steps(), r.terms(), v.rad(), d.rad());
            assertTrue(v.addError(ai.ulp().multiply(BigDecimal.TEN)).contains(ai), "Ai(" + xs + ") = " + ai + " not in " + v);
            assertTrue(d.addError(aip.ulp().multiply(BigDecimal.TEN)).contains(aip), "Ai'(" + xs + ") = " + aip + " not in " + d);
            assertTrue(v.rad().compareTo(ai.abs().scaleByPowerOfTen(-40)) < 0, "too wide at " + xs + ": " + v);
        }
    }
}
