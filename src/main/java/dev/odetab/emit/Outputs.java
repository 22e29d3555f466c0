package dev.odetab.emit;

import dev.odetab.base.Json;

import dev.odetab.base.Progress;
import dev.odetab.tables.Identifiers;
import dev.odetab.tables.TableDef;
import dev.odetab.tables.TableResult;
import java.io.BufferedOutputStream;
import java.io.IOException;
import java.io.OutputStream;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.security.DigestOutputStream;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.ArrayList;
import java.util.HexFormat;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.TreeMap;

/**
 * The outputs of one build, each rendered straight into a temporary file as it is produced
 * (its SHA-256 computed on the way, for {@code manifest.json}), so that memory does not grow
 * with the length of a table. {@link #commit} replaces the files on disk by them all or nothing
 * ({@link OutputFolder}: checks first, then a journal, so that a kill inside the commit is
 * completed by the next run); {@link #differences} compares them with the files on
 * disk for {@code --check}; {@link #close} deletes whatever was not committed, so a build that
 * fails at any point leaves every existing file as it was. A shutdown hook does the same when
 * the process is stopped (Ctrl-C, SIGTERM) while outputs are written.
 */
public final class Outputs implements AutoCloseable {
    public static final String MANIFEST = "manifest.json";

    private final Path dir;
    private final Path staging;
    /** The locked output folder (opened and closed by the caller), or null when checking. */
    private final OutputFolder folder;
    private final String toolVersion;
    private final Progress progress;
    private final Thread cleanup = new Thread(this::deleteUncommitted, "odetab: delete temporary outputs");
    private final TreeMap<String, Path> files = new TreeMap<>();
    private final List<Map<String, Object>> manifestEntries = new ArrayList<>();
    private boolean manifestStaged;
    private boolean closed;

    private Outputs(Path dir, Path staging, OutputFolder folder, String toolVersion, Progress progress) {
        this.dir = dir;
        this.staging = staging;
        this.folder = folder;
        this.toolVersion = toolVersion;
        this.progress = progress;
        Runtime.getRuntime().addShutdownHook(cleanup);
    }

    /**
     * Outputs to be written into an opened output folder (locked by the caller, who closes it
     * after this): temporary files go there, so that the final renames stay on one file
     * system. The entries written are reported to {@code progress}.
     */
    public static Outputs forWriting(OutputFolder folder, String toolVersion, Progress progress) {
        return new Outputs(folder.dir(), folder.dir(), folder, toolVersion, progress);
    }

    /**
     * Outputs to be compared with {@code dir} ({@code --check}): temporary files go to a fresh
     * folder in {@code java.io.tmpdir}, so that checking needs no write access to {@code dir}
     * and never touches it.
     */
    public static Outputs forChecking(Path dir, String toolVersion, Progress progress) throws IOException {
        Path staging = Files.createTempDirectory("odetab-check-");
        return new Outputs(dir, staging, null, toolVersion, progress);
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


    /** Writes the bytes of one output. */
    private interface Renderer {
        void render(OutputStream out) throws IOException, TemplateEngine.TemplateProblem;
    }

    /** Renders the outputs the table asks for; {@code javaPackage} is empty for the default package. */
    public void add(TableResult result, Provenance provenance, String specTitle, String javaPackage)
            throws TemplateError, IOException {
        Map<String, Object> model = EmitModel.of(result, provenance, specTitle, javaPackage, progress);
        String name = result.table().name();
        progress.start(name, entriesWritten(result));
        for (String output : result.table().outputs()) {
            List<String> files = fileNames(name, output);
            try {
                switch (output) {
                    case "csv" -> stage(files.get(0), provenance, out -> CsvOutput.render(result, out, progress));
                    case "c" -> {
                        stage(files.get(0), provenance, out -> TemplateEngine.renderBuiltIn("c_header.ftl", model, out));
                        stage(files.get(1), provenance, out -> TemplateEngine.renderBuiltIn("c_source.ftl", model, out));
                    }
                    case "java" -> stage(files.get(0), provenance, out -> TemplateEngine.renderBuiltIn("java.ftl", model, out));
                    default -> stage(files.get(0), provenance, out -> TemplateEngine.renderFile(Path.of(output), model, out));
                }
            } catch (TemplateEngine.TemplateProblem e) {
                throw new TemplateError(e.where(), e.getMessage());
            }
        }
    }

    /**
     * The entries the table's outputs write, as the progress counts them: each CSV row one per
     * column, each template one per element of every array (an estimate for a user template,
     * which may list an array any number of times, or none).
     */
    private static long entriesWritten(TableResult result) {
        long rows = result.rows().size();
        int columns = result.table().columns().size();
        int arrays = columns * Literals.parts(result.table().format()).size();
        long entries = 0;
        for (String output : result.table().outputs()) {
            entries += rows * (output.equals("csv") ? columns : arrays);
        }
        return entries;
    }

    /** The names of the files a table writes, in the order {@link #add} writes them. */
    public static List<String> fileNames(TableDef table) {
        List<String> names = new ArrayList<>();
        for (String output : table.outputs()) {
            names.addAll(fileNames(table.name(), output));
        }
        return names;
    }

    /** The files of one output of a table: {@code csv}, {@code c} (header, then source), {@code java}, or a template's path. */
    private static List<String> fileNames(String table, String output) {
        return switch (output) {
            case "csv" -> List.of(table + ".csv");
            case "c" -> List.of(table.toLowerCase(Locale.ROOT) + ".h", table.toLowerCase(Locale.ROOT) + ".c");
            case "java" -> List.of(Identifiers.className(table) + ".java");
            default -> List.of(userOutputName(table, Path.of(output)));
        };
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

    /** Renders one output; its name is new to this build ({@code build} refuses clashing names at the spec line, by {@link #fileNames}). */
    private void stage(String file, Provenance p, Renderer renderer) throws IOException, TemplateEngine.TemplateProblem {
        if (files.containsKey(file) || file.equals(MANIFEST)) {
            throw new IllegalStateException("two outputs of this build are named " + file + ", which the spec check refuses");
        }
        Map<String, Object> entry = new LinkedHashMap<>();
        entry.put("path", file);
        entry.put("sha256", stageBytes(file, renderer));
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

    /** Renders into a new temporary file registered under {@code file}; returns the SHA-256 of what was written. */
    private String stageBytes(String file, Renderer renderer) throws IOException, TemplateEngine.TemplateProblem {
        Path tmp;
        synchronized (this) {
            tmp = OutputFolder.createTemporary(staging);
            files.put(file, tmp);
        }
        MessageDigest md = sha256();
        try (OutputStream out = new BufferedOutputStream(new DigestOutputStream(Files.newOutputStream(tmp), md), 1 << 16)) {
            renderer.render(out);
        }
        return HexFormat.of().formatHex(md.digest());
    }

    private void stageManifest() throws IOException {
        if (manifestStaged) {
            return;
        }
        manifestStaged = true;
        List<Map<String, Object>> sorted = new ArrayList<>(manifestEntries);
        sorted.sort((a, b) -> a.get("path").toString().compareTo(b.get("path").toString()));
        Map<String, Object> manifest = new LinkedHashMap<>();
        manifest.put("tool", "odetab " + toolVersion);
        manifest.put("files", sorted);
        byte[] bytes = Json.write(manifest).getBytes(StandardCharsets.UTF_8);
        try {
            stageBytes(MANIFEST, out -> out.write(bytes));
        } catch (TemplateEngine.TemplateProblem e) {
            throw new IllegalStateException("the manifest has no template", e);
        }
    }

    /** Number of files of the build, the manifest included. */
    public int count() {
        return manifestEntries.size() + 1;
    }

    /** Files on disk that differ from what this build would write, the manifest included ({@link OutputWriter#differences}). */
    public List<String> differences() throws IOException {
        stageManifest();
        return OutputWriter.differences(dir, files);
    }

    /** Replaces the files in the output folder by every staged file, the manifest last ({@link OutputFolder#commit}). */
    public synchronized void commit() throws IOException {
        if (folder == null) {
            throw new IllegalStateException("outputs staged for --check are never committed");
        }
        stageManifest();
        Map<String, Path> ordered = new LinkedHashMap<>(files);
        ordered.remove(MANIFEST);
        ordered.put(MANIFEST, files.get(MANIFEST));
        folder.commit(ordered);
        files.clear();
    }

    /** Deletes every temporary file left; when checking, the staging folder too. */
    @Override
    public void close() throws IOException {
        try {
            Runtime.getRuntime().removeShutdownHook(cleanup);
        } catch (IllegalStateException e) {
            // the JVM is shutting down: the hook deletes them
            return;
        }
        deleteUncommitted();
    }

    private synchronized void deleteUncommitted() {
        if (closed) {
            return;
        }
        closed = true;
        try {
            for (Path tmp : files.values()) {
                Files.deleteIfExists(tmp);
            }
            files.clear();
            if (folder == null) {
                Files.deleteIfExists(staging);
            }
        } catch (IOException e) {
            throw new UncheckedIOException("cannot delete the temporary outputs: " + e.getMessage(), e);
        }
    }

    public static String sha256(byte[] bytes) {
        return HexFormat.of().formatHex(sha256().digest(bytes));
    }

    private static MessageDigest sha256() {
        try {
            return MessageDigest.getInstance("SHA-256");
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException("SHA-256 is required of every Java platform", e);
        }
    }
}
