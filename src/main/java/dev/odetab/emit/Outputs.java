package dev.odetab.emit;

import dev.odetab.tables.TableResult;
import java.nio.file.Path;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.ArrayList;
import java.util.HexFormat;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;

/**
 * Renders every output of a build into memory: file name (relative to the output folder) →
 * bytes, plus {@code manifest.json}. Nothing is written here; see {@link OutputWriter}.
 */
public final class Outputs {
    public static final String MANIFEST = "manifest.json";

    private final TreeMap<String, byte[]> files = new TreeMap<>();
    private final List<Map<String, Object>> manifestEntries = new ArrayList<>();
    private final String toolVersion;

    public Outputs(String toolVersion) {
        this.toolVersion = toolVersion;
    }

    /** A template problem (exit 2), located in the template. */
    public static final class TemplateError extends Exception {
        private static final long serialVersionUID = 1L;
        private final String where;

        TemplateError(String where, String message) {
            super(message);
            this.where = where;
        }

        public String where() {
            return where;
        }
    }

    /** An output name that two tables would both write. */
    public static final class ClashError extends Exception {
        private static final long serialVersionUID = 1L;

        ClashError(String message) {
            super(message);
        }
    }

    /** Renders the outputs the table asks for. */
    public void add(TableResult result, Provenance provenance, String specTitle) throws TemplateError, ClashError {
        Map<String, Object> model = EmitModel.of(result, provenance, specTitle);
        String name = result.table().name();
        for (String output : result.table().outputs()) {
            try {
                switch (output) {
                    case "csv" -> put(name + ".csv", CsvOutput.render(result), provenance);
                    case "c" -> {
                        put(name.toLowerCase(java.util.Locale.ROOT) + ".h", TemplateEngine.renderBuiltIn("c_header.ftl", model), provenance);
                        put(name.toLowerCase(java.util.Locale.ROOT) + ".c", TemplateEngine.renderBuiltIn("c_source.ftl", model), provenance);
                    }
                    case "java" -> put(EmitModel.className(name) + ".java", TemplateEngine.renderBuiltIn("java.ftl", model), provenance);
                    default -> {
                        Path p = Path.of(output);
                        put(userOutputName(name, p), TemplateEngine.renderFile(p, model), provenance);
                    }
                }
            } catch (TemplateEngine.TemplateProblem e) {
                throw new TemplateError(e.where(), e.getMessage());
            }
        }
    }

    /**
     * The file a user template writes: {@code NAME.EXT.ftl} gives {@code TABLE.EXT};
     * a template without an inner extension gives {@code TABLE.NAME.txt}.
     */
    static String userOutputName(String table, Path template) {
        String base = template.getFileName().toString();
        base = base.substring(0, base.length() - ".ftl".length());
        int dot = base.lastIndexOf('.');
        return dot > 0 ? table + base.substring(dot) : table + "." + base + ".txt";
    }

    private void put(String file, byte[] bytes, Provenance p) throws ClashError {
        if (files.containsKey(file) || file.equals(MANIFEST)) {
            throw new ClashError("two outputs of this build would both be written to " + file
                    + " (table names must differ across the specs of one build)");
        }
        files.put(file, bytes);
        Map<String, Object> entry = new LinkedHashMap<>();
        entry.put("path", file);
        entry.put("sha256", sha256(bytes));
        Map<String, Object> prov = new LinkedHashMap<>();
        prov.put("spec", p.specPath());
        prov.put("spec_sha256", p.specSha256());
        prov.put("table", p.table());
        prov.put("function", p.function());
        prov.put("equation", p.equation());
        prov.put("normalization", p.normalization());
        prov.put("grid", p.grid());
        prov.put("format", p.format());
        prov.put("rounding", p.rounding());
        prov.put("max_error_before_rounding", p.maxError());
        entry.put("provenance", prov);
        manifestEntries.add(entry);
    }

    /** Every file, the manifest included, by name. */
    public Map<String, byte[]> files() {
        TreeMap<String, byte[]> all = new TreeMap<>(files);
        List<Map<String, Object>> sorted = new ArrayList<>(manifestEntries);
        sorted.sort((a, b) -> a.get("path").toString().compareTo(b.get("path").toString()));
        Map<String, Object> manifest = new LinkedHashMap<>();
        manifest.put("tool", "odetab " + toolVersion);
        manifest.put("files", sorted);
        all.put(MANIFEST, Json.write(manifest).getBytes(java.nio.charset.StandardCharsets.UTF_8));
        return all;
    }

    public static String sha256(byte[] bytes) {
        try {
            return HexFormat.of().formatHex(MessageDigest.getInstance("SHA-256").digest(bytes));
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException("SHA-256 is required of every Java platform", e);
        }
    }
}
