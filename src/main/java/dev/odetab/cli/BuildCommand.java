package dev.odetab.cli;

import dev.odetab.emit.OutputFolder;
import dev.odetab.emit.Outputs;
import dev.odetab.emit.Provenance;
import dev.odetab.base.ExprException;
import dev.odetab.ode.SingularCrossingException;
import dev.odetab.base.InputError;
import dev.odetab.spec.SpecFile;
import dev.odetab.tables.OutOfRangeException;
import dev.odetab.tables.TableDef;
import dev.odetab.tables.TableEvaluator;
import dev.odetab.tables.TableResult;
import dev.odetab.series.PrecisionCapException;
import java.io.IOException;
import java.io.PrintWriter;
import java.io.UncheckedIOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.concurrent.Callable;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

/** {@code odetab build SPEC...}: evaluate every table of the specs and write their outputs. */
@Command(name = "build", mixinStandardHelpOptions = true,
        description = {"Evaluate every table of the specs and write their outputs (CSV, C, Java, templates) and manifest.json.",
            "Nothing is written unless every table of every spec succeeds."})
final class BuildCommand implements Callable<Integer> {
    @CommandLine.Spec
    CommandLine.Model.CommandSpec spec;

    @Parameters(arity = "1..*", paramLabel = "SPEC", description = "spec files (TOML)")
    List<Path> specs = new ArrayList<>();

    @Option(names = "--out", paramLabel = "DIR", description = "output folder (default: 'out' beside the first spec)")
    Path out;

    @Option(names = "--check", description = "write nothing; exit 1 if any output on disk differs from what would be written")
    boolean check;

    @Option(names = "--jobs", paramLabel = "N", description = "threads (default: the number of cores): tables, and the chunks of a long table, run in parallel; the bytes never depend on N")
    Integer jobs;

    @Option(names = "--verbose", description = "report the work done per table on stderr")
    boolean verbose;

    @Option(names = "--quiet", description = "no progress bars (shown otherwise on stderr when it is a terminal, for phases longer than a second)")
    boolean quiet;

    private record Job(SpecFile spec, TableDef table, String javaPackage) {
    }

    /** The table being awaited when evaluation failed (its error is located at its spec entry). */
    private Job failed;

    /** {@code file:line:column: } of the failed table's definition, or nothing. */
    private String failedAt() {
        return failed == null ? "" : failed.spec().tablePosition(failed.table().name()) + ": ";
    }

    @Override
    public Integer call() {
        PrintWriter outw = spec.commandLine().getOut();
        PrintWriter err = spec.commandLine().getErr();
        List<TableResult> results = new ArrayList<>();
        try {
            int n = jobs == null ? Runtime.getRuntime().availableProcessors() : jobs;
            if (n < 1) {
                throw new InputError(InputError.argument(CommandContext.indexOf("--jobs", 1), "--jobs", 1), "--jobs must be at least 1");
            }
            List<Job> work = new ArrayList<>();
            for (Path p : specs) {
                SpecFile s = SpecFile.load(p);
                List<TableDef> tables = s.tables();
                if (tables.isEmpty()) {
                    throw new InputError(s.display() + ":1:1", "nothing to build: the spec defines no table ([tables.NAME])");
                }
                for (TableDef t : tables) {
                    work.add(new Job(s, t, s.javaPackage(t.name())));
                }
            }
            refuseClashes(work);
            Path dir = out == null ? defaultOut(specs.get(0)) : out.toString().isEmpty() ? Path.of(".") : out;
            // opened (locked) before the evaluation, so that a second build into the folder fails at once
            try (OutputFolder folder = check ? null : OutputFolder.open(dir)) {
                if (folder != null) {
                    folder.notices().forEach(m -> err.println("odetab: " + m));
                }
                return evaluateAndWrite(work, n, dir, folder, outw, err, results);
            }
        } catch (InputError e) {
            err.println("odetab: " + e.getMessage());
            return Main.BAD_INPUT;
        } catch (Outputs.TemplateError e) {
            err.println("odetab: " + e.where() + ": " + e.getMessage());
            return Main.BAD_INPUT;
        } catch (OutOfRangeException | SingularCrossingException e) {
            err.println("odetab: " + failedAt() + e.getMessage());
            return Main.BAD_INPUT;
        } catch (ExprException e) {
            err.println("odetab: " + failedAt() + "a normalization constant cannot be evaluated: " + e.getMessage());
            return Main.BAD_INPUT;
        } catch (PrecisionCapException e) {
            return Failures.numericalLimit(failedAt(), e, "", err);
        } catch (IOException e) {
            err.println("odetab: cannot write the outputs: " + e.getMessage());
            return Main.BAD_INPUT;
        } catch (UncheckedIOException e) {
            err.println("odetab: " + e.getMessage());
            return Main.BAD_INPUT;
        } finally {
            results.forEach(TableResult::close);
            outw.flush();
        }
    }

    /** Evaluates the tables and writes (or, with --check, compares) their outputs; returns the exit code. */
    private int evaluateAndWrite(List<Job> work, int n, Path dir, OutputFolder folder, PrintWriter outw, PrintWriter err,
            List<TableResult> results) throws ExprException, PrecisionCapException, OutOfRangeException, Outputs.TemplateError, IOException {
        evaluate(work, n, err, results);
        try (ProgressDisplay writing = ProgressDisplay.forBuild("odetab: writing", "entries", quiet);
                Outputs outputs = folder == null ? Outputs.forChecking(dir, ToolVersion.get(), writing)
                        : Outputs.forWriting(folder, ToolVersion.get(), writing)) {
            for (int i = 0; i < work.size(); i++) {
                Job j = work.get(i);
                outputs.add(results.get(i), Provenance.of(Provenance.specPath(j.spec().path(), dir), j.spec().display(), j.spec().bytes(), results.get(i), ToolVersion.get()),
                        j.spec().title(), j.javaPackage());
            }
            if (folder == null) {
                List<String> diff = outputs.differences();
                writing.close();
                for (String d : diff) {
                    outw.println("odetab: would change " + dir.resolve(d.substring(0, d.indexOf(' '))) + d.substring(d.indexOf(' ')));
                }
                if (!diff.isEmpty()) {
                    return Main.DIFFERENCE;
                }
                outw.println("odetab: " + outputs.count() + " files in " + dir + " are up to date");
                return Main.OK;
            }
            outputs.commit();
            writing.close();
            outw.println("odetab: wrote " + outputs.count() + " files for " + work.size() + " table(s) to " + dir);
            return Main.OK;
        }
    }

    /**
     * Refuses, at the spec line of the later table, two output files of the build whose names
     * are equal or differ only in case (on a case-insensitive file system, such as the defaults
     * of macOS and Windows, one would silently replace the other), and an output named like the
     * manifest.
     */
    private static void refuseClashes(List<Job> work) throws InputError {
        Map<String, String[]> owners = new HashMap<>(); // folded file name -> {file, table, position}
        for (Job j : work) {
            String name = j.table().name();
            String at = j.spec().tablePosition(name);
            for (String file : Outputs.fileNames(j.table())) {
                String folded = file.toLowerCase(Locale.ROOT);
                if (folded.equals(Outputs.MANIFEST)) {
                    throw new InputError(at, "table " + name + " would write " + file + ", the name of the build's own manifest; rename the table");
                }
                String[] owner = owners.putIfAbsent(folded, new String[] {file, name, at});
                if (owner != null && owner[0].equals(file)) {
                    throw new InputError(at, "table " + name + " would write " + file + ", which table " + owner[1] + " (at " + owner[2]
                            + ") writes too: rename one of the tables");
                }
                if (owner != null) {
                    throw new InputError(at, "table " + name + " would write " + file + ", which differs only in case from " + owner[0]
                            + " of table " + owner[1] + " (at " + owner[2] + "): on a case-insensitive file system one would replace"
                            + " the other; rename one of the tables");
                }
            }
        }
    }

    private static Path defaultOut(Path firstSpec) {
        Path parent = firstSpec.getParent();
        return parent == null ? Path.of("out") : parent.resolve("out");
    }

    /**
     * Evaluates the tables, in parallel when asked, adding the results to {@code results} in
     * table order (so the caller releases them even when a later table fails).
     */
    private void evaluate(List<Job> work, int n, PrintWriter err, List<TableResult> results) throws ExprException,
            PrecisionCapException, OutOfRangeException {
        ProgressDisplay progress = ProgressDisplay.forBuild("odetab: evaluating", "rows", quiet);
        // Tables run on one pool and the chunks of large grids on another, so that a table
        // waiting for its chunks never holds a thread that a chunk needs.
        ExecutorService pool = Executors.newFixedThreadPool(Math.max(1, Math.min(n, work.size())));
        ExecutorService chunkPool = n == 1 ? null : Executors.newFixedThreadPool(n);
        List<String> lines = new ArrayList<>();
        try {
            List<Future<TableResult>> futures = new ArrayList<>();
            for (Job j : work) {
                futures.add(pool.submit(() -> TableEvaluator.evaluate(j.table(), progress, chunkPool)));
            }
            for (int i = 0; i < futures.size(); i++) {
                failed = work.get(i);
                TableResult r = TableEvaluator.await(futures.get(i));
                results.add(r);
                lines.add("odetab: table " + r.table().name() + ": " + r.rows().size() + " rows, working precision up to "
                        + r.maxPrecBits() + " bits");
            }
            failed = null;
        } finally {
            pool.shutdownNow();
            if (chunkPool != null) {
                chunkPool.shutdownNow();
            }
            progress.close();
            if (verbose) {
                lines.forEach(err::println);
            }
        }
    }

}
