package dev.odetab.audit;

import dev.odetab.numeric.Format;
import dev.odetab.base.InputError;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Set;

/**
 * Array literals in C or Java source: {@code const float t[N] = { … };},
 * {@code static final double[] T = { … };}, {@code new double[] { … }}.
 *
 * <p>Trust level: Exact. The file is tokenized (comments, string and character literals and
 * preprocessor lines skipped); every {@code {} that follows {@code =} (or {@code = new T[]})
 * opens an array named by the identifier before the {@code =}. Entries are numeric literals
 * with an optional sign and optional casts ({@code (short) 0x3c00}), or the C and Java names of
 * infinity when the format has one. NaN, any other token and nested initializers are bad input
 * located as {@code file:line:column}, as are an unterminated array or comment.
 */
final class ArrayReader {
    private static final Set<String> INFINITY = Set.of("INFINITY", "HUGE_VAL", "HUGE_VALF", "HUGE_VALL",
            "Double.POSITIVE_INFINITY", "Float.POSITIVE_INFINITY");
    private static final Set<String> NEGATIVE_INFINITY = Set.of("Double.NEGATIVE_INFINITY", "Float.NEGATIVE_INFINITY");
    private static final Set<String> NAN = Set.of("NAN", "NANF", "Double.NaN", "Float.NaN");

    private record Token(String text, char kind, int line, int column) {
    }

    /** An array found in the file: its name and the tokens between its braces. */
    record Array(String name, int line, int column, List<Token> body) {
    }

    private ArrayReader() {
    }

    /**
     * Exact: the entries of the array chosen by {@code column} (an array whose name, compared
     * without case, equals it or ends with {@code _column}), or the only array of the file.
     *
     * @throws InputError with {@code file:line:column} for every malformed input
     */
    static Entries read(String display, String text, String column, Format format) throws InputError {
        List<Array> arrays = arrays(display, tokens(display, text));
        if (arrays.isEmpty()) {
            throw new InputError(display, "no array literal ('= { … }') found");
        }
        List<Array> chosen = new ArrayList<>();
        for (Array a : arrays) {
            String n = a.name().toLowerCase(Locale.ROOT);
            String c = column.toLowerCase(Locale.ROOT);
            if (n.equals(c) || n.endsWith("_" + c)) {
                chosen.add(a);
            }
        }
        if (chosen.isEmpty() && arrays.size() == 1) {
            chosen.add(arrays.get(0));
        }
        if (chosen.size() != 1) {
            List<String> names = new ArrayList<>();
            arrays.forEach(a -> names.add(a.name()));
            throw new InputError(display, (chosen.isEmpty() ? "no array matches" : "several arrays match")
                    + " the column '" + column + "' (arrays: " + String.join(", ", names) + "); choose one with --column NAME");
        }
        return new Entries(display, chosen.get(0).name(), entries(display, chosen.get(0), format), null);
    }

    /** Exact: the held values of the entries of one array, in order. */
    private static List<Entries.Item> entries(String display, Array a, Format format) throws InputError {
        List<Entries.Item> items = new ArrayList<>();
        List<Token> b = a.body();
        int i = 0;
        while (i < b.size()) {
            Token first = b.get(i);
            while (i + 2 < b.size() && b.get(i).text().equals("(") && b.get(i + 1).kind() == 'i') {
                int j = i + 1;
                while (j < b.size() && b.get(j).kind() == 'i') {
                    j++;
                }
                if (j >= b.size() || !b.get(j).text().equals(")")) {
                    break;
                }
                i = j + 1;
            }
            boolean negative = false;
            if (i < b.size() && (b.get(i).text().equals("-") || b.get(i).text().equals("+"))) {
                negative = b.get(i).text().equals("-");
                i++;
            }
            if (i >= b.size()) {
                throw at(display, first, "an entry is missing after '" + first.text() + "'");
            }
            Token t = b.get(i);
            Entries.Item item;
            if (t.kind() == 'n') {
                Literal lit = Literal.parse(t.text());
                if (lit == null) {
                    throw at(display, t, "'" + t.text() + "' is not a numeric literal");
                }
                try {
                    item = Held.of((negative ? "-" : "") + t.text(), t.line(), t.column(), lit, negative, format, true);
                } catch (Held.NotHeld e) {
                    throw at(display, t, e.getMessage());
                }
            } else if (t.kind() == 'i' && (INFINITY.contains(t.text()) || NEGATIVE_INFINITY.contains(t.text()))) {
                if (format.kind() != Format.Kind.BINARY) {
                    throw at(display, t, t.text() + " is not a value of " + format.name());
                }
                item = new Entries.Item(t.text(), t.line(), t.column(), null, negative != NEGATIVE_INFINITY.contains(t.text()));
            } else if (t.kind() == 'i' && NAN.contains(t.text())) {
                throw at(display, t, "NaN is not allowed in a table of values");
            } else if (t.text().equals("{")) {
                throw at(display, t, "nested initializers are not supported: audit one array of numbers");
            } else {
                throw at(display, t, "unexpected '" + t.text() + "' (expected a number)");
            }
            items.add(item);
            i++;
            if (i < b.size()) {
                if (!b.get(i).text().equals(",")) {
                    throw at(display, b.get(i), "unexpected '" + b.get(i).text() + "' (expected ',' or '}')");
                }
                i++;
            }
        }
        return items;
    }

    /** Exact: the arrays of the token stream, with their bodies (depth-matched braces). */
    private static List<Array> arrays(String display, List<Token> ts) throws InputError {
        List<Array> r = new ArrayList<>();
        for (int i = 0; i < ts.size(); i++) {
            if (!ts.get(i).text().equals("{")) {
                continue;
            }
            int eq = i - 1;
            if (eq >= 3 && ts.get(eq).text().equals("]") && ts.get(eq - 1).text().equals("[")) {
                int k = eq - 2;
                while (k >= 0 && ts.get(k).kind() == 'i' && !ts.get(k).text().equals("new")) {
                    k--;
                }
                eq = k >= 1 && ts.get(k).text().equals("new") ? k - 1 : -1;
            }
            if (eq < 1 || !ts.get(eq).text().equals("=")) {
                continue;
            }
            int k = eq - 1;
            while (k >= 0 && ts.get(k).text().equals("]")) {
                while (k >= 0 && !ts.get(k).text().equals("[")) {
                    k--;
                }
                k--;
            }
            if (k < 0 || ts.get(k).kind() != 'i') {
                continue;
            }
            int depth = 0;
            int end = -1;
            for (int j = i; j < ts.size(); j++) {
                String s = ts.get(j).text();
                depth += s.equals("{") ? 1 : s.equals("}") ? -1 : 0;
                if (depth == 0) {
                    end = j;
                    break;
                }
            }
            Token open = ts.get(i);
            if (end < 0) {
                throw at(display, open, "the array '" + ts.get(k).text() + "' opened here is never closed (no matching '}')");
            }
            r.add(new Array(ts.get(k).text(), open.line(), open.column(), ts.subList(i + 1, end)));
            i = end;
        }
        return r;
    }

    /**
     * Exact: tokens: identifiers (Java qualified names joined, kind 'i'), numbers (kind 'n'),
     * punctuation (kind 'p'); comments, strings, character literals and preprocessor lines
     * are dropped.
     */
    private static List<Token> tokens(String display, String s) throws InputError {
        List<Token> r = new ArrayList<>();
        int line = 1;
        int lineStart = 0;
        boolean lineHasToken = false;
        int i = 0;
        while (i < s.length()) {
            char c = s.charAt(i);
            int col = i - lineStart + 1;
            int next;
            if (c == '\n') {
                lineHasToken = false;
                next = i + 1;
            } else if (Character.isWhitespace(c)) {
                next = i + 1;
            } else if (c == '#' && !lineHasToken) {
                next = preprocessorEnd(s, i);
            } else if (s.startsWith("//", i)) {
                next = s.indexOf('\n', i) < 0 ? s.length() : s.indexOf('\n', i);
            } else if (s.startsWith("/*", i)) {
                int end = s.indexOf("*/", i + 2);
                if (end < 0) {
                    throw new InputError(display + ":" + line + ":" + col, "unterminated comment");
                }
                next = end + 2;
            } else if (c == '"' || c == '\'') {
                next = quotedEnd(s, i);
                if (next < 0) {
                    throw new InputError(display + ":" + line + ":" + col, "unterminated " + (c == '"' ? "string" : "character") + " literal");
                }
                lineHasToken = true;
                i = next; // as before, a backslash-newline inside a literal does not advance the line count
                continue;
            } else {
                char kind = startsNumber(s, i) ? 'n' : Character.isJavaIdentifierStart(c) ? 'i' : 'p';
                next = kind == 'n' ? numberEnd(s, i) : kind == 'i' ? identifierEnd(s, i) : i + 1;
                r.add(new Token(s.substring(i, next), kind, line, col));
                lineHasToken = true;
            }
            for (int k = i; k < next; k++) {
                if (s.charAt(k) == '\n') {
                    line++;
                    lineStart = k + 1;
                }
            }
            i = next;
        }
        return r;
    }

    /** The end of a preprocessor line that starts at i, continued by backslash-newline (its final newline excluded). */
    private static int preprocessorEnd(String s, int i) {
        int j = i;
        while (j < s.length() && s.charAt(j) != '\n') {
            j += s.charAt(j) == '\\' && j + 1 < s.length() && s.charAt(j + 1) == '\n' ? 2 : 1;
        }
        return j;
    }

    /** Just past the closing quote of the string or character literal at i, or −1 when the line or text ends first. */
    private static int quotedEnd(String s, int i) {
        char quote = s.charAt(i);
        int j = i + 1;
        while (j < s.length() && s.charAt(j) != quote && s.charAt(j) != '\n') {
            j += s.charAt(j) == '\\' ? 2 : 1;
        }
        return j < s.length() && s.charAt(j) == quote ? j + 1 : -1;
    }

    private static boolean startsNumber(String s, int i) {
        char c = s.charAt(i);
        return Character.isDigit(c) || (c == '.' && i + 1 < s.length() && Character.isDigit(s.charAt(i + 1)));
    }

    /** The end of the numeric literal at i: letters, digits, '.', '_' and the sign after an exponent mark. */
    private static int numberEnd(String s, int i) {
        int j = i;
        while (j < s.length()) {
            char d = s.charAt(j);
            boolean sign = (d == '+' || d == '-') && j > i && exponentMark(s, i, j - 1);
            if (!(Character.isLetterOrDigit(d) || d == '.' || d == '_' || sign)) {
                break;
            }
            j++;
        }
        return j;
    }

    /** The end of the identifier at i, Java qualified names ({@code Double.NaN}) joined. */
    private static int identifierEnd(String s, int i) {
        int j = i;
        while (j < s.length() && (Character.isJavaIdentifierPart(s.charAt(j))
                || (s.charAt(j) == '.' && j + 1 < s.length() && Character.isJavaIdentifierStart(s.charAt(j + 1))))) {
            j++;
        }
        return j;
    }

    /** Exact: whether s[k] is the exponent mark of the number starting at {@code start} (e/E, or p/P in hex). */
    private static boolean exponentMark(String s, int start, int k) {
        char e = s.charAt(k);
        boolean hex = s.length() > start + 1 && s.charAt(start) == '0' && (s.charAt(start + 1) == 'x' || s.charAt(start + 1) == 'X');
        return hex ? e == 'p' || e == 'P' : e == 'e' || e == 'E';
    }

    private static InputError at(String display, Token t, String what) {
        return new InputError(display + ":" + t.line() + ":" + t.column(), what);
    }
}
