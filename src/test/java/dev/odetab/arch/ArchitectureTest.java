package dev.odetab.arch;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.TreeSet;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;

/**
 * The dependency rule of STYLE.md, read from the import statements of the main sources:
 * {@code cli → spec, tables, emit, audit → series → ode → expr → numeric}; no package
 * imports one of a higher layer, packages of one layer form no cycle, big-math is imported
 * only inside {@code numeric} and the progress bar library only inside {@code cli}.
 */
class ArchitectureTest {
    private static final Path ROOT = Path.of("src/main/java/dev/odetab");
    private static final Map<String, Integer> LAYER = Map.ofEntries(
            Map.entry("base", 0), Map.entry("numeric", 1), Map.entry("expr", 2), Map.entry("ode", 3), Map.entry("series", 4),
            Map.entry("spec", 5), Map.entry("tables", 5), Map.entry("emit", 5), Map.entry("audit", 5), Map.entry("check", 5),
            Map.entry("cli", 6));
    private static final Pattern IMPORT = Pattern.compile("^import (?:static )?dev\\.odetab\\.([a-z]+)\\.", Pattern.MULTILINE);

    private static Map<String, Set<String>> edges() throws IOException {
        Map<String, Set<String>> edges = new HashMap<>();
        try (Stream<Path> files = Files.walk(ROOT)) {
            for (Path p : files.filter(f -> f.toString().endsWith(".java")).toList()) {
                String pkg = ROOT.relativize(p).getName(0).toString();
                Matcher m = IMPORT.matcher(Files.readString(p));
                while (m.find()) {
                    if (!m.group(1).equals(pkg)) {
                        edges.computeIfAbsent(pkg, k -> new TreeSet<>()).add(m.group(1) + " (" + p.getFileName() + ")");
                    }
                }
            }
        }
        return edges;
    }

    @Test
    void everyImportPointsDownTheLayers() throws IOException {
        List<String> wrong = new ArrayList<>();
        for (Map.Entry<String, Set<String>> e : edges().entrySet()) {
            assertTrue(LAYER.containsKey(e.getKey()), "package " + e.getKey() + " has no layer in this test");
            for (String target : e.getValue()) {
                String pkg = target.substring(0, target.indexOf(' '));
                if (LAYER.get(pkg) > LAYER.get(e.getKey())) {
                    wrong.add(e.getKey() + " -> " + target);
                }
            }
        }
        assertEquals(List.of(), wrong, "imports against the layering");
    }

    @Test
    void noCycleBetweenPackages() throws IOException {
        Map<String, Set<String>> graph = new HashMap<>();
        edges().forEach((k, v) -> v.forEach(t -> graph.computeIfAbsent(k, x -> new HashSet<>()).add(t.substring(0, t.indexOf(' ')))));
        for (String start : graph.keySet()) {
            Set<String> seen = new HashSet<>();
            List<String> stack = new ArrayList<>(graph.getOrDefault(start, Set.of()));
            while (!stack.isEmpty()) {
                String n = stack.remove(stack.size() - 1);
                assertTrue(!n.equals(start), "package cycle through " + start);
                if (seen.add(n)) {
                    stack.addAll(graph.getOrDefault(n, Set.of()));
                }
            }
        }
    }

    private static void onlyInside(String library, String pkg) throws IOException {
        try (Stream<Path> files = Files.walk(ROOT)) {
            for (Path p : files.filter(f -> f.toString().endsWith(".java")).toList()) {
                if (Files.readString(p).contains(library)) {
                    assertEquals(pkg, ROOT.relativize(p).getName(0).toString(), p + " uses " + library);
                }
            }
        }
    }

    @Test
    void bigMathOnlyInsideNumeric() throws IOException {
        onlyInside("ch.obermuhlner", "numeric");
    }

    @Test
    void progressBarsOnlyInsideCli() throws IOException {
        onlyInside("me.tongfei", "cli");
    }
}
