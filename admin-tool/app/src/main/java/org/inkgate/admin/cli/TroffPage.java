package org.inkgate.admin.cli;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import picocli.CommandLine;
import picocli.CommandLine.Model.ArgSpec;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Model.OptionSpec;
import picocli.CommandLine.Model.PositionalParamSpec;

/**
 * One command's manual page in troff with the man macros, the form {@code man} reads, made from the
 * command's picocli definition (the same one the launcher runs and picocli-codegen's AsciiDoc
 * pages come from), so no other tool is needed to read the pages. Sections: NAME, SYNOPSIS,
 * DESCRIPTION, ARGUMENTS, OPTIONS, COMMANDS, EXIT STATUS, SEE ALSO (see man-pages(7) for the usual
 * order). Text from the definitions is escaped so that it can never be read as a troff request.
 */
final class TroffPage {

    private final CommandSpec spec;
    private final String version;
    private final StringBuilder out = new StringBuilder();

    private TroffPage(CommandSpec spec, String version) {
        this.spec = spec;
        this.version = version;
    }

    /** The page's file name in a man1 folder, e.g. {@code inkgate-admin-collect.1}. */
    static String fileName(CommandSpec spec) {
        return spec.qualifiedName("-") + ".1";
    }

    static String render(CommandSpec spec, String version) {
        return new TroffPage(spec, version).page();
    }

    private String page() {
        String name = spec.qualifiedName("-");
        line(".TH " + quoted(name.toUpperCase(java.util.Locale.ROOT)) + " 1 \"\" " + quoted("Inkgate " + version)
                + " \"Inkgate manual\"");
        section("NAME");
        line(escape(name) + " \\- " + escape(summary()));
        synopsis();
        description();
        arguments();
        options();
        commands();
        exitStatus();
        seeAlso();
        return out.toString();
    }

    private String summary() {
        String[] d = spec.usageMessage().description();
        String first = d.length > 0 ? plain(d[0]) : "";
        int stop = first.indexOf(". ");
        return stop > 0 ? first.substring(0, stop + 1) : first;
    }

    private void synopsis() {
        section("SYNOPSIS");
        StringBuilder s = new StringBuilder(".B ").append(quoted(spec.qualifiedName(" ")));
        line(s.toString());
        List<String> parts = new ArrayList<>();
        if (!visibleOptions().isEmpty()) {
            parts.add("[\\fIoptions\\fR]");
        }
        for (PositionalParamSpec p : spec.positionalParameters()) {
            if (!p.hidden()) {
                String label = "\\fI" + escape(p.paramLabel()) + "\\fR" + (p.arity().max() > 1 ? "..." : "");
                parts.add(p.arity().min() == 0 ? "[" + label + "]" : label);
            }
        }
        if (!spec.subcommands().isEmpty()) {
            parts.add("\\fIcommand\\fR");
        }
        if (!parts.isEmpty()) {
            line(String.join(" ", parts));
        }
    }

    private void description() {
        String[] d = spec.usageMessage().description();
        if (d.length == 0) {
            return;
        }
        section("DESCRIPTION");
        for (int i = 0; i < d.length; i++) {
            if (i > 0) {
                line(".PP");
            }
            paragraph(plain(d[i]));
        }
    }

    private void arguments() {
        List<PositionalParamSpec> shown = spec.positionalParameters().stream().filter(p -> !p.hidden()).toList();
        if (shown.isEmpty()) {
            return;
        }
        section("ARGUMENTS");
        for (PositionalParamSpec p : shown) {
            line(".TP");
            line("\\fI" + escape(p.paramLabel()) + "\\fR");
            describe(p);
        }
    }

    private void options() {
        List<OptionSpec> shown = visibleOptions();
        if (shown.isEmpty()) {
            return;
        }
        section("OPTIONS");
        for (OptionSpec o : shown) {
            line(".TP");
            List<String> names = new ArrayList<>();
            for (String n : o.names()) {
                names.add("\\fB" + escape(n) + "\\fR");
            }
            String label = o.typeInfo().isBoolean() || o.arity().max() == 0 ? ""
                    : " \\fI" + escape(o.paramLabel()) + "\\fR";
            line(String.join(", ", names) + label);
            describe(o);
        }
    }

    private void describe(ArgSpec a) {
        String text = plain(String.join(" ", a.description()));
        if (text.isBlank()) {
            text = "(no description)";
        }
        paragraph(text);
    }

    private void commands() {
        if (spec.subcommands().isEmpty()) {
            return;
        }
        section("COMMANDS");
        spec.subcommands().values().stream().distinct().filter(c -> !c.getCommandSpec().usageMessage().hidden())
                .forEach(c -> {
                    line(".TP");
                    line("\\fB" + escape(c.getCommandName()) + "\\fR");
                    paragraph(new TroffPage(c.getCommandSpec(), version).summary() + " See \\fB"
                            + escape(c.getCommandSpec().qualifiedName("-")) + "\\fR(1).", false);
                });
    }

    private void exitStatus() {
        Map<String, String> codes = spec.usageMessage().exitCodeList();
        if (codes.isEmpty()) {
            return;
        }
        section("EXIT STATUS");
        codes.forEach((code, meaning) -> {
            line(".TP");
            line(escape(plain(code).trim()));
            paragraph(plain(meaning).trim());
        });
    }

    private void seeAlso() {
        List<String> refs = new ArrayList<>();
        if (spec.parent() != null) {
            refs.add("\\fB" + escape(spec.parent().qualifiedName("-")) + "\\fR(1)");
        }
        spec.subcommands().values().stream().distinct()
                .forEach(c -> refs.add("\\fB" + escape(c.getCommandSpec().qualifiedName("-")) + "\\fR(1)"));
        if (refs.isEmpty()) {
            return;
        }
        section("SEE ALSO");
        line(String.join(",\n", refs));
    }

    private List<OptionSpec> visibleOptions() {
        return spec.options().stream().filter(o -> !o.hidden()).toList();
    }

    private void section(String title) {
        line(".SH " + title);
    }

    private void paragraph(String text) {
        paragraph(text, true);
    }

    /** Text lines, one sentence per line as man-pages(7) asks; escaped unless already troff. */
    private void paragraph(String text, boolean escapeIt) {
        for (String l : text.split("\n")) {
            if (l.isBlank()) {
                line(".PP");
            } else {
                line(escapeIt ? escape(l.strip()) : l.strip());
            }
        }
    }

    private void line(String l) {
        out.append(l).append('\n');
    }

    /** A definition's text without picocli's markup and format specifiers. */
    static String plain(String s) {
        String t = CommandLine.Help.Ansi.OFF.string(s);
        return t.replace("%n", "\n").replace("%%", "%");
    }

    /** Escapes a text so troff prints it as written: backslashes, hyphens, and a leading dot or quote. */
    static String escape(String s) {
        StringBuilder b = new StringBuilder();
        for (int i = 0; i < s.length(); i++) {
            char c = s.charAt(i);
            if (c == '\\') {
                b.append("\\e");
            } else if (c == '-') {
                b.append("\\-");
            } else if (c < 0x20 && c != '\t') {
                b.append(' ');
            } else {
                b.append(c);
            }
        }
        String t = b.toString();
        return t.startsWith(".") || t.startsWith("'") ? "\\&" + t : t;
    }

    private static String quoted(String s) {
        return "\"" + escape(s).replace("\"", "\\(dq") + "\"";
    }
}
