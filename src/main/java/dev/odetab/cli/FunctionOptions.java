package dev.odetab.cli;

import dev.odetab.ode.FunctionDef;
import dev.odetab.spec.FunctionResolver;
import dev.odetab.base.InputError;
import java.util.ArrayList;
import java.util.List;
import picocli.CommandLine.Option;

/** The {@code -p NAME=VALUE} options shared by commands that take a FUNCTION. */
final class FunctionOptions {
    @Option(names = {"-p", "--parameter"}, paramLabel = "NAME=VALUE",
            description = "a parameter of a built-in family, exact (n=20, a=-1/2, lambda=3/2)")
    List<String> parameters = new ArrayList<>();

    FunctionDef resolve(String function) throws InputError {
        int functionIndex = CommandContext.indexOf(function, 1);
        List<FunctionResolver.ParameterArg> args = new ArrayList<>();
        int from = 1;
        for (String p : parameters) {
            int i = CommandContext.indexOf(p, from);
            from = i + 1;
            args.add(new FunctionResolver.ParameterArg(p, i));
        }
        return FunctionResolver.resolve(function, functionIndex, args);
    }
}
