package dev.odetab.cli;

import dev.odetab.check.ReferenceCheck;
import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.Callable;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;

/** {@code odetab check}: recompute the shipped reference values and identities; exit 1 on any failure. */
@Command(name = "check", mixinStandardHelpOptions = true,
        description = "Recompute every published reference value in reference-data/ and a fixed set of identities; report pass/fail per source.")
final class CheckCommand implements Callable<Integer> {
    @CommandLine.Spec
    CommandLine.Model.CommandSpec spec;

    @Option(names = "--data", paramLabel = "DIR", defaultValue = "reference-data",
            description = "the folder of reference CSV files (default: ${DEFAULT-VALUE})")
    Path data;

    @Override
    public Integer call() {
        PrintWriter out = spec.commandLine().getOut();
        PrintWriter err = spec.commandLine().getErr();
        if (!Files.isDirectory(data)) {
            err.println("odetab: " + data + ": no such folder of reference data (run from the project root, or give --data DIR)");
            return Main.BAD_INPUT;
        }
        try {
            List<ReferenceCheck.Outcome> outcomes = ReferenceCheck.run(data);
            int failed = 0;
            for (ReferenceCheck.Outcome o : outcomes) {
                String worst = o.name().startsWith("identity") || Double.isNaN(o.worstUnits()) ? "" : String.format(Locale.ROOT,
                        ", worst %.3f units of the reference's last digit", o.worstUnits());
                out.println((o.passed() ? "PASS  " : "FAIL  ") + o.name() + "  (" + o.source() + "): " + o.count() + " values" + worst);
                for (String f : o.failures()) {
                    out.println("      " + f);
                }
                failed += o.passed() ? 0 : 1;
            }
            out.println(failed == 0 ? "odetab check: all " + outcomes.size() + " sources pass"
                    : "odetab check: " + failed + " of " + outcomes.size() + " sources FAIL");
            return failed == 0 ? Main.OK : Main.DIFFERENCE;
        } catch (ReferenceCheck.DataError e) {
            err.println("odetab: " + e.getMessage());
            return Main.BAD_INPUT;
        } catch (IOException e) {
            err.println("odetab: cannot read the reference data: " + e.getMessage());
            return Main.BAD_INPUT;
        } finally {
            out.flush();
        }
    }
}
