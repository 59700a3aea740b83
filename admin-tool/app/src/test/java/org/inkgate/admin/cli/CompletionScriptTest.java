package org.inkgate.admin.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.concurrent.TimeUnit;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The generated completion script is real bash: bash itself loads it and completes the first word
 * and a subcommand's options from it (bash's own completion machinery, not our reading of it).
 */
class CompletionScriptTest {

    @TempDir
    Path dir;

    private String bash(Path script, String words, int cword) throws Exception {
        String program = "source " + script + "\n"
                + "COMP_WORDS=(" + words + "); COMP_CWORD=" + cword + "; COMP_LINE=\"" + words + "\"; COMP_POINT=${#COMP_LINE}\n"
                + "fn=$(complete -p inkgate-admin | sed 's/.*-F \\([^ ]*\\).*/\\1/')\n"
                + "\"$fn\" inkgate-admin\n"
                + "printf '%s\\n' \"${COMPREPLY[@]}\"\n";
        Process p = new ProcessBuilder("bash", "-c", program).redirectErrorStream(true).start();
        String out = new String(p.getInputStream().readAllBytes(), StandardCharsets.UTF_8);
        assertTrue(p.waitFor(30, TimeUnit.SECONDS));
        assertEquals(0, p.exitValue(), out);
        return out;
    }

    @Test
    void script_loadedByBash_completesCommandsAndOptions() throws Exception {
        Path script = dir.resolve("inkgate-admin-completion.bash");
        CompletionScript.main(new String[] {script.toString()});

        String commands = bash(script, "inkgate-admin co", 1);
        assertTrue(commands.lines().toList().contains("collect"), commands);

        String options = bash(script, "inkgate-admin collect --st", 2);
        assertTrue(options.lines().toList().contains("--store"), options);

        String nested = bash(script, "inkgate-admin rate sheet ex", 3);
        assertTrue(nested.lines().toList().contains("export"), nested);
    }
}
