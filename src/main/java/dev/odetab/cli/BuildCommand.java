package dev.odetab.cli;

import dev.odetab.emit.OutputWriter;
import dev.odetab.emit.Outputs;
import dev.odetab.emit.Provenance;
import dev.odetab.expr.ExprException;
import dev.odetab.series.SingularCrossingException;
import dev.odetab.spec.InputError;
import dev.odetab.spec.SpecFile;
import dev.odetab.tables.TableDef;
import dev.odetab.tables.TableEvaluator;
import dev.odetab.tables.TableResult;
import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.concurrent.Callable;
import java.util.concurrent.ExecutionException;
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

    @Option(names = "--jobs", paramLabel = "N", description = "tables evaluated in parallel (default: the number of cores); the bytes never depend on N")
    Integer jobs;

    @Option(names = "--verbose", description = "report the work done per table on stderr")
    boolean verbose;

    private record Job(SpecFile spec, TableDef table) {
    }

    @Override
    public Integer call() {
        PrintWriter outw = spec.commandLine().getOut();
        PrintWriter err = spec.commandLine().getErr();
        try {
            int n = jobs == null ? Runtime.getRuntime().availableProcessors() : jobs;
            if (n < 1) {
                throw new InputError(InputError.argument(CommandContext.indexOf("--jobs", 1), "--jobs", 1), "--jobs must be at least 1");
            }
            List<Job> work = new ArrayList<>();
            for (Path p : specs) {
                SpecFile s = SpecFile.load(p);
                for (TableDef t : s.tables()) {
                    work.add(new Job(s, t));
                }
            }
            Path dir = out != null ? out : defaultOut(specs.get(0));
            List<TableResult> results = evaluate(work, n, err);
            Outputs outputs = new Outputs(ToolVersion.get());
            for (int i = 0; i < work.size(); i++) {
                Job j = work.get(i);
                outputs.add(results.get(i), Provenance.of(j.spec().display(), j.spec().bytes(), results.get(i), ToolVersion.get()), j.spec().title());
            }
            Map<String, byte[]> files = outputs.files();
            if (check) {
                List<String> diff = OutputWriter.differences(dir, files);
                for (String d : diff) {
                    outw.println("odetab: would change " + dir.resolve(d.substring(0, d.indexOf(' '))) + d.substring(d.indexOf(' ')));
                }
                if (!diff.isEmpty()) {
                    return Main.DIFFERENCE;
                }
                outw.println("odetab: " + files.size() + " files in " + dir + " are up to date");
                return Main.OK;
            }
            OutputWriter.write(dir, files);
            outw.println("odetab: wrote " + files.size() + " files for " + work.size() + " table(s) to " + dir);
            return Main.OK;
        } catch (InputError e) {
            err.println("odetab: " + e.getMessage());
            return Main.BAD_INPUT;
        } catch (Outputs.TemplateError e) {
            err.println("odetab: " + e.where() + ": " + e.getMessage());
            return Main.BAD_INPUT;
        } catch (Outputs.ClashError | TableEvaluator.OutOfRangeException | SingularCrossingException e) {
            err.println("odetab: " + e.getMessage());
            return Main.BAD_INPUT;
        } catch (ExprException e) {
            err.println("odetab: a normalization constant cannot be evaluated: " + e.getMessage());
            return Main.BAD_INPUT;
        } catch (TableEvaluator.UndecidedException e) {
            err.println("odetab: " + e.getMessage());
            return Main.NUMERICAL_LIMIT;
        } catch (IOException e) {
            err.println("odetab: cannot write the outputs: " + e.getMessage());
            return Main.BAD_INPUT;
        } finally {
            outw.flush();
        }
    }

    private static Path defaultOut(Path firstSpec) {
        Path parent = firstSpec.getParent();
        return parent == null ? Path.of("out") : parent.resolve("out");
    }

    /** Evaluates the tables, in parallel when asked; results come back in table order. */
    private List<TableResult> evaluate(List<Job> work, int n, PrintWriter err) throws ExprException,
            TableEvaluator.UndecidedException, TableEvaluator.OutOfRangeException {
        List<TableResult> results = new ArrayList<>();
        // Tables run on one pool and the chunks of large grids on another, so that a table
        // waiting for its chunks never holds a thread that a chunk needs.
        ExecutorService pool = Executors.newFixedThreadPool(Math.max(1, Math.min(n, work.size())));
        ExecutorService chunkPool = n == 1 ? null : Executors.newFixedThreadPool(n);
        try {
            List<Future<TableResult>> futures = new ArrayList<>();
            for (Job j : work) {
                futures.add(pool.submit(() -> TableEvaluator.evaluate(j.table(), dev.odetab.tables.Progress.NONE, chunkPool)));
            }
            for (int i = 0; i < futures.size(); i++) {
                TableResult r = get(futures.get(i));
                if (verbose) {
                    err.println("odetab: table " + r.table().name() + ": " + r.rows().size() + " rows, working precision up to "
                            + r.maxPrecBits() + " bits");
                }
                results.add(r);
            }
        } finally {
            pool.shutdownNow();
            if (chunkPool != null) {
                chunkPool.shutdownNow();
            }
        }
        return results;
    }

    private static TableResult get(Future<TableResult> f) throws ExprException, TableEvaluator.UndecidedException,
            TableEvaluator.OutOfRangeException {
        try {
            return f.get();
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new IllegalStateException("interrupted", e);
        } catch (ExecutionException e) {
            Throwable c = e.getCause();
            if (c instanceof ExprException x) {
                throw x;
            }
            if (c instanceof TableEvaluator.UndecidedException x) {
                throw x;
            }
            if (c instanceof TableEvaluator.OutOfRangeException x) {
                throw x;
            }
            if (c instanceof RuntimeException x) {
                throw x;
            }
            throw new IllegalStateException(c);
        }
    }
}
