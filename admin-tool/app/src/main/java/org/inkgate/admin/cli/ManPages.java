package org.inkgate.admin.cli;

import java.io.File;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import picocli.CommandLine;
import picocli.codegen.docgen.manpage.ManPageGenerator;

/**
 * Writes the manual pages of {@code inkgate-admin} and every subcommand, one AsciiDoc man-page
 * source per command ({@code inkgate-admin-collect.adoc}, ...), from the same command tree the
 * launcher runs and the completion script is made from, with picocli-codegen's ManPageGenerator.
 * The build runs it at package time into {@code target/man}, and writes the same pages in troff
 * into {@code target/man/man1} ({@link TroffPage}) for {@code man} (docs/test-owner-guide.md,
 * "Manual pages").
 */
public final class ManPages {

    private ManPages() {
    }

    /**
     * Writes every page into {@code folder}: the AsciiDoc sources, and beside them in {@code man1/}
     * the troff pages {@code man} reads ({@code man -M folder inkgate-admin-collect}); returns
     * picocli's exit code (0 when all were written).
     */
    public static int write(File folder) throws IOException {
        if (!folder.isDirectory() && !folder.mkdirs()) {
            throw new IOException("cannot create " + folder);
        }
        CommandLine root = InkgateAdmin.commandLine();
        int code = ManPageGenerator.generateManPage(folder, null, new boolean[0], true, root.getCommandSpec());
        Path man1 = folder.toPath().resolve("man1");
        Files.createDirectories(man1);
        String version = org.inkgate.packs.cli.ReleaseVersion.number();
        for (CommandLine c : everyCommand(root, new ArrayList<>())) {
            Files.writeString(man1.resolve(TroffPage.fileName(c.getCommandSpec())),
                    TroffPage.render(c.getCommandSpec(), version), StandardCharsets.UTF_8);
        }
        return code;
    }

    private static List<CommandLine> everyCommand(CommandLine c, List<CommandLine> out) {
        out.add(c);
        c.getSubcommands().values().stream().distinct().forEach(s -> everyCommand(s, out));
        return out;
    }

    /** Usage: {@code ManPages FOLDER}. */
    public static void main(String[] args) throws IOException {
        System.exit(write(new File(args[0])));
    }
}
