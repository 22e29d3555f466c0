package dev.odetab.numeric;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.math.BigDecimal;
import java.math.BigInteger;
import java.util.Random;
import java.util.function.Function;
import org.apfloat.Apfloat;
import org.apfloat.ApfloatMath;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/**
 * Containment of independent reference values (apfloat 1.15.0, DLMF identities) in the balls of
 * {@link BallFunctions}, tightness of those balls, wide input balls and error cases.
 */
class BallFunctionsTest {
    /**
     * Extra decimal digits for the apfloat reference, so that its error is far below the
     * widening of {@link #assertEncloses}. apfloat also lowers the precision of a result by the
     * digits lost to cancellation (log near 1, exp of a large argument); inputs therefore get
     * their own digit count on top ({@code d + x.precision()}).
     */
    private static final int REFERENCE_EXTRA_DIGITS = 25;

    private static long referenceDigits(int precBits) {
        return Precision.digits10(precBits) + REFERENCE_EXTRA_DIGITS;
    }

    private static Apfloat ap(String exactDecimal, long digits) {
        return new Apfloat(exactDecimal, digits);
    }

    private static Apfloat apRational(long num, long den, long digits) {
        return new Apfloat(num, digits).divide(new Apfloat(den, digits));
    }

    private static BigDecimal toBigDecimal(Apfloat a) {
        return new BigDecimal(a.toString(false));
    }

    /**
     * The reference value (relative error far below 10^-(digits+15) at the precision it was
     * computed with) lies in the ball widened by |value|·10^-(digits+15), and the ball is tight:
     * rad &lt;= |value|·2^-(precBits-8).
     */
    private static void assertEncloses(String what, Ball ball, Apfloat reference, int precBits) {
        BigDecimal value = toBigDecimal(reference);
        int digits = Precision.digits10(precBits);
        BigDecimal widening = value.abs().movePointLeft(digits + 15);
        assertTrue(ball.addError(widening).contains(value),
                () -> what + " at " + precBits + " bits: " + ball + " does not contain " + value);
        assertTight(what, ball, value, precBits);
    }

    private static void assertTight(String what, Ball ball, BigDecimal value, int precBits) {
        BigDecimal allowed = value.abs().divide(new BigDecimal(BigInteger.TWO.pow(precBits - 8)));
        assertTrue(ball.rad().compareTo(allowed) <= 0,
                () -> what + " at " + precBits + " bits is not tight: radius " + ball.rad()
                        + " > |value|·2^-" + (precBits - 8) + " = " + allowed.round(new java.math.MathContext(5)));
    }

    /** The reference value lies in the ball (widened as above); no tightness claim (wide inputs). */
    private static void assertContains(String what, Ball ball, Apfloat reference, int precBits) {
        BigDecimal value = toBigDecimal(reference);
        BigDecimal widening = value.abs().movePointLeft(Precision.digits10(precBits) + 15);
        assertTrue(ball.addError(widening).contains(value),
                () -> what + " at " + precBits + " bits: " + ball + " does not contain " + value);
    }

    // ---------------------------------------------------------------- constants and roots

    @ParameterizedTest
    @ValueSource(ints = {64, 200, 1000})
    void piContainsApfloatPi(int precBits) {
        // apfloat 1.15.0 ApfloatMath.pi
        assertEncloses("pi", BallFunctions.pi(precBits), ApfloatMath.pi(referenceDigits(precBits)), precBits);
    }

    @Test
    void cosineContainsApfloatsValue() {
        // apfloat 1.15.0 ApfloatMath.cos at 80 digits; the points include π-multiples built in ball arithmetic.
        for (String xs : new String[] {"0", "1e-20", "0.5", "-1.25", "3", "7.9"}) {
            for (int bits : new int[] {64, 300}) {
                Ball b = BallFunctions.cos(Ball.exact(new BigDecimal(xs)), bits);
                BigDecimal ref = new BigDecimal(ApfloatMath.cos(new Apfloat(new BigDecimal(xs), 100)).toString(true));
                assertTrue(b.addError(new BigDecimal("1e-95")).contains(ref), "cos(" + xs + ") = " + ref + " not in " + b);
                assertTrue(b.rad().compareTo(BigDecimal.ONE.scaleByPowerOfTen(-(int) (bits * 0.3) + 2)) < 0, "too wide: " + b);
            }
        }
        // cos(π/3) = 1/2 (DLMF 4.16.1 table of special values) through a ball for π
        Ball third = BallFunctions.cos(BallFunctions.pi(200).divide(Ball.exact(3), 200), 200);
        assertTrue(third.contains(new BigDecimal("0.5")), third.toString());
        assertThrows(ArithmeticException.class, () -> BallFunctions.cos(Ball.exact(9), 64));
    }

    @Test
    void piAtDifferentPrecisionsOverlaps() {
        assertTrue(BallFunctions.pi(64).overlaps(BallFunctions.pi(1000)));
        assertTrue(BallFunctions.pi(1000).rad().compareTo(BallFunctions.pi(64).rad()) < 0);
    }

    @ParameterizedTest
    @ValueSource(ints = {64, 200, 1000})
    void rootsContainApfloatRoots(int precBits) {
        long d = referenceDigits(precBits);
        // apfloat 1.15.0 ApfloatMath.sqrt
        assertEncloses("sqrt(2)", BallFunctions.sqrt(Ball.exact(2), precBits), ApfloatMath.sqrt(ap("2", d)), precBits);
        // apfloat 1.15.0 ApfloatMath.root: 9^(1/3) = 3^(2/3)
        Apfloat cbrt9 = ApfloatMath.root(ap("9", d), 3);
        assertEncloses("cbrt(9)", BallFunctions.root(Ball.exact(9), 3, precBits), cbrt9, precBits);
        assertEncloses("3^(2/3)", BallFunctions.pow(Ball.exact(3), Rational.of(2, 3), precBits), cbrt9, precBits);
        // odd root of a negative number: (-9)^(1/3) = -9^(1/3)
        assertEncloses("cbrt(-9)", BallFunctions.root(Ball.exact(-9), 3, precBits), cbrt9.negate(), precBits);
        // apfloat 1.15.0 ApfloatMath.sqrt on a tiny and a huge argument
        assertEncloses("sqrt(7e-301)", BallFunctions.sqrt(Ball.exact(new BigDecimal("7e-301")), precBits),
                ApfloatMath.sqrt(ap("7e-301", d)), precBits);
        assertEncloses("sqrt(3e200)", BallFunctions.sqrt(Ball.exact(new BigDecimal("3e200")), precBits),
                ApfloatMath.sqrt(ap("3e200", d)), precBits);
    }

    @Test
    void rootOfPerfectPowerIsTightAroundTheExactRoot() {
        // 1.21^(1/2) = 1.1 and 1.331^(1/3) = 1.1 exactly
        Ball s = BallFunctions.sqrt(Ball.exact(new BigDecimal("1.21")), 200);
        Ball c = BallFunctions.root(Ball.exact(new BigDecimal("1.331")), 3, 200);
        assertTrue(s.contains(new BigDecimal("1.1")), s::toString);
        assertTrue(c.contains(new BigDecimal("1.1")), c::toString);
        assertTight("sqrt(1.21)", s, new BigDecimal("1.1"), 200);
        assertEquals(Ball.ZERO, BallFunctions.sqrt(Ball.ZERO, 64));
    }

    @ParameterizedTest
    @ValueSource(ints = {64, 200, 1000})
    void powersContainApfloatPowers(int precBits) {
        long d = referenceDigits(precBits);
        // apfloat 1.15.0 ApfloatMath.pow with an exact rational exponent evaluated in apfloat
        assertEncloses("2.5^(-7/4)", BallFunctions.pow(Ball.exact(new BigDecimal("2.5")), Rational.of(-7, 4), precBits),
                ApfloatMath.pow(ap("2.5", d), apRational(-7, 4, d)), precBits);
        assertEncloses("(-2)^(5/3)", BallFunctions.pow(Ball.exact(-2), Rational.of(5, 3), precBits),
                ApfloatMath.root(ap("-32", d), 3), precBits);
        assertEncloses("0.3^(123/1000)", BallFunctions.pow(Ball.exact(new BigDecimal("0.3")), Rational.of(123, 1000), precBits),
                ApfloatMath.pow(ap("0.3", d), ap("0.123", d)), precBits);
        assertEncloses("1.7^1.3 (ball exponent)",
                BallFunctions.pow(Ball.exact(new BigDecimal("1.7")), Ball.exact(new BigDecimal("1.3")), precBits),
                ApfloatMath.pow(ap("1.7", d), ap("1.3", d)), precBits);
        // exact integer exponent ball: (-1.5)^(-3) = -8/27
        Ball cube = BallFunctions.pow(Ball.exact(new BigDecimal("-1.5")), Ball.exact(-3), precBits);
        assertTrue(cube.contains(Rational.of(-8, 27)), cube::toString);
    }

    // ---------------------------------------------------------------- exp and log

    private static final String[] EXP_POINTS = {
        "1e-30", "-1e-300", "0.5", "-7.25", "1", "30.000001", "-1000", "1000", "12345.678",
    };

    @ParameterizedTest
    @ValueSource(ints = {64, 200, 1000})
    void expContainsApfloatExp(int precBits) {
        // apfloat 1.15.0 ApfloatMath.exp
        assertPointsEnclosed("exp", EXP_POINTS, x -> BallFunctions.exp(x, precBits), ApfloatMath::exp, precBits);
        assertEquals(Ball.ONE, BallFunctions.exp(Ball.ZERO, precBits));
    }

    private static final String[] LOG_POINTS = {
        "1e-30", "0.5", "0.999999", "1.0000000000000000000000001", "2", "7.25", "1e300", "123456789.123456789",
    };

    @ParameterizedTest
    @ValueSource(ints = {64, 200, 1000})
    void logContainsApfloatLog(int precBits) {
        // apfloat 1.15.0 ApfloatMath.log
        assertPointsEnclosed("log", LOG_POINTS, x -> BallFunctions.log(x, precBits), ApfloatMath::log, precBits);
    }

    private static void assertPointsEnclosed(String name, String[] exactPoints, Function<Ball, Ball> f,
            Function<Apfloat, Apfloat> reference, int precBits) {
        long d = referenceDigits(precBits);
        for (String x : exactPoints) {
            BigDecimal exact = new BigDecimal(x);
            assertEncloses(name + "(" + x + ")", f.apply(Ball.exact(exact)),
                    reference.apply(ap(x, d + exact.precision())), precBits);
        }
    }

    @Test
    void expOfLogContainsTheArgument() {
        for (String x : new String[] {"0.001", "3", "1e50"}) {
            BigDecimal v = new BigDecimal(x);
            Ball back = BallFunctions.exp(BallFunctions.log(Ball.exact(v), 200), 200);
            assertTrue(back.contains(v), () -> "exp(log(" + x + ")) = " + back);
        }
    }

    // ---------------------------------------------------------------- gamma

    @ParameterizedTest
    @ValueSource(ints = {64, 200, 1000})
    void gammaContainsReferenceValues(int precBits) {
        long d = referenceDigits(precBits);
        int inputBits = precBits + 20;
        // apfloat 1.15.0 ApfloatMath.gamma; the input ball encloses 1/3 at precBits+20 bits
        assertEncloses("gamma(1/3)", BallFunctions.gamma(Ball.of(Rational.of(1, 3), inputBits), precBits),
                ApfloatMath.gamma(apRational(1, 3, d)), precBits);
        assertEncloses("gamma(2/3)", BallFunctions.gamma(Ball.of(Rational.of(2, 3), inputBits), precBits),
                ApfloatMath.gamma(apRational(2, 3, d)), precBits);
        // DLMF 5.4.6: Γ(1/2) = √π, with √π from apfloat 1.15.0 ApfloatMath.sqrt and pi
        Apfloat sqrtPi = ApfloatMath.sqrt(ApfloatMath.pi(d));
        assertEncloses("gamma(1/2)", BallFunctions.gamma(Ball.exact(new BigDecimal("0.5")), precBits), sqrtPi, precBits);
        // DLMF 5.4.1: Γ(5) = 4! = 24
        Ball five = BallFunctions.gamma(Ball.exact(5), precBits);
        assertTrue(five.contains(BigDecimal.valueOf(24)), five::toString);
        assertTight("gamma(5)", five, BigDecimal.valueOf(24), precBits);
        // DLMF 5.4.6 with 5.5.1: Γ(−1/2) = Γ(1/2)/(−1/2) = −2√π
        assertEncloses("gamma(-1/2)", BallFunctions.gamma(Ball.exact(new BigDecimal("-0.5")), precBits),
                sqrtPi.multiply(new Apfloat(-2)), precBits);
        // apfloat 1.15.0 ApfloatMath.gamma
        for (String x : new String[] {"10.5", "0.1", "-2.75", "150.25"}) {
            assertEncloses("gamma(" + x + ")", BallFunctions.gamma(Ball.exact(new BigDecimal(x)), precBits),
                    ApfloatMath.gamma(ap(x, d)), precBits);
        }
    }

    @Test
    void gammaRecurrenceHoldsAsOverlap() {
        // DLMF 5.5.1: Γ(x+1) = x Γ(x)
        BigDecimal x = new BigDecimal("3.1415");
        Ball gx = BallFunctions.gamma(Ball.exact(x), 200);
        Ball gx1 = BallFunctions.gamma(Ball.exact(x.add(BigDecimal.ONE)), 200);
        assertTrue(gx.multiply(Ball.exact(x), 200).overlaps(gx1), () -> gx + " * x vs " + gx1);
    }

    // ---------------------------------------------------------------- wide input balls

    private static void assertContainsBothEnds(String name, Ball x, Function<Ball, Ball> f,
            Function<Apfloat, Apfloat> reference, int precBits) {
        Ball y = f.apply(x);
        long d = referenceDigits(precBits);
        for (BigDecimal end : new BigDecimal[] {x.lower(), x.upper()}) {
            Apfloat ref = reference.apply(ap(end.toPlainString(), d + end.precision()));
            assertContains(name + " over " + x + " at the end " + end.toPlainString(), y, ref, precBits);
        }
    }

    @Test
    void wideBallsContainTheImagesOfTheirEnds() {
        int p = 128;
        Ball x = Ball.of(new BigDecimal("1.3"), new BigDecimal("0.01"));
        assertContainsBothEnds("exp", x, b -> BallFunctions.exp(b, p), ApfloatMath::exp, p);
        assertContainsBothEnds("exp", Ball.of(new BigDecimal("-3"), new BigDecimal("2.5")),
                b -> BallFunctions.exp(b, p), ApfloatMath::exp, p);
        assertContainsBothEnds("log", x, b -> BallFunctions.log(b, p), ApfloatMath::log, p);
        assertContainsBothEnds("sqrt", x, b -> BallFunctions.sqrt(b, p), ApfloatMath::sqrt, p);
        assertContainsBothEnds("cbrt", Ball.of(new BigDecimal("-0.5"), new BigDecimal("1")),
                b -> BallFunctions.root(b, 3, p), a -> cbrt(a), p);
        assertContainsBothEnds("gamma", Ball.of(new BigDecimal("2.5"), new BigDecimal("0.1")),
                b -> BallFunctions.gamma(b, p), ApfloatMath::gamma, p);
        assertContainsBothEnds("gamma", Ball.of(new BigDecimal("0.3"), new BigDecimal("0.01")),
                b -> BallFunctions.gamma(b, p), ApfloatMath::gamma, p);
        assertContainsBothEnds("gamma", Ball.of(new BigDecimal("-2.5"), new BigDecimal("0.1")),
                b -> BallFunctions.gamma(b, p), ApfloatMath::gamma, p);
        assertContainsBothEnds("pow", x, b -> BallFunctions.pow(b, Ball.exact(new BigDecimal("2.5")), p),
                a -> ApfloatMath.pow(a, new Apfloat("2.5", a.precision())), p);
        // a base ball touching 0 with a positive exponent of large denominator: [0, 0.5^(1/20)]
        Ball touching = BallFunctions.pow(Ball.fromEndpoints(BigDecimal.ZERO, new BigDecimal("0.5")), Rational.of(1, 20), p);
        assertTrue(touching.contains(BigDecimal.ZERO), touching::toString);
        assertContains("0.5^(1/20)", touching,
                ApfloatMath.root(ap("0.5", referenceDigits(p)), 20), p);
        // a ball around the minimum of Γ on (0, ∞) at 1.4616…: both ends and the minimum
        Ball aroundMin = Ball.of(new BigDecimal("1.45"), new BigDecimal("0.2"));
        assertContainsBothEnds("gamma", aroundMin, b -> BallFunctions.gamma(b, p), ApfloatMath::gamma, p);
        Ball g = BallFunctions.gamma(aroundMin, p);
        // Γ(1.46163 21449 68362 34126) = 0.88560 31944 10888 70027 88 (DLMF 5.4(iii))
        assertTrue(g.contains(new BigDecimal("0.8856031944108887")), g::toString);
    }

    private static Apfloat cbrt(Apfloat a) {
        return a.signum() < 0 ? ApfloatMath.root(a.negate(), 3).negate() : ApfloatMath.root(a, 3);
    }

    // ---------------------------------------------------------------- randomized

    @Test
    void randomExactInputsAgainstApfloat() {
        long seed = Long.parseLong(System.getProperty("test.seed", "20260101"));
        Random random = new Random(seed);
        int[] precisions = {64, 100, 160, 200};
        for (int i = 0; i < 120; i++) {
            int precBits = precisions[random.nextInt(precisions.length)];
            long d = referenceDigits(precBits);
            BigDecimal x;
            Ball result;
            Apfloat reference;
            String name;
            switch (i % 4) {
                case 0 -> {
                    name = "exp";
                    // |x| between about 10^-20 and 10^3
                    x = randomDecimal(random, 1, 12);
                    x = x.movePointLeft(x.precision() - 3 + random.nextInt(24));
                    x = random.nextBoolean() ? x : x.negate();
                    result = BallFunctions.exp(Ball.exact(x), precBits);
                    reference = ApfloatMath.exp(ap(x.toPlainString(), d + x.precision()));
                }
                case 1 -> {
                    name = "log";
                    x = randomDecimal(random, 1, 25).movePointLeft(random.nextInt(80) - 40);
                    result = BallFunctions.log(Ball.exact(x), precBits);
                    reference = ApfloatMath.log(ap(x.toPlainString(), d + x.precision()));
                }
                case 2 -> {
                    name = "sqrt";
                    x = randomDecimal(random, 1, 25).movePointLeft(random.nextInt(80) - 40);
                    result = BallFunctions.sqrt(Ball.exact(x), precBits);
                    reference = ApfloatMath.sqrt(ap(x.toPlainString(), d + x.precision()));
                }
                default -> {
                    name = "gamma";
                    x = randomDecimal(random, 2, 6).movePointLeft(4).subtract(BigDecimal.TEN);
                    if (x.signum() <= 0 && x.stripTrailingZeros().scale() <= 0) {
                        x = x.add(new BigDecimal("0.5"));
                    }
                    result = BallFunctions.gamma(Ball.exact(x), precBits);
                    reference = ApfloatMath.gamma(ap(x.toPlainString(), d + x.precision()));
                }
            }
            String what = name + "(" + x.toPlainString() + ") [test.seed=" + seed + ", case " + i + "]";
            assertEncloses(what, result, reference, precBits);
        }
    }

    /** A positive decimal with between minDigits and maxDigits digits (not all zero). */
    private static BigDecimal randomDecimal(Random random, int minDigits, int maxDigits) {
        int n = minDigits + random.nextInt(maxDigits - minDigits + 1);
        StringBuilder sb = new StringBuilder();
        for (int k = 0; k < n; k++) {
            sb.append((char) ('0' + (k == 0 ? 1 + random.nextInt(9) : random.nextInt(10))));
        }
        return new BigDecimal(sb.toString());
    }

    // ---------------------------------------------------------------- errors

    @Test
    void domainErrorsThrowWithUsefulMessages() {
        assertMessage("log of a non-positive number", () -> BallFunctions.log(Ball.ZERO, 64));
        assertMessage("log of a non-positive number", () -> BallFunctions.log(Ball.exact(-1), 64));
        assertMessage("log of a number whose sign cannot be decided",
                () -> BallFunctions.log(Ball.of(new BigDecimal("0.1"), new BigDecimal("0.2")), 64));
        assertMessage("sqrt of a negative number", () -> BallFunctions.sqrt(Ball.exact(-2), 64));
        assertMessage("sqrt of a number whose sign cannot be decided",
                () -> BallFunctions.sqrt(Ball.of(new BigDecimal("0.1"), new BigDecimal("0.2")), 64));
        assertMessage("gamma has a pole at 0", () -> BallFunctions.gamma(Ball.ZERO, 64));
        assertMessage("gamma has a pole at -3", () -> BallFunctions.gamma(Ball.exact(-3), 64));
        assertMessage("gamma has a pole at -2",
                () -> BallFunctions.gamma(Ball.of(new BigDecimal("-2.1"), new BigDecimal("0.2")), 64));
        assertMessage("negative power", () -> BallFunctions.pow(Ball.ZERO, Rational.of(-1, 2), 64));
        assertMessage("exp argument too large", () -> BallFunctions.exp(Ball.exact(new BigDecimal("2e9")), 64));
    }

    private static void assertMessage(String expected, org.junit.jupiter.api.function.Executable call) {
        ArithmeticException e = assertThrows(ArithmeticException.class, call);
        assertTrue(e.getMessage().contains(expected), () -> "message '" + e.getMessage() + "' lacks '" + expected + "'");
    }
}
