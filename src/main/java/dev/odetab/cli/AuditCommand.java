package dev.odetab.cli;

import dev.odetab.audit.AuditReport;
import dev.odetab.audit.AuditResult;
import dev.odetab.audit.Auditor;
import dev.odetab.audit.ErrorPlot;
import dev.odetab.audit.TableReader;
import dev.odetab.base.ExprException;
import dev.odetab.emit.OutputWriter;
import dev.odetab.ode.SingularCrossingException;
import dev.odetab.series.PrecisionCapException;
import dev.odetab.base.InputError;
import dev.odetab.spec.SpecFile;
import dev.odetab.tables.Column;
import dev.odetab.tables.TableDef;
import dev.odetab.base.Json;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.concurrent.Callable;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

/** {@code odetab audit SPEC#TABLE FILE}: measure an existing table against the exact values. */
@Command(name = "audit", mixinStandardHelpOptions = true,
        description = {"Measure how far each entry of an existing table (CSV, or a C or Java array) is from the exact value.",
            "Errors are in units in the last place (ulps) of the spec table's format.",
            "A summary is printed, and a report written: audit.csv, summary.json, error.png and error.svg.",
            "Exit codes: 0 every entry is within the tolerance; 1 some entry is beyond it;",
            "2 bad input (unreadable file, unknown table); 3 the precision cap cannot settle an entry."})
final class AuditCommand implements Callable<Integer> {
    /** The audited file's path in summary.json, as written there (JSON-escaped). */
    private static final Pattern AUDITED_FILE = Pattern.compile("^\\{\\s*\"file\": \"((?:[^\"\\\\]|\\\\.)*)\"");

    @CommandLine.Spec
    CommandLine.Model.CommandSpec spec;

    @Parameters(index = "0", paramLabel = "SPEC#TABLE", description = "the spec file and the table the file should hold")
    String target;

    @Parameters(index = "1", paramLabel = "FILE", description = "the table to audit: .csv, or C / Java source with an array literal")
    Path file;

    @Option(names = "--tolerance", paramLabel = "ULPS", description = "largest acceptable error in ulps (default: 0.5, correctly rounded)")
    double tolerance = 0.5;

    @Option(names = "--report", paramLabel = "DIR", description = "report folder (default: FILE's name without extension + '.audit', beside FILE)")
    Path report;

    @Option(names = "--column", paramLabel = "NAME", description = "the column audited, also the CSV column or array name to read (default: the table's first column after x)")
    String column;

    @Override
    public Integer call() {
        PrintWriter out = spec.commandLine().getOut();
        PrintWriter err = spec.commandLine().getErr();
        try {
            int hash = target.indexOf('#');
            if (hash <= 0 || hash == target.length() - 1) {
                throw new InputError(InputError.argument(2, target, 1), "expected SPEC#TABLE, like tables/inherited/inherited.toml#ai_legacy");
            }
            if (!(tolerance >= 0) || Double.isInfinite(tolerance)) {
                int i = CommandContext.indexOf("--tolerance", 1);
                throw new InputError(InputError.argument(i + 1, String.valueOf(CommandContext.at(i + 1)), 1), "--tolerance must be a finite number >= 0");
            }
            SpecFile s = SpecFile.load(Path.of(target.substring(0, hash)));
            String name = target.substring(hash + 1);
            TableDef t = null;
            List<String> names = new ArrayList<>();
            for (TableDef d : s.tables()) {
                names.add(d.name());
                t = d.name().equals(name) ? d : t;
            }
            if (t == null) {
                throw new InputError(InputError.argument(2, target, hash + 2), "no table '" + name + "' in " + s.display()
                        + " (tables: " + String.join(", ", names) + ")");
            }
            Column col = chooseColumn(t, column, target);
            var entries = TableReader.read(file, column == null ? col.name() : column, t);
            AuditResult a = Auditor.audit(t, col, entries, tolerance);
            Path dir = report != null ? report : defaultReport(file);
            if (report == null) {
                refuseOtherReport(dir);
            }
            System.setProperty("java.awt.headless", "true");
            Map<String, byte[]> files = new LinkedHashMap<>();
            files.put("audit.csv", AuditReport.csv(a));
            files.put("summary.json", AuditReport.json(a));
            files.put("error.png", ErrorPlot.png(a));
            files.put("error.svg", ErrorPlot.svg(a));
            OutputWriter.write(dir, files).forEach(m -> err.println("odetab: " + m));
            out.print(AuditReport.summary(a));
            out.println("  report: " + dir + " (audit.csv, summary.json, error.png, error.svg)");
            return AuditReport.beyondTolerance(a) == 0 ? Main.OK : Main.DIFFERENCE;
        } catch (InputError | SingularCrossingException e) {
            err.println("odetab: " + e.getMessage());
            return Main.BAD_INPUT;
        } catch (ExprException e) {
            err.println("odetab: a normalization constant cannot be evaluated: " + e.getMessage());
            return Main.BAD_INPUT;
        } catch (PrecisionCapException e) {
            return Failures.numericalLimit("", e, "", err);
        } catch (IOException e) {
            err.println("odetab: cannot write the report: " + e.getMessage());
            return Main.BAD_INPUT;
        } finally {
            out.flush();
        }
    }

    /** The table column named by --column (also as a suffix: caustic_value is value), else the first after x. */
    private static Column chooseColumn(TableDef t, String wanted, String target) throws InputError {
        for (Column c : t.columns()) {
            if (!c.isPoint() && (wanted == null || wanted.equals(c.name()) || wanted.endsWith("_" + c.name())
                    || wanted.equals(c.name() + "_hex") || wanted.equals(c.name() + "_decoded"))) {
                return c;
            }
        }
        int i = CommandContext.indexOf("--column", 1);
        throw new InputError(wanted == null ? InputError.argument(2, target, 1) : InputError.argument(i + 1, wanted, 1),
                "table " + t.name() + " has no column " + (wanted == null ? "besides x" : "'" + wanted + "'"));
    }

    /**
     * The default report folder is named after FILE without its extension, so {@code good.c} and
     * {@code good.csv} share it: refuses to replace a report of another file there (its
     * summary.json names the file audited), before any work.
     */
    private void refuseOtherReport(Path dir) throws InputError {
        Path summary = dir.resolve("summary.json");
        String text;
        try {
            text = Files.isRegularFile(summary) ? Files.readString(summary, StandardCharsets.UTF_8) : "";
        } catch (IOException | UncheckedIOException e) {
            return; // not a report of ours: the commit's checks decide
        }
        Matcher m = AUDITED_FILE.matcher(text);
        if (!m.find()) {
            return;
        }
        String audited = Json.write(file.getFileName().toString()).strip();
        String previous = m.group(1).substring(m.group(1).lastIndexOf('/') + 1);
        if (!audited.equals("\"" + previous + "\"")) {
            int i = Math.max(3, CommandContext.indexOf(file.toString(), 3));
            throw new InputError(InputError.argument(i, file.toString(), 1), "the default report folder " + dir
                    + " holds the report of " + m.group(1) + "; name another folder with --report");
        }
    }

    static Path defaultReport(Path file) {
        String n = file.getFileName().toString();
        int dot = n.lastIndexOf('.');
        Path dir = Path.of((dot > 0 ? n.substring(0, dot) : n) + ".audit");
        return file.getParent() == null ? dir : file.getParent().resolve(dir);
    }
}
