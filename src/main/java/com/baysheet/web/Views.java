package com.baysheet.web;

import io.javalin.http.Context;
import io.javalin.rendering.FileRenderer;
import org.jetbrains.annotations.NotNull;
import org.thymeleaf.TemplateEngine;
import org.thymeleaf.context.WebContext;
import org.thymeleaf.templatemode.TemplateMode;
import org.thymeleaf.templateresolver.ClassLoaderTemplateResolver;
import org.thymeleaf.web.servlet.JakartaServletWebApplication;

import java.util.HashMap;
import java.util.Locale;
import java.util.Map;
import java.util.Set;

/** Thymeleaf templates from classpath:templates/, rendered with a WebContext so that @{...} links work. */
final class Views implements FileRenderer {
    private final TemplateEngine engine = new TemplateEngine();
    private volatile JakartaServletWebApplication application;

    Views() {
        ClassLoaderTemplateResolver r = new ClassLoaderTemplateResolver();
        r.setPrefix("templates/");
        r.setSuffix(".html");
        r.setTemplateMode(TemplateMode.HTML);
        r.setCharacterEncoding("UTF-8");
        r.setCacheable(true);
        engine.setTemplateResolver(r);
    }

    @NotNull
    @Override
    public String render(@NotNull String template, @NotNull Map<String, ?> model, @NotNull Context ctx) {
        return engine.process(template, context(model, ctx));
    }

    /** One fragment of a template ({@code th:fragment="name"}) alone, for the parts of a kept page rendered per request. */
    String fragment(String template, String fragment, Map<String, ?> model, Context ctx) {
        return engine.process(template, Set.of(fragment), context(model, ctx));
    }

    private WebContext context(Map<String, ?> model, Context ctx) {
        if (application == null) application = JakartaServletWebApplication.buildApplication(ctx.req().getServletContext());
        return new WebContext(application.buildExchange(ctx.req(), ctx.res()), Locale.US, new HashMap<>(model));
    }
}
