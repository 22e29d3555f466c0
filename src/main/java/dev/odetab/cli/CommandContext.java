package dev.odetab.cli;

import java.util.List;

/** The raw arguments of the current command line, to name an argument's position in messages. */
final class CommandContext {
    private static List<String> args = List.of();

    private CommandContext() {
    }

    static void set(List<String> raw) {
        args = List.copyOf(raw);
    }

    /** The argument at a 1-based position, or null. */
    static String at(int index) {
        return index >= 1 && index <= args.size() ? args.get(index - 1) : null;
    }

    /** 1-based position of the first argument equal to {@code text} at or after {@code from}, or 0. */
    static int indexOf(String text, int from) {
        for (int i = Math.max(0, from - 1); i < args.size(); i++) {
            if (args.get(i).equals(text)) {
                return i + 1;
            }
        }
        return 0;
    }
}
