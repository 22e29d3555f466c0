package dev.odetab.tables;

/** The identifiers the outputs derive from a table's or a column's name. */
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
}
