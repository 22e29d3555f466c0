package dev.odetab.arch;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.TreeMap;
import java.util.TreeSet;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Stream;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.tomlj.Toml;
import org.tomlj.TomlArray;
import org.tomlj.TomlParseResult;
import org.tomlj.TomlTable;

/**
 * The architecture stated in {@code architecture.toml} (the one statement of it; DEVELOPERS.md
 * describes it in prose) against the main sources: every package is declared and documented,
 * every reference between packages is declared in the referring package's {@code uses}, no
 * forbidden edge appears, the packages form no cycle, and every third-party library is
 * referenced only inside its packages, and by at least one of them. Also the one code rule
 * that keeps formats exhaustive: no {@code instanceof} on a format record.
 *
 * <p>References are imports and qualified names ({@code dev.odetab.x.Y}) in code, with
 * comments removed; a sub-package ({@code tables.rows}) counts as its top-level package.
 */
class ArchitectureTest {
    private static final Path ROOT = Path.of("src/main/java/dev/odetab");
    private static final Pattern REFERENCE = Pattern.compile("\\bdev\\.odetab\\.([a-z]+)\\.");
    private static final Pattern COMMENT = Pattern.compile("/\\*.*?\\*/|//[^\\n]*", Pattern.DOTALL);

    private static TomlParseResult architecture;
    /** Source file (relative to ROOT) to its code without comments and package line. */
    private static Map<Path, String> sources;

    @BeforeAll
    static void read() throws IOException {
        architecture = Toml.parse(Path.of("architecture.toml"));
        assertEquals(List.of(), architecture.errors(), "architecture.toml does not parse");
        sources = new TreeMap<>();
        try (Stream<Path> files = Files.walk(ROOT)) {
            for (Path p : files.filter(f -> f.toString().endsWith(".java")).toList()) {
                String code = COMMENT.matcher(Files.readString(p)).replaceAll(" ");
                sources.put(ROOT.relativize(p), code.replaceFirst("(?m)^package [^;]*;", ""));
            }
        }
    }

    private static String packageOf(Path relative) {
        return relative.getName(0).toString();
    }

    private static Set<String> declaredPackages() {
        return new TreeSet<>(architecture.getTableOrEmpty("packages").keySet());
    }

    private static Set<String> strings(TomlArray a) {
        Set<String> out = new TreeSet<>();
        for (int i = 0; i < a.size(); i++) {
            out.add(a.getString(i));
        }
        return out;
    }

    private static Set<String> uses(String pkg) {
        return strings(architecture.getTableOrEmpty("packages").getTableOrEmpty(pkg).getArrayOrEmpty("uses"));
    }

    /** Package to the packages it references, each with the first file that does. */
    private static Map<String, Map<String, Path>> edges() {
        Map<String, Map<String, Path>> edges = new TreeMap<>();
        sources.forEach((file, code) -> {
            String from = packageOf(file);
            Matcher m = REFERENCE.matcher(code);
            while (m.find()) {
                if (!m.group(1).equals(from)) {
                    edges.computeIfAbsent(from, k -> new TreeMap<>()).putIfAbsent(m.group(1), file);
                }
            }
        });
        return edges;
    }

    @Test
    void everyPackageIsDeclaredAndStatesItsInvariant() {
        Set<String> present = new TreeSet<>();
        sources.keySet().forEach(p -> present.add(packageOf(p)));
        present.removeIf(p -> p.endsWith(".java"));
        assertEquals(declaredPackages(), present, "packages in architecture.toml against src/main");
        for (String pkg : present) {
            assertTrue(sources.containsKey(Path.of(pkg, "package-info.java")), pkg + " has no package-info.java");
            assertFalse(architecture.getTableOrEmpty("packages").getTableOrEmpty(pkg).getString("owns", () -> "").isBlank(),
                    pkg + " says in architecture.toml what it owns");
        }
    }

    @Test
    void everyReferenceIsDeclared() {
        List<String> undeclared = new ArrayList<>();
        edges().forEach((from, targets) -> targets.forEach((to, file) -> {
            if (!uses(from).contains(to)) {
                undeclared.add(from + " -> " + to + " (" + file + ")");
            }
        }));
        assertEquals(List.of(), undeclared, "references not declared in architecture.toml");
    }

    @Test
    void noForbiddenEdgeIsDeclaredOrPresent() {
        TomlArray forbidden = architecture.getArrayOrEmpty("forbidden");
        assertTrue(forbidden.size() > 0, "architecture.toml lists forbidden edges");
        Map<String, Map<String, Path>> edges = edges();
        for (int i = 0; i < forbidden.size(); i++) {
            TomlTable f = forbidden.getTable(i);
            String from = f.getString("from");
            String to = f.getString("to");
            assertTrue(declaredPackages().contains(from) && declaredPackages().contains(to), "forbidden " + from + " -> " + to);
            assertFalse(f.getString("why", () -> "").isBlank(), "forbidden " + from + " -> " + to + " says why");
            assertFalse(uses(from).contains(to), "architecture.toml both allows and forbids " + from + " -> " + to);
            assertFalse(edges.getOrDefault(from, Map.of()).containsKey(to),
                    "forbidden " + from + " -> " + to + ": " + edges.getOrDefault(from, Map.of()).get(to));
        }
    }

    @Test
    void declaredPackagesFormNoCycle() {
        for (String start : declaredPackages()) {
            assertTrue(declaredPackages().containsAll(uses(start)), start + " uses an undeclared package");
            Set<String> seen = new TreeSet<>();
            List<String> stack = new ArrayList<>(uses(start));
            while (!stack.isEmpty()) {
                String n = stack.remove(stack.size() - 1);
                assertFalse(n.equals(start), "package cycle through " + start);
                if (seen.add(n)) {
                    stack.addAll(uses(n));
                }
            }
        }
    }

    @Test
    void formatsAreSwitchedOverNeverTestedRecordByRecord() {
        // Formats own their behaviour (Format's class comment): a switch expression over
        // Format.kind() without default makes the compiler list every place a new format must
        // be handled; an instanceof test on a format record would let it fall through silently.
        Pattern test = Pattern.compile("instanceof\\s+(?:[\\w.]*\\.)?(?:BinaryFormat|DoubleDouble|DecimalFormat|FixedFormat)\\b");
        List<String> found = new ArrayList<>();
        sources.forEach((file, code) -> {
            if (test.matcher(code).find()) {
                found.add(file.toString());
            }
        });
        assertEquals(List.of(), found, "instanceof on a format record");
    }

    @Test
    void librariesStayInsideTheirPackagesAndAreUsed() {
        TomlTable libraries = architecture.getTableOrEmpty("libraries");
        assertTrue(libraries.keySet().contains("big-math"), "big-math is declared");
        for (String name : libraries.keySet()) {
            TomlTable lib = libraries.getTableOrEmpty(name);
            Pattern use = Pattern.compile("\\b" + Pattern.quote(lib.getString("prefix")) + "\\.");
            Set<String> allowed = strings(lib.getArrayOrEmpty("packages"));
            List<String> outside = new ArrayList<>();
            boolean used = false;
            for (Map.Entry<Path, String> e : sources.entrySet()) {
                if (use.matcher(e.getValue()).find()) {
                    used = true;
                    if (!allowed.contains(packageOf(e.getKey()))) {
                        outside.add(e.getKey().toString());
                    }
                }
            }
            assertEquals(List.of(), outside, name + " used outside " + allowed);
            assertTrue(used, name + " is declared in architecture.toml but used by nothing in src/main");
        }
    }
}
