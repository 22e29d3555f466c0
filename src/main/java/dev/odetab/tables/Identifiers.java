package dev.odetab.tables;

import java.util.Locale;
import java.util.Set;

/**
 * The identifiers the outputs derive from a table's or a column's name, and the words a table
 * name may not be: the name lower-cased is the C prefix of every array and the file name of the
 * C outputs (a template may use it alone), upper-cased the prefix of the C macros, and in
 * CamelCase the Java class name.
 */
public final class Identifiers {
    private Identifiers() {
    }

    /** The Java class name: {@code ai_fine} → {@code AiFine}. */
    public static String className(String name) {
        StringBuilder sb = new StringBuilder();
        boolean up = true;
        for (char ch : name.toCharArray()) {
            if (ch == '_') {
                up = true;
            } else {
                sb.append(up ? Character.toUpperCase(ch) : ch);
                up = false;
            }
        }
        return sb.toString();
    }

    /** The Java accessor of a column: {@code value_hi} → {@code valueHi}. */
    public static String accessor(String name) {
        String c = className(name);
        return Character.toLowerCase(c.charAt(0)) + c.substring(1);
    }

    /**
     * C keywords of C99 (ISO/IEC 9899:1999 6.4.1) and C23, C++ keywords (the header declares its
     * arrays inside {@code extern "C"} for C++), Java's keywords and literals (JLS 17 §3.9, §3.10)
     * with the contextual words that cannot name a variable or a type.
     */
    private static final Set<String> KEYWORDS = Set.of(
            // C99, and C23's new keywords
            "auto", "break", "case", "char", "const", "continue", "default", "do", "double", "else", "enum", "extern",
            "float", "for", "goto", "if", "inline", "int", "long", "register", "restrict", "return", "short", "signed",
            "sizeof", "static", "struct", "switch", "typedef", "union", "unsigned", "void", "volatile", "while",
            "alignas", "alignof", "bool", "constexpr", "false", "nullptr", "static_assert", "thread_local", "true",
            "typeof", "typeof_unqual",
            // C++ beyond the above
            "and", "and_eq", "asm", "bitand", "bitor", "catch", "char8_t", "char16_t", "char32_t", "class", "compl",
            "concept", "const_cast", "consteval", "constinit", "co_await", "co_return", "co_yield", "decltype", "delete",
            "dynamic_cast", "explicit", "export", "friend", "mutable", "namespace", "new", "noexcept", "not", "not_eq",
            "operator", "or", "or_eq", "private", "protected", "public", "reinterpret_cast", "requires", "static_cast",
            "template", "this", "throw", "try", "typeid", "typename", "using", "virtual", "wchar_t", "xor", "xor_eq",
            // Java beyond the above
            "abstract", "assert", "boolean", "byte", "extends", "final", "finally", "implements", "import",
            "instanceof", "interface", "native", "package", "strictfp", "super", "synchronized", "throws", "transient",
            "null", "var", "yield", "record", "sealed", "permits");

    /**
     * Names of java.lang types that the Java output refers to or that a class of the default
     * package must not hide ({@code String} names the element type of decimal columns).
     */
    private static final Set<String> JAVA_LANG_TYPES = Set.of("Object", "String", "Class", "System", "Math", "Integer",
            "Long", "Short", "Byte", "Double", "Float", "Character", "Boolean", "Number", "Void", "Override",
            "Deprecated", "SuppressWarnings", "Exception", "RuntimeException", "Error", "Throwable");

    /**
     * Why the table name {@code name} (already a letter followed by letters, digits and '_') cannot
     * name the outputs' identifiers, or null when it can.
     */
    public static String problem(String name) {
        String className = className(name);
        String lower = name.toLowerCase(Locale.ROOT);
        if (KEYWORDS.contains(lower)) {
            return "table name '" + name + "' would make the identifier '" + lower
                    + "', a reserved word of C, C++ or Java (choose another name)";
        }
        if (JAVA_LANG_TYPES.contains(className)) {
            return "table name '" + name + "' would make the Java class '" + className
                    + "', which hides java.lang." + className + " (choose another name)";
        }
        return null;
    }
}
