package dev.odetab.cli;

import dev.odetab.numeric.Rational;
import dev.odetab.base.InputError;

/** Reading exact points from the command line. */
final class Points {
    private Points() {
    }

    /**
     * The exact point of the argument {@code text} at 1-based position {@code argumentIndex};
     * an argument that starts like an option ({@code -x}, {@code --digts}) is named as an unknown
     * option, since negative points are taken without {@code --}.
     */
    static Rational parse(String text, int argumentIndex) throws InputError {
        if (text.matches("--?[A-Za-z].*")) {
            throw new InputError(InputError.argument(argumentIndex, text, 1),
                    "unknown option '" + text + "' (see odetab eval --help; a point is a number such as -1/3)");
        }
        try {
            return Rational.parse(text);
        } catch (NumberFormatException e) {
            throw new InputError(InputError.argument(argumentIndex, text, 1), e.getMessage());
        }
    }
}
