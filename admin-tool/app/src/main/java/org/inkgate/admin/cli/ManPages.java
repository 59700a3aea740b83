package org.inkgate.admin.cli;

import java.io.File;
import java.io.IOException;
import picocli.codegen.docgen.manpage.ManPageGenerator;

/**
 * Writes the manual pages of {@code inkgate-admin} and every subcommand, one AsciiDoc man-page
 * source per command ({@code inkgate-admin-collect.adoc}, ...), from the same command tree the
 * launcher runs and the completion script is made from, with picocli-codegen's ManPageGenerator.
 * The build runs it at package time into {@code target/man}; {@code asciidoctor -b manpage} turns
 * a page into troff for {@code man} (docs/test-owner-guide.md, "Manual pages").
 */
public final class ManPages {

    private ManPages() {
    }

    /** Writes every page into {@code folder}; returns picocli's exit code (0 when all were written). */
    public static int write(File folder) throws IOException {
        if (!folder.isDirectory() && !folder.mkdirs()) {
            throw new IOException("cannot create " + folder);
        }
        return ManPageGenerator.generateManPage(folder, null, new boolean[0], true,
                InkgateAdmin.commandLine().getCommandSpec());
    }

    /** Usage: {@code ManPages FOLDER}. */
    public static void main(String[] args) throws IOException {
        System.exit(write(new File(args[0])));
    }
}
