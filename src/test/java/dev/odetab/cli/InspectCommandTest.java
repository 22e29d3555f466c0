package dev.odetab.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/** {@code odetab inspect}: singular points, their kind and the radius, for equations with known answers. */
class InspectCommandTest {
    private static final String SPEC = "src/test/resources/specs/functions.toml";

    @Test
    void legendreHasRegularSingularPointsAtPlusMinusOneAndRadiusOne() {
        // DLMF 14.2.1 / 18.8 (Table 18.8.1): (1 − x²) y'' − 2x y' + n(n+1) y = 0 has regular
        // singular points at ±1, so the series at 0 converges for |x| < 1.
        CliRunner.Result r = CliRunner.run("inspect", SPEC + "#legendre5");
        assertEquals(0, r.code(), r.err());
        assertTrue(r.out().contains("x = -1 (regular, simple root of P2)"), r.out());
        assertTrue(r.out().contains("x = 1 (regular, simple root of P2)"), r.out());
        assertTrue(r.out().contains("radius          >= 1 at x = 0 "), r.out());
        // P_5'(x) = (315x^4 − 210x^2 + 15)/8 (DLMF 18.5.5 with n = 5): the coefficients are exact.
        assertTrue(r.out().contains("c(1) = 1.8750000000000000000"), r.out());
        assertTrue(r.out().contains("c(3) = -8.7500000000000000000"), r.out());
        assertTrue(r.out().contains("c(5) = 7.8750000000000000000"), r.out());
    }

    @Test
    void radiusAtAnotherPointIsTheDistanceToTheNearestSingularPoint() {
        CliRunner.Result r = CliRunner.run("inspect", SPEC + "#legendre5", "--at", "1/2");
        assertEquals(0, r.code(), r.err());
        assertTrue(r.out().contains("radius          >= 0.5 at x = 0.5 "), r.out());
    }

    @Test
    void complexSingularPointsLimitTheRadius() {
        // (x² + 4) y'' + y = 0: P2 vanishes at ±2i, so the radius at 0 is exactly 2 (DLMF 2.7(i)).
        CliRunner.Result r = CliRunner.run("inspect", SPEC + "#imaginary");
        assertEquals(0, r.code(), r.err());
        assertTrue(r.out().contains("x = -2i (regular, simple root of P2)"), r.out());
        assertTrue(r.out().contains("x = 2i (regular, simple root of P2)"), r.out());
        assertTrue(r.out().contains("radius          >= 2 at x = 0 "), r.out());
    }

    @Test
    void airyHasNoSingularPoint() {
        CliRunner.Result r = CliRunner.run("inspect", "airy-ai");
        assertEquals(0, r.code(), r.err());
        assertTrue(r.out().contains("singular points none"), r.out());
        assertTrue(r.out().contains("infinite"), r.out());
        // DLMF 9.2.1: y'' = x y gives c(m) = c(m−3)/(m(m−1)).
        assertTrue(r.out().contains("c(m) = [1]*c(m-3)  /  [m^2 - m]"), r.out());
    }

    @Test
    void saysWhyAMemberIsAnExactPolynomial() {
        // P_3 = (5x^3 - 3x)/2, DLMF Table 18.3.1 / 18.5
        CliRunner.Result r = CliRunner.run("inspect", "legendre-p", "-p", "n=3");
        assertEquals(0, r.code(), r.err());
        assertTrue(r.out().contains("exact           polynomial of degree 3: the series terminates (2 consecutive zero coefficients), "
                + "so values are exact rationals rounded once\n                y = (5/2)*x^3 - (3/2)*x\n"), r.out());
        CliRunner.Result q = CliRunner.run("inspect", "legendre-q", "-p", "n=3");
        assertEquals(0, q.code(), q.err());
        assertTrue(!q.out().contains("exact           polynomial"), q.out());
    }

    @Test
    void normalizationsPrintSimplified() {
        CliRunner.Result r = CliRunner.run("inspect", "weber-u", "-p", "a=-1/2");
        assertEquals(0, r.code(), r.err());
        // was sqrt(pi)/(2^(-1/2/2 + 1/4)*gamma(3/4 + (-1/2/2)))
        assertTrue(r.out().contains("normalization   y(0) = sqrt(pi)/gamma(0.5) = 1.0000000000000000000\n"), r.out());
    }
}
