package dev.odetab.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

/** Bad input: exit code 2, one message that says where and what, never a stack trace. */
class BadInputTest {
    private static final String DIR = "src/test/resources/specs/";

    private static void expect(String message, String... args) {
        CliRunner.Result r = CliRunner.run(args);
        assertEquals(2, r.code(), "exit code for " + String.join(" ", args) + "; stderr: " + r.err());
        assertEquals("odetab: " + message + "\n", r.err());
        assertEquals("", r.out());
    }

    @Test
    void malformedExpressionInAParameter() {
        expect("argument 4 'n=1+', column 5: expected a number, a name or '(' after '+', found the end of the text",
                "eval", "hermite-function", "-p", "n=1+", "0.5");
    }

    @Test
    void malformedExpressionInASpec() {
        expect(DIR + "bad-value.toml:3:17: expected a number, a name or '(' after '+', found ')'",
                "eval", DIR + "bad-value.toml#f", "1");
    }

    @Test
    void nonLinearEquationInASpec() {
        expect(DIR + "bad-equation.toml:2:20: the equation must be linear in y: a product of two terms in y",
                "eval", DIR + "bad-equation.toml#f", "1");
    }

    @Test
    void singularNormalizationPoint() {
        expect(DIR + "singular-at.toml:3:1: x = 1 is a singular point of the equation (its coefficient of y'' vanishes there); choose an ordinary point",
                "eval", DIR + "singular-at.toml#p", "0.5");
    }

    @Test
    void unknownFamily() {
        expect("argument 2 'airy-aj', column 1: unknown function 'airy-aj'; did you mean 'airy-ai'? "
                + "(built-in families: airy-ai, airy-bi, hermite-h, hermite-he, hermite-function, legendre-p, legendre-q, chebyshev-t, "
                + "chebyshev-u, laguerre-l, gegenbauer-c, jacobi-p, weber-u; or SPEC#NAME for a spec function)",
                "eval", "airy-aj", "1");
    }

    @Test
    void unknownFamilyInASpec() {
        expect(DIR + "unknown-family.toml:2:1: unknown family 'hermite-functoin'; did you mean 'hermite-function'? "
                + "(known: airy-ai, airy-bi, hermite-h, hermite-he, hermite-function, legendre-p, legendre-q, chebyshev-t, "
                + "chebyshev-u, laguerre-l, gegenbauer-c, jacobi-p, weber-u)",
                "eval", DIR + "unknown-family.toml#f", "1");
    }

    @Test
    void unknownParameter() {
        expect("argument 4 'm=3', column 1: unknown parameter 'm' for hermite-function; did you mean 'n'? (its parameters: n)",
                "eval", "hermite-function", "-p", "m=3", "1");
    }

    @Test
    void parameterOutOfRange() {
        expect("argument 4 'n=-1', column 1: n = -1 is outside the allowed range: an integer 0 <= n <= 10000",
                "eval", "hermite-function", "-p", "n=-1", "1");
    }

    @Test
    void pointBeyondASingularPoint() {
        expect("x = 1 is a singular point of (-x^2 + 1)*y'' - 2*x*y' + 30*y = 0 and lies between 0 and 1.5; "
                + "a solution cannot be continued through it", "eval", DIR + "functions.toml#legendre5even", "3/2");
    }

    @Test
    void malformedPoint() {
        expect("argument 3 '1/3x', column 1: '1/3x' is not an exact decimal, hex float or rational (like -7.25, 1e-3, 0x1p-2 or 1/3)",
                "eval", "airy-ai", "1/3x");
    }

    @Test
    void anUnknownOptionAmongThePointsIsNamed() {
        expect("argument 4 '--digts', column 1: unknown option '--digts' (see odetab eval --help; a point is a number such as -1/3)",
                "eval", "airy-ai", "0", "--digts", "3");
    }

    /** Negative rationals and hex floats are points without '--', as the README writes them (issue 17, item 8). */
    @Test
    void negativePointsNeedNoDoubleDash() {
        CliRunner.Result plain = CliRunner.run("eval", "airy-ai", "0", "-1/3", "-0x1p-2", "-7.25", "--digits", "12");
        assertEquals(0, plain.code(), plain.err());
        CliRunner.Result dashed = CliRunner.run("eval", "--digits", "12", "airy-ai", "--", "0", "-1/3", "-0x1p-2", "-7.25");
        assertEquals(0, dashed.code(), dashed.err());
        assertEquals(dashed.out(), plain.out());
        assertEquals(4, plain.out().lines().count(), plain.out());
        CliRunner.Result first = CliRunner.run("eval", "airy-ai", "-1/3", "--format", "binary64");
        assertEquals(0, first.code(), first.err());
    }

    @Test
    void precisionRequestAboveTheCap() {
        expect("argument 4 '3000', column 1: --digits 3000 needs at least 9999 bits of working precision, "
                + "above the precision cap of 4096 bits (raise it with --precision-cap-bits)",
                "eval", "airy-ai", "--digits", "3000", "1");
    }

    @Test
    void pointWithAHugeExponentIsBadInputNamingTheArgument() {
        // was an internal error (exit 70): BigInteger would overflow supported range
        expect("argument 3 '1e999999999', column 1: '1e999999999' has an exponent beyond what odetab computes with "
                + "(at most 10^±100000, or the same range in a hex float)", "eval", "airy-ai", "1e999999999");
        expect("argument 3 '0x1p999999999', column 1: '0x1p999999999' has an exponent beyond what odetab computes with "
                + "(at most 10^±100000, or the same range in a hex float)", "eval", "airy-ai", "0x1p999999999");
        expect("argument 3 '1e99999999999', column 1: '1e99999999999' has an exponent beyond what odetab computes with "
                + "(at most 10^±100000, or the same range in a hex float)", "eval", "airy-ai", "1e99999999999");
    }

    @Test
    void roundingAndOutOfRangeAreCheckedWithoutAFormat() {
        expect("argument 5 'bogus', column 1: unknown rounding mode 'bogus'; expected one of " + dev.odetab.numeric.RoundingMode.validSpellings(),
                "eval", "airy-ai", "1", "--rounding", "bogus");
        expect("argument 5 'saturate', column 1: --out-of-range applies only with --format (--digits rounds to nearest, ties to even)",
                "eval", "airy-ai", "1", "--out-of-range", "saturate");
        expect("argument 5 'bogus', column 1: expected error or saturate, got 'bogus'",
                "eval", "airy-ai", "1", "--out-of-range", "bogus");
    }
}
