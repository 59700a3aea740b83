package org.inkgate.admin.cli;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import picocli.AutoComplete;

/**
 * Writes the bash (and zsh, through bashcompinit) completion script of {@code inkgate-admin} from
 * the same command tree the launcher runs, so it can never list a command or option the program
 * does not have. The build runs it at package time ({@code target/inkgate-admin-completion.bash}).
 */
public final class CompletionScript {

    private CompletionScript() {
    }

    /** The script's text. */
    public static String text() {
        return AutoComplete.bash("inkgate-admin", InkgateAdmin.commandLine());
    }

    /** Usage: {@code CompletionScript FILE}. */
    public static void main(String[] args) throws IOException {
        Path out = Path.of(args[0]);
        Files.createDirectories(out.toAbsolutePath().getParent());
        Files.writeString(out, text(), StandardCharsets.UTF_8);
    }
}
