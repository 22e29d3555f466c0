package dev.odetab.cli;

import dev.odetab.numeric.Rational;
import dev.odetab.base.InputError;

/** Reading exact points from the command line. */
final class Points {
    private Points() {
    }

    static Rational parse(String text, int argumentIndex) throws InputError {
        try {
            return Rational.parse(text);
        } catch (NumberFormatException e) {
            throw new InputError(InputError.argument(argumentIndex, text, 1), e.getMessage());
        }
    }
}
