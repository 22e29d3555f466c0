package dev.odetab.demo;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Locale;

/**
 * Writes tables/inherited/ai_legacy.c the way an old firmware tool might have: Ai by its
 * Maclaurin series (DLMF 9.4.1) truncated after a fixed number of terms, every operation in
 * binary32, printed with 9 significant digits. Not part of the product; run by hand:
 * {@code java -cp target/test-classes dev.odetab.demo.LegacyAiryTable tables/inherited/ai_legacy.c}.
 */
public final class LegacyAiryTable {
    private LegacyAiryTable() {
    }

    /** Ai(x) = c1 f(x) − c2 g(x), f and g each truncated after {@code terms} terms, in float. */
    static float ai(float x, int terms) {
        final float c1 = 0.35502805f;
        final float c2 = 0.25881940f;
        float x3 = x * x * x;
        float f = 1f;
        float g = x;
        float tf = 1f;
        float tg = x;
        for (int k = 1; k < terms; k++) {
            tf = tf * x3 / ((3 * k - 1) * (3 * k));
            tg = tg * x3 / ((3 * k) * (3 * k + 1));
            f += tf;
            g += tg;
        }
        return c1 * f - c2 * g;
    }

    public static void main(String[] args) throws IOException {
        StringBuilder sb = new StringBuilder();
        sb.append("/* ai_table.c -- Airy Ai lookup for the caustic fit (QI-LS200 firmware, made by qi-aitab 1.3, a QI in-house script) */\n");
        sb.append("#include <stdint.h>\n\n#define AI_TABLE_LEN 97   /* x = -4 .. 2 step 1/16 */\n");
        sb.append("#define AI_TABLE_X0 (-4.0f)\n\n");
        sb.append("const float ai_table[AI_TABLE_LEN] = {\n");
        for (int i = 0; i <= 96; i++) {
            float x = -4f + i / 16f;
            sb.append(String.format(Locale.ROOT, "    %.9ef,%s\n", ai(x, 12), i % 16 == 0 ? " // x = " + x : ""));
        }
        sb.append("};\n");
        Files.writeString(Path.of(args[0]), sb.toString());
    }
}
