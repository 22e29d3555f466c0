package dev.odetab.emit;

import freemarker.cache.ClassTemplateLoader;
import freemarker.cache.FileTemplateLoader;
import freemarker.cache.TemplateLoader;
import freemarker.core.TemplateClassResolver;
import freemarker.template.Configuration;
import freemarker.template.SimpleObjectWrapper;
import freemarker.template.Template;
import freemarker.template.TemplateException;
import freemarker.template.TemplateExceptionHandler;
import java.io.IOException;
import java.io.StringWriter;
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

    /** Renders a built-in template ({@code c_header.ftl}, …) from the jar. */
    static byte[] renderBuiltIn(String name, Map<String, Object> model) throws TemplateProblem {
        return render(configuration(new ClassTemplateLoader(TemplateEngine.class, "/templates")), name, "templates/" + name, model);
    }

    /** Renders a user's template file. */
    static byte[] renderFile(Path template, Map<String, Object> model) throws TemplateProblem {
        try {
            Path dir = template.toAbsolutePath().getParent();
            return render(configuration(new FileTemplateLoader(dir.toFile())), template.getFileName().toString(),
                    template.toString(), model);
        } catch (IOException e) {
            throw new TemplateProblem(template.toString(), "cannot read the template: " + e.getMessage());
        }
    }

    private static byte[] render(Configuration cfg, String name, String display, Map<String, Object> model) throws TemplateProblem {
        try {
            Template t = cfg.getTemplate(name);
            StringWriter out = new StringWriter();
            t.process(model, out);
            return out.toString().getBytes(StandardCharsets.UTF_8);
        } catch (freemarker.core.ParseException e) {
            throw new TemplateProblem(display + ":" + e.getLineNumber() + ":" + e.getColumnNumber(),
                    "template syntax: " + firstLine(e.getEditorMessage()));
        } catch (TemplateException e) {
            String where = e.getLineNumber() == null ? display : display + ":" + e.getLineNumber() + ":" + e.getColumnNumber();
            throw new TemplateProblem(where, "template error: " + firstLine(e.getMessageWithoutStackTop()));
        } catch (IOException e) {
            throw new TemplateProblem(display, "cannot read the template: " + e.getMessage());
        }
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
