package dev.odetab.expr;

import dev.odetab.base.ExprException;

import dev.odetab.numeric.Rational;
import java.math.BigDecimal;
import java.util.ArrayDeque;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.TreeSet;

/**
 * Tokenizer and recursive-descent parser shared by constants, rational functions and equations.
 * It builds a syntax tree with positions; the meaning (exactness, linearity in y) is checked
 * afterwards by the callers, so syntax errors are always reported before meaning errors.
 *
 * <pre>
 * equation := sum '=' sum
 * sum      := term (('+' | '-') term)*             (a leading sign is read by factor)
 * term     := factor (('*' | '/') factor | juxtaposed factor)*
 * factor   := ('-' | '+') factor | power
 * power    := primary ('^' factor)?                (so -2^2 = -4 and 2^3^2 = 2^9)
 * primary  := number | name | function '(' sum ')' | '(' sum ')'
 * </pre>
 * Juxtaposition means multiplication, with the precedence of '*', in exactly two cases: a
 * factor that is a bare number (optionally signed, no '^') followed by a name or '('
 * ({@code 2x}, {@code 3(x+1)}, {@code 2y'}, {@code 2pi}, {@code 2sqrt(3)}), and a factor that
 * ends with ')' (a parenthesized group or a call, no '^') followed by '(' ({@code (x-1)(x+1)}).
 *
 * <p>Limits (README, "Limits"): a tree at most {@link #MAX_DEPTH} levels deep, counting every
 * parenthesis, call, sign and power, and every operand of a chain of '+', '-', '*' and '/' (the
 * tree of {@code a + b + c} is {@code (a + b) + c}); the parser, and every walk of the tree after
 * it, recurses once per level, so deeper input would exhaust the stack.
 */
final class Syntax {
    /** Which variables a text may use. */
    enum Context {
        CONSTANT, RATIONAL_FUNCTION, EQUATION
    }

    static final List<String> FUNCTIONS = List.of("sqrt", "exp", "log", "gamma");

    /** A syntax-tree node: {@code start}/{@code end} is its 0-based source span, {@code column} its 1-based anchor. */
    sealed interface Node permits Num, Name, Neg, Bin, Call, Group {
        int start();

        int end();

        /** The 1-based column errors about this node point at: its operator or name. */
        int column();
    }

    record Num(Rational value, int start, int end) implements Node {
        public int column() {
            return start + 1;
        }
    }

    /** pi, x, y, y', y'' or a parameter. */
    record Name(String name, int start, int end) implements Node {
        public int column() {
            return start + 1;
        }
    }

    /** Unary minus; {@code start} is the position of '-'. */
    record Neg(Node operand, int start) implements Node {
        public int end() {
            return operand.end();
        }

        public int column() {
            return start + 1;
        }
    }

    /** Binary + - * / ^; {@code column} is the operator's, or the right factor's for a juxtaposition. */
    record Bin(char op, Node left, Node right, int column) implements Node {
        public int start() {
            return left.start();
        }

        public int end() {
            return right.end();
        }
    }

    record Call(String function, Node argument, int start, int end) implements Node {
        public int column() {
            return start + 1;
        }
    }

    /** A parenthesized expression; the span includes the parentheses. */
    record Group(Node inner, int start, int end) implements Node {
        public int column() {
            return start + 1;
        }
    }

    /** The parsed equation: two sides and the position of '='. */
    record EquationNode(Node left, Node right, int equalsColumn) {
    }

    private enum Kind {
        NUMBER, NAME, OP, END
    }

    private record Token(Kind kind, String text, int start, Rational value) {
        int column() {
            return start + 1;
        }

        boolean is(char c) {
            return kind == Kind.OP && text.charAt(0) == c;
        }

        String describe() {
            return kind == Kind.END ? "the end of the text" : "'" + text + "'";
        }
    }

    /** What may follow a factor by juxtaposition. */
    private enum Juxtaposable {
        NUMBER, CLOSE, NONE
    }

    private static final int MAX_DECIMAL_EXPONENT = 10_000;
    /** The deepest syntax tree accepted (see the class comment). */
    static final int MAX_DEPTH = 256;

    private final String text;
    private final Context context;
    private final Map<String, Rational> params;
    private final List<Token> tokens;
    private int pos;
    private Juxtaposable lastFactor = Juxtaposable.NONE;
    private int nesting;

    private Syntax(String text, Context context, Map<String, Rational> params) throws ExprException {
        this.text = text;
        this.context = context;
        this.params = params;
        for (String name : params.keySet()) {
            if (!name.matches("[A-Za-z_][A-Za-z0-9_]*") || FUNCTIONS.contains(name)
                    || List.of("pi", "x", "y").contains(name)) {
                throw new IllegalArgumentException("bad parameter name '" + name + "'");
            }
        }
        this.tokens = tokenize(text);
    }

    /** Parses a whole expression (constant or rational-function context). */
    static Node parseExpression(String text, Context context, Map<String, Rational> params) throws ExprException {
        Syntax s = new Syntax(text, context, params);
        if (s.peek().kind == Kind.END) {
            throw new ExprException(1, "the expression is empty");
        }
        Node n = s.sum("at the start of the text");
        s.expectEnd();
        checkDepth(n);
        return n;
    }

    /** Parses {@code sum = sum}. */
    static EquationNode parseEquation(String text, Map<String, Rational> params) throws ExprException {
        Syntax s = new Syntax(text, Context.EQUATION, params);
        if (s.peek().kind == Kind.END) {
            throw new ExprException(1, "the equation is empty");
        }
        if (s.peek().is('=')) {
            throw new ExprException(s.peek().column(), "the left-hand side is empty");
        }
        Node left = s.sum("at the start of the text");
        Token eq = s.peek();
        if (!eq.is('=')) {
            if (eq.kind == Kind.END) {
                throw new ExprException(eq.column(), "expected '=' after the left-hand side, found the end of the text");
            }
            s.unexpectedAfterOperand(eq, "an operator or '='");
        }
        s.pos++;
        Token first = s.peek();
        if (first.kind == Kind.END || first.is('=')) {
            throw new ExprException(first.column(), "the right-hand side is empty");
        }
        Node right = s.sum("after '='");
        Token end = s.peek();
        if (end.is('=')) {
            throw new ExprException(end.column(), "a second '=': an equation has exactly one '='");
        }
        s.expectEnd();
        checkDepth(left);
        checkDepth(right);
        return new EquationNode(left, right, eq.column());
    }

    /** Refuses a tree deeper than {@link #MAX_DEPTH}, at the column of its deepest node; iterative, so any depth is measured. */
    private static void checkDepth(Node root) throws ExprException {
        ArrayDeque<Node> nodes = new ArrayDeque<>();
        ArrayDeque<Integer> depths = new ArrayDeque<>();
        nodes.push(root);
        depths.push(1);
        while (!nodes.isEmpty()) {
            Node n = nodes.pop();
            int d = depths.pop();
            if (d > MAX_DEPTH) {
                throw tooDeep(n.column());
            }
            for (Node child : children(n)) {
                nodes.push(child);
                depths.push(d + 1);
            }
        }
    }

    private static List<Node> children(Node n) {
        if (n instanceof Neg m) {
            return List.of(m.operand());
        } else if (n instanceof Bin m) {
            return List.of(m.left(), m.right());
        } else if (n instanceof Call m) {
            return List.of(m.argument());
        } else if (n instanceof Group m) {
            return List.of(m.inner());
        }
        return List.of();
    }

    private static ExprException tooDeep(int column) {
        return new ExprException(column, "the expression nests deeper than " + MAX_DEPTH
                + " levels (each parenthesis, call, sign and power is a level, and each operand of a sum or product)");
    }

    /** True when the name y'' occurs anywhere in the tree. */
    static boolean mentionsSecondDerivative(Node n) {
        if (n instanceof Name m) {
            return m.name().equals("y''");
        } else if (n instanceof Neg m) {
            return mentionsSecondDerivative(m.operand());
        } else if (n instanceof Bin m) {
            return mentionsSecondDerivative(m.left()) || mentionsSecondDerivative(m.right());
        } else if (n instanceof Call m) {
            return mentionsSecondDerivative(m.argument());
        } else if (n instanceof Group m) {
            return mentionsSecondDerivative(m.inner());
        }
        return false;
    }

    private Token peek() {
        return tokens.get(pos);
    }

    private void expectEnd() throws ExprException {
        Token t = peek();
        if (t.kind != Kind.END) {
            unexpectedAfterOperand(t, "an operator or the end of the text");
        }
    }

    private void unexpectedAfterOperand(Token t, String expected) throws ExprException {
        if (t.is(')')) {
            throw new ExprException(t.column(), "unbalanced ')'");
        }
        String hint = "";
        if (t.kind == Kind.NAME || t.kind == Kind.NUMBER || t.is('(')) {
            hint = " (a product is written with '*'; juxtaposition is accepted only after a number, or between ')' and '(')";
        }
        throw new ExprException(t.column(), "expected " + expected + ", found " + t.describe() + hint);
    }

    private Node sum(String where) throws ExprException {
        Node left = term(where);
        while (peek().is('+') || peek().is('-')) {
            Token op = peek();
            pos++;
            Node right = term("after '" + op.text + "'");
            left = new Bin(op.text.charAt(0), left, right, op.column());
        }
        return left;
    }

    private Node term(String where) throws ExprException {
        Node left = factor(where);
        while (true) {
            Token t = peek();
            if (t.is('*') || t.is('/')) {
                pos++;
                Node right = factor("after '" + t.text + "'");
                left = new Bin(t.text.charAt(0), left, right, t.column());
            } else if ((lastFactor == Juxtaposable.NUMBER && (t.kind == Kind.NAME || t.is('(')))
                    || (lastFactor == Juxtaposable.CLOSE && t.is('('))) {
                Node right = factor("");
                left = new Bin('*', left, right, t.column());
            } else {
                return left;
            }
        }
    }

    private Node factor(String where) throws ExprException {
        Token t = peek();
        if (++nesting > MAX_DEPTH) {
            throw tooDeep(t.column());
        }
        try {
            return signedFactor(where, t);
        } finally {
            nesting--;
        }
    }

    private Node signedFactor(String where, Token t) throws ExprException {
        if (t.is('-') || t.is('+')) {
            pos++;
            Node operand = factor("after '" + t.text + "'");
            return t.is('-') ? new Neg(operand, t.start) : operand;
        }
        return power(where);
    }

    private Node power(String where) throws ExprException {
        Node base = primary(where);
        Token t = peek();
        if (t.is('^')) {
            pos++;
            Node exponent = factor("after '^'");
            lastFactor = Juxtaposable.NONE;
            return new Bin('^', base, exponent, t.column());
        }
        lastFactor = base instanceof Num ? Juxtaposable.NUMBER
                : (base instanceof Group || base instanceof Call) ? Juxtaposable.CLOSE : Juxtaposable.NONE;
        return base;
    }

    private Node primary(String where) throws ExprException {
        Token t = peek();
        switch (t.kind) {
            case NUMBER -> {
                pos++;
                return new Num(t.value, t.start, t.start + t.text.length());
            }
            case NAME -> {
                pos++;
                return name(t);
            }
            case OP -> {
                if (t.is('(')) {
                    pos++;
                    Node inner = sum("after '('");
                    int close = closeParen(t);
                    return new Group(inner, t.start, close + 1);
                }
            }
            default -> {
            }
        }
        String hint = t.is('*') && where.equals("after '*'") ? " (powers are written '^')" : "";
        throw new ExprException(t.column(),
                "expected a number, a name or '(' " + where + ", found " + t.describe() + hint);
    }

    /** Consumes the ')' matching the '(' token {@code open}; returns its 0-based position. */
    private int closeParen(Token open) throws ExprException {
        Token t = peek();
        if (!t.is(')')) {
            String hint = t.kind == Kind.NAME || t.kind == Kind.NUMBER || t.is('(')
                    ? " (a product is written with '*'; juxtaposition is accepted only after a number, or between ')' and '(')"
                    : "";
            throw new ExprException(t.column(), "expected ')' to close the '(' at column " + open.column()
                    + ", found " + t.describe() + hint);
        }
        pos++;
        return t.start;
    }

    private Node name(Token t) throws ExprException {
        String n = t.text;
        if (FUNCTIONS.contains(n)) {
            Token open = peek();
            if (!open.is('(')) {
                throw new ExprException(open.column(), "expected '(' after '" + n + "', found " + open.describe());
            }
            pos++;
            Node arg = sum("after '('");
            int close = closeParen(open);
            return new Call(n, arg, t.start, close + 1);
        }
        boolean known = n.equals("pi") || params.containsKey(n)
                || (n.equals("x") && context != Context.CONSTANT)
                || (context == Context.EQUATION && (n.equals("y") || n.equals("y'") || n.equals("y''")));
        if (known) {
            return new Name(n, t.start, t.start + n.length());
        }
        if (context == Context.EQUATION && n.startsWith("y'")) {
            throw new ExprException(t.column(),
                    "only y, y' and y'' may appear in a second-order equation, found " + n);
        }
        throw new ExprException(t.column(), "unknown name '" + n + "' (known: " + knownNames() + ")");
    }

    private String knownNames() {
        List<String> known = new ArrayList<>(List.of("pi", "sqrt", "exp", "log", "gamma"));
        if (context != Context.CONSTANT) {
            known.add("x");
        }
        if (context == Context.EQUATION) {
            known.addAll(List.of("y", "y'", "y''"));
        }
        known.addAll(new TreeSet<>(params.keySet()));
        return String.join(", ", known);
    }

    private static List<Token> tokenize(String text) throws ExprException {
        List<Token> out = new ArrayList<>();
        int i = 0;
        int n = text.length();
        while (i < n) {
            char c = text.charAt(i);
            if (c == ' ' || c == '\t') {
                i++;
            } else if (isDigit(c) || c == '.') {
                int end = numberEnd(text, i);
                String s = text.substring(i, end);
                out.add(new Token(Kind.NUMBER, s, i, decimal(s, i)));
                i = end;
            } else if (Character.isLetter(c) || c == '_') {
                int end = i + 1;
                while (end < n && (Character.isLetterOrDigit(text.charAt(end)) || text.charAt(end) == '_')) {
                    end++;
                }
                while (end < n && text.charAt(end) == '\'') {
                    end++;
                }
                out.add(new Token(Kind.NAME, text.substring(i, end), i, null));
                i = end;
            } else if ("+-*/^()=".indexOf(c) >= 0) {
                out.add(new Token(Kind.OP, String.valueOf(c), i, null));
                i++;
            } else {
                String shown = new String(Character.toChars(text.codePointAt(i)));
                throw new ExprException(i + 1, "unexpected character '" + shown + "'");
            }
        }
        out.add(new Token(Kind.END, "", n, null));
        return out;
    }

    private static boolean isDigit(char c) {
        return c >= '0' && c <= '9';
    }

    /** End of the number starting at {@code i}: digits, optional fraction, optional exponent. */
    private static int numberEnd(String s, int i) throws ExprException {
        int n = s.length();
        int j = i;
        int digits = 0;
        while (j < n && isDigit(s.charAt(j))) {
            j++;
            digits++;
        }
        if (j < n && s.charAt(j) == '.') {
            j++;
            int frac = 0;
            while (j < n && isDigit(s.charAt(j))) {
                j++;
                frac++;
            }
            if (frac == 0) {
                throw new ExprException(j + 1, "expected a digit after '.'");
            }
            digits += frac;
        }
        if (digits == 0) {
            throw new ExprException(i + 1, "expected a digit");
        }
        if (j < n && (s.charAt(j) == 'e' || s.charAt(j) == 'E')) {
            int k = j + 1;
            if (k < n && (s.charAt(k) == '+' || s.charAt(k) == '-')) {
                k++;
            }
            if (k < n && isDigit(s.charAt(k))) {
                while (k < n && isDigit(s.charAt(k))) {
                    k++;
                }
                j = k;
            }
        }
        return j;
    }

    private static Rational decimal(String s, int start) throws ExprException {
        BigDecimal d;
        try {
            d = new BigDecimal(s);
        } catch (NumberFormatException e) {
            throw new ExprException(start + 1, "the number " + s + " is out of range");
        }
        if (Math.abs((long) d.scale()) > MAX_DECIMAL_EXPONENT) {
            throw new ExprException(start + 1, "the number " + s + " is out of range (decimal exponent beyond "
                    + MAX_DECIMAL_EXPONENT + ")");
        }
        return Rational.of(d);
    }
}
