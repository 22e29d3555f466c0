package dev.odetab.emit;

/**
 * Text that reaches a generated C or Java source, made safe for the place it goes: the one
 * place where strings of the spec (its path, title, function names) and of odetab become parts
 * of an emitted source. The template model ({@link EmitModel}) holds no other free text.
 *
 * <p>A comment-safe text may be placed inside a C99 or Java block comment (and a Javadoc
 * comment) without ending it or changing what the compiler reads:
 * <ul>
 * <li>every {@code \} is doubled, so no {@code \}{@code u} is left that javac would translate
 * before it looks for the end of a comment (JLS 17 §3.3: a backslash begins a Unicode escape
 * only when an even number of backslashes precedes it);</li>
 * <li>{@code *}{@code /} becomes {@code *\/}, which ends neither a C comment (C99 6.4.9) nor a
 * Java one, and {@code /}{@code *} becomes {@code /\*} (compilers warn about a comment opened
 * inside a comment);</li>
 * <li>control characters (C0, DEL, C1), the line and paragraph separators, the byte order mark,
 * the Unicode bidirectional controls (which can make code read differently from what compiles)
 * and unpaired surrogates are written {@code <U+XXXX>}.</li>
 * </ul>
 * Any other character, ASCII or not, is kept, so odetab's own text (an en dash in "Gauss–Hermite")
 * is unchanged.
 */
public final class SourceText {
    private SourceText() {
    }

    /** {@code raw} made safe inside a C or Java comment (see the class comment). */
    public static String comment(String raw) {
        StringBuilder sb = new StringBuilder(raw.length());
        for (int i = 0; i < raw.length(); i++) {
            char c = raw.charAt(i);
            if (c == '\\') {
                sb.append("\\\\");
            } else if (c == '*' && i + 1 < raw.length() && raw.charAt(i + 1) == '/') {
                sb.append("*\\/");
                i++;
            } else if (c == '/' && i + 1 < raw.length() && raw.charAt(i + 1) == '*') {
                sb.append("/\\*");
                i++;
            } else if (Character.isHighSurrogate(c) && i + 1 < raw.length() && Character.isLowSurrogate(raw.charAt(i + 1))) {
                sb.append(c).append(raw.charAt(i + 1));
                i++;
            } else if (mustEscape(c)) {
                sb.append(String.format(java.util.Locale.ROOT, "<U+%04X>", (int) c));
            } else {
                sb.append(c);
            }
        }
        return sb.toString();
    }

    private static boolean mustEscape(char c) {
        return c < 0x20 || (c >= 0x7F && c <= 0x9F) || Character.isSurrogate(c)
                || c == '\u2028' || c == '\u2029' || c == '\uFEFF'
                || c == '\u061C' || c == '\u200E' || c == '\u200F'
                || (c >= '\u202A' && c <= '\u202E') || (c >= '\u2066' && c <= '\u2069');
    }
}
