package dev.odetab.cli;

import dev.odetab.ode.family.Catalog;
import dev.odetab.ode.family.Family;
import java.io.PrintWriter;
import java.util.concurrent.Callable;
import picocli.CommandLine;
import picocli.CommandLine.Command;

/** {@code odetab families}: every built-in family with its equation, its parameters and their ranges. */
@Command(name = "families", mixinStandardHelpOptions = true,
        description = {"List the built-in families: name, what it is and its source, the equation, and each parameter",
            "with its meaning and allowed values (give them with -p NAME=VALUE to eval and inspect, or as keys in a spec)."})
final class FamiliesCommand implements Callable<Integer> {
    @CommandLine.Spec
    CommandLine.Model.CommandSpec spec;

    @Override
    public Integer call() {
        PrintWriter out = spec.commandLine().getOut();
        for (String name : Catalog.names()) {
            Family f = Catalog.lookup(name).orElseThrow();
            out.println(name + "  " + f.title());
            out.println("    equation   " + f.equation());
            if (f.parameters().isEmpty()) {
                out.println("    parameters none");
            }
            for (Family.Parameter p : f.parameters()) {
                out.println("    " + p.name() + " (" + p.meaning() + "): " + p.allowed());
            }
        }
        out.flush();
        return Main.OK;
    }
}
