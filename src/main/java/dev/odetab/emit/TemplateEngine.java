package dev.odetab.emit;

import freemarker.cache.ClassTemplateLoader;
import freemarker.cache.FileTemplateLoader;
import freemarker.cache.TemplateLoader;
import freemarker.core.InvalidReferenceException;
import freemarker.core.TemplateClassResolver;
import freemarker.template.Configuration;
import freemarker.template.MalformedTemplateNameException;
import freemarker.template.SimpleObjectWrapper;
import freemarker.template.Template;
import freemarker.template.TemplateException;
import freemarker.template.TemplateExceptionHandler;
import freemarker.template.TemplateNotFoundException;
import java.io.IOException;
import java.io.OutputStream;
import java.io.OutputStreamWriter;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.Locale;
import java.util.Map;

/**
 * FreeMarker, locked down: templates get plain maps, lists and strings
 * ({@link SimpleObjectWrapper}: no Java object is exposed), {@code ?new} resolves no class,
 * {@code ?api} is off, errors are rethrown (never written into the output), output is UTF-8
 * with {@code Locale.ROOT}. Built-in templates are read from the jar ({@code /templates},
 * copied there from the repository's {@code templates/}); a user's template only from its
 * own folder.
 */
final class TemplateEngine {
    private TemplateEngine() {
    }

    /** A template problem, located in the template file. */
    static final class TemplateProblem extends Exception {
        private static final long serialVersionUID = 1L;
        private final String where;

        TemplateProblem(String where, String message) {
            super(message);
            this.where = where;
        }

        String where() {
            return where;
        }
    }

    private static Configuration configuration(TemplateLoader loader) {
        Configuration cfg = new Configuration(Configuration.VERSION_2_3_33);
        cfg.setTemplateLoader(loader);
        cfg.setObjectWrapper(new SimpleObjectWrapper(Configuration.VERSION_2_3_33));
        cfg.setNewBuiltinClassResolver(TemplateClassResolver.ALLOWS_NOTHING_RESOLVER);
        cfg.setAPIBuiltinEnabled(false);
        cfg.setTemplateExceptionHandler(TemplateExceptionHandler.RETHROW_HANDLER);
        cfg.setLogTemplateExceptions(false);
        cfg.setWrapUncheckedExceptions(true);
        cfg.setFallbackOnNullLoopVariable(false);
        cfg.setLocale(Locale.ROOT);
        cfg.setDefaultEncoding("UTF-8");
        cfg.setOutputEncoding("UTF-8");
        cfg.setNumberFormat("computer");
        cfg.setLocalizedLookup(false);
        return cfg;
    }

    /** Renders a built-in template ({@code c_header.ftl}, …) from the jar into {@code out} (UTF-8). */
    static void renderBuiltIn(String name, Map<String, Object> model, OutputStream out) throws TemplateProblem, IOException {
        render(configuration(new ClassTemplateLoader(TemplateEngine.class, "/templates")), name, "templates/" + name, model, out);
    }

    /** Renders a user's template file into {@code out} (UTF-8). */
    static void renderFile(Path template, Map<String, Object> model, OutputStream out) throws TemplateProblem, IOException {
        Configuration cfg;
        try {
            cfg = configuration(new FileTemplateLoader(template.toAbsolutePath().getParent().toFile()));
        } catch (IOException e) {
            throw new TemplateProblem(template.toString(), "cannot read the template: " + e.getMessage());
        }
        render(cfg, template.getFileName().toString(), template.toString(), model, out);
    }

    /**
     * Writes the output as FreeMarker produces it, so nothing of it is held in memory; a
     * failure to write {@code out} is an {@link IOException}, a failure to read or run the
     * template a {@link TemplateProblem}.
     */
    private static void render(Configuration cfg, String name, String display, Map<String, Object> model, OutputStream out)
            throws TemplateProblem, IOException {
        Template t;
        try {
            t = cfg.getTemplate(name);
        } catch (freemarker.core.ParseException e) {
            throw new TemplateProblem(display + ":" + e.getLineNumber() + ":" + e.getColumnNumber(),
                    "template syntax: " + firstLine(e.getEditorMessage()));
        } catch (IOException e) {
            throw new TemplateProblem(display, "cannot read the template: " + e.getMessage());
        } catch (SecurityException e) {
            throw new TemplateProblem(display, "the template resolves outside its folder (a symbolic link may not leave it)");
        }
        Writer w = new OutputStreamWriter(out, StandardCharsets.UTF_8);
        try {
            t.process(model, w);
        } catch (TemplateException e) {
            String where = e.getLineNumber() == null ? display : display + ":" + e.getLineNumber() + ":" + e.getColumnNumber();
            throw new TemplateProblem(where, "template error: " + cause(e));
        } catch (SecurityException e) {
            throw new TemplateProblem(display, "template error: an included template resolves outside the template's folder"
                    + " (a symbolic link may not leave it)");
        }
        w.flush();
    }

    /**
     * What went wrong, named in our words where FreeMarker's text would not say it plainly: an
     * undefined variable, an included or imported template that does not exist or lies outside
     * the template's folder.
     */
    private static String cause(TemplateException e) {
        if (e instanceof InvalidReferenceException && e.getBlamedExpressionString() != null) {
            return "'" + e.getBlamedExpressionString() + "' is not defined (the template model is listed in DEVELOPERS.md,"
                    + " \"How to add a template\")";
        }
        for (Throwable c = e.getCause(); c != null; c = c.getCause()) {
            if (c instanceof TemplateNotFoundException nf) {
                String name = nf.getTemplateName();
                return "the included template '" + name + "' " + (name.startsWith("../") || name.contains("/../")
                        ? "lies outside the template's folder" : "does not exist in the template's folder");
            }
            if (c instanceof MalformedTemplateNameException bad) {
                return "the included template '" + bad.getTemplateName() + "' lies outside the template's folder";
            }
            if (c instanceof SecurityException) {
                return "an included template resolves outside the template's folder (a symbolic link may not leave it)";
            }
        }
        return firstLine(e.getMessageWithoutStackTop());
    }

    private static String firstLine(String s) {
        if (s == null) {
            return "unknown problem";
        }
        String t = s.strip();
        int nl = t.indexOf('\n');
        return nl < 0 ? t : t.substring(0, nl);
    }
}
