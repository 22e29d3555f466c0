package dev.odetab.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Path;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Walks that ran for minutes without a word (issue 17, item 4) are refused before any work, with
 * the estimate (series/WalkCost): exit 3 for a walk above the precision cap or the walk limit, and
 * a build leaves its output folder as it was. Specs under src/test/resources/hostile/budget/.
 */
class BudgetTest {
    @Test
    void aiAtOneThousandIsRefusedWithTheBitsItNeeds() {
        CliRunner.Result r = CliRunner.run("eval", "airy-ai", "1000");
        assertEquals(3, r.code(), r.err());
        assertEquals("", r.out());
        // (4/3)·1000^(3/2)/ln 2 = 60830 bits lost, plus the 67 bits of 20 digits.
        assertTrue(r.err().startsWith("odetab: airy-ai at x = 1000: the walk from x = 0 needs about 6089"), r.err());
        assertTrue(r.err().contains("above the precision cap of"), r.err());
    }

    @Test
    void aWalkBeyondTheStepLimitIsRefused() {
        for (String x : new String[] {"-1e6", "1e99999"}) {
            CliRunner.Result r = CliRunner.run("eval", "airy-ai", "--", x);
            assertEquals(3, r.code(), r.err());
            assertEquals("", r.out());
            assertTrue(r.err().startsWith("odetab: airy-ai at x = " + x + ": the walk from x = 0 "), r.err());
        }
        CliRunner.Result r = CliRunner.run("eval", "airy-ai", "--", "-1e6");
        assertTrue(r.err().contains("takes about 333"), r.err());
        assertTrue(r.err().contains("steps (estimated before any work), above the limit of 100000 steps"), r.err());
    }

    @Test
    void aDominantSolutionIsNotRefused() {
        // Bi grows along the walk, so it loses no bits to another solution.
        CliRunner.Result r = CliRunner.run("eval", "airy-bi", "50");
        assertEquals(0, r.code(), r.err());
        assertTrue(r.out().startsWith("50\t"), r.out());
    }

    @Test
    void buildsAreRefusedBeforeAnyWorkAndChangeNothing(@TempDir Path out) throws IOException {
        FormatCapTest.assertBuildsRefused(out, 3, Map.of(
                "grid-to-200.toml", "1:1: table far: the walk from x = 0 needs about 5534 bits",
                "zeros-to-minus-1e6.toml", "1:1: table z: the walk from x = 0 takes about 333"));
    }
}
