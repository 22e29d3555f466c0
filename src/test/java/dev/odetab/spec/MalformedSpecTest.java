package dev.odetab.spec;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;

import dev.odetab.cli.CliRunner;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Map;
import java.util.Set;
import java.util.TreeMap;
import java.util.TreeSet;
import java.util.stream.Collectors;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * DESIGN.md "Spec file" and "Command line": a malformed spec is exit 2 with one message naming
 * file, line and column, and {@code odetab build} writes nothing (the output folder is not even
 * created). One file per fault under {@code specs/malformed/}.
 */
class MalformedSpecTest {
    private static final String DIR = "src/test/resources/specs/malformed/";
    private static final String GAUSS_FAMILIES = "legendre-p, hermite-h, laguerre-l, chebyshev-t, chebyshev-u, gegenbauer-c, jacobi-p";

    /** File name → the message after {@code "odetab: "}, its position included. */
    private static final Map<String, String> EXPECTED = new TreeMap<>(Map.ofEntries(
            Map.entry("toml-syntax.toml", "3:45: TOML syntax: Unexpected end of line, expected }"),
            Map.entry("unknown-top-level-key.toml",
                    "2:1: unknown key 'tabels'; did you mean 'tables'? (allowed at the top: functions, java_package, tables, title)"),
            Map.entry("unknown-table-key.toml", "4:1: unknown key 'fromat'; did you mean 'format'? (a table has: function, kind, "
                    + "grid, points, columns, format, rounding, out_of_range, precision_cap_bits, outputs, java_package, terms, search, count, of, weight_underflow)"),
            Map.entry("format-not-a-string.toml", "4:1: 'format' must be a string"),
            Map.entry("java-package-keyword.toml", "1:29: 'com.example.new.tables' is not a Java package name: 'new' is a Java keyword"
                    + " (write dot-separated identifiers, like \"com.example.tables\")"),
            Map.entry("java-package-not-an-identifier.toml", "5:24: 'tables.2d' is not a Java package name: '2d' is not a Java identifier"
                    + " (write dot-separated identifiers, like \"com.example.tables\")"),
            Map.entry("java-package-not-a-string.toml", "4:1: 'java_package' must be a string, like \"com.example.tables\""),
            Map.entry("step-does-not-divide.toml", "3:32: the step 0.375 does not divide the range from 0 to 1 (8/3 steps)"),
            Map.entry("step-wrong-sign.toml", "3:33: the step 0.25 does not lead from 1 to -1"),
            Map.entry("grid-and-points.toml", "4:1: give either 'grid' or 'points', not both"),
            Map.entry("neither-grid-nor-points.toml", "1:1: a values table needs 'grid' or 'points'"),
            Map.entry("point-is-toml-float.toml",
                    "3:18: write the point as a string (\"0.1\") so that it stays exact; TOML floats are binary"),
            Map.entry("unknown-column.toml",
                    "4:12: column 'node' is not available in a values table (available: x, value, derivative, derivative2 … derivative9)"),
            Map.entry("duplicate-column.toml", "4:26: column 'x' appears twice"),
            Map.entry("unknown-format.toml", "4:1: unknown format 'binary80': expected a format name; formats: binary16, binary32, "
                    + "binary64, binary128, double-double, decimal:N (1 <= N <= 10000), fixed:sT.F or fixed:uT.F "
                    + "(T bits in all, the sign included, 2..64 signed or 1..64 unsigned; F of them fraction bits, 0..128: "
                    + "fixed:s16.15 is 16 bits with 15 fraction bits, the Q-format Q0.15 or Q15; fixed:u32.24 is UQ8.24)"),
            Map.entry("unknown-rounding.toml", "4:1: unknown rounding mode 'nearest'; expected one of nearest-even, toward-negative, toward-positive, toward-zero (down and up are accepted for toward-negative and toward-positive)"),
            Map.entry("out-of-range-on-binary.toml",
                    "5:1: out_of_range applies to fixed-point formats only, and this table's format is binary32"),
            Map.entry("precision-cap-too-small.toml", "4:1: precision_cap_bits must be an integer from 64 to 1048576"),
            Map.entry("unknown-template.toml",
                    "4:19: unknown template 'jav'; did you mean 'java'? (built-in: csv, c, java; or a path to a .ftl file)"),
            // JVMS 4.7.3: a method's code_length is below 65536, and a java output's arrays are filled in one initializer
            Map.entry("java-too-large.toml", "5:19: a java output holds the whole table in one class, whose initializer the JVM limits"
                    + " to 64 KiB of bytecode (JVMS 4.7.3): at most 8000 array entries, and this table has 8002; use \"c\" or \"csv\""
                    + " for it, or split it into smaller tables"),
            Map.entry("missing-template-file.toml", "4:19: template file 'no-such-dir/table.rs.ftl' does not exist (looked for "
                    + DIR + "no-such-dir/table.rs.ftl)"),
            Map.entry("unknown-function.toml", "7:1: unknown function 'wav'; did you mean 'wave'? (defined: wave)"),
            Map.entry("family-needs-parameters.toml", "2:1: the family hermite-function takes parameters (n), so a table cannot "
                    + "name it directly: define a function under [functions] with family = \"hermite-function\" and its parameters, "
                    + "and name that function here"),
            Map.entry("quadrature-airy.toml", "3:1: a quadrature table needs a function defined with the family of its Gauss rule ("
                    + GAUSS_FAMILIES + ") and its degree n; 'airy-ai' is a built-in family without a Gauss rule"),
            Map.entry("quadrature-equation-function.toml", "8:1: a quadrature table needs a function defined with the family of its Gauss "
                    + "rule (" + GAUSS_FAMILIES + ") and its degree n; 'wave' is an equation of its own"),
            Map.entry("quadrature-family-without-rule.toml", "7:1: the family weber-u of function 'u' has no Gauss rule (quadrature tables take "
                    + GAUSS_FAMILIES + ")"),
            Map.entry("quadrature-non-integer-degree.toml",
                    "7:1: a Gauss rule has an integer number of nodes n from 1 to 1000, and function 'h' has n = 10.5"),
            Map.entry("quadrature-no-nodes.toml", "7:1: a Gauss rule has an integer number of nodes n from 1 to 1000, and function 'p0' has n = 0"),
            Map.entry("quadrature-beyond-cap.toml", "3:1: n = 1001 is outside the allowed range: an integer 0 <= n <= 1000"),
            Map.entry("quadrature-grid.toml", "8:1: a quadrature table takes no 'grid': its points are the nodes of the Gauss rule"),
            Map.entry("quadrature-unknown-column.toml",
                    "8:20: column 'value' is not available in a quadrature table (available: node, weight, scaled_weight)"),
            Map.entry("quadrature-scaled-weight-legendre.toml", "8:20: column 'scaled_weight' belongs to Gauss–Hermite (w·e^(x²)) and "
                    + "Gauss–Laguerre (w·e^x) rules; this table's rule is legendre-p"),
            Map.entry("weight-underflow-on-decimal.toml", "9:1: weight_underflow applies to binary formats and double-double (which have "
                    + "a smallest normal number), and this table's format is decimal:30"),
            Map.entry("weight-underflow-on-values.toml", "4:1: 'weight_underflow' belongs to quadrature tables (kind = \"quadrature\")"),
            Map.entry("weight-underflow-unknown.toml", "8:1: weight_underflow must be \"error\" (a weight below the smallest normal number "
                    + "stops the build) or \"flush\" (it becomes 0, flagged in the column weight_flag)"),
            Map.entry("weight-underflow-without-weight.toml",
                    "9:1: weight_underflow = \"flush\" applies to the column weight, and this table has none"),
            Map.entry("singular-at.toml",
                    "3:1: x = -1 is a singular point of the equation (its coefficient of y'' vanishes there); choose an ordinary point"),
            Map.entry("bad-value-expression.toml", "3:18: expected ')' to close the '(' at column 16, found the end of the text"),
            Map.entry("nonlinear-equation.toml", "2:20: the equation must be linear in y: a term in y cannot be raised to a power")));

    static Stream<Arguments> specs() {
        return EXPECTED.entrySet().stream().map(e -> Arguments.of(e.getKey(), e.getValue()));
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("specs")
    void exitTwoWithOneLocatedMessageAndNothingWritten(String file, String message, @TempDir Path tmp) {
        Path out = tmp.resolve("out");
        CliRunner.Result r = CliRunner.run("build", DIR + file, "--out", out.toString());
        assertEquals("odetab: " + DIR + file + ":" + message + "\n", r.err());
        assertEquals(2, r.code(), "exit code");
        assertEquals("", r.out());
        assertFalse(Files.exists(out), "the output folder must not be created");
    }

    @Test
    void everyMalformedSpecHasItsExpectation() throws IOException {
        Set<String> files;
        try (Stream<Path> s = Files.list(Path.of(DIR))) {
            files = s.map(p -> p.getFileName().toString()).collect(Collectors.toCollection(TreeSet::new));
        }
        assertEquals(EXPECTED.keySet(), files);
        assertFalse(files.size() < 20, "at least 20 malformed specs");
    }
}
