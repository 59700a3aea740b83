package org.inkgate.admin.cli;

import java.io.Console;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.ParameterException;

/**
 * Passphrases and PINs: asked on the terminal without echo, or taken from an environment
 * variable named on the command line (for scripts), never from the command line itself, where
 * other users of the machine could read them in the process list.
 */
final class Secrets {

    private Secrets() {
    }

    static char[] read(CommandSpec spec, String envName, String prompt, boolean confirm) {
        if (envName != null) {
            String value = System.getenv(envName);
            if (value == null || value.isEmpty()) {
                throw new ParameterException(spec.commandLine(), "the environment variable " + envName
                        + " is not set or empty; set it or leave the option out to be asked");
            }
            return value.toCharArray();
        }
        Console console = System.console();
        if (console == null) {
            throw new ParameterException(spec.commandLine(), "no terminal to ask for the " + prompt
                    + "; run in a terminal or name an environment variable holding it (see --help)");
        }
        char[] first = console.readPassword("%s: ", prompt);
        if (confirm) {
            char[] again = console.readPassword("%s again: ", prompt);
            if (!java.util.Arrays.equals(first, again)) {
                throw new ParameterException(spec.commandLine(), "the two entries differ; nothing was changed");
            }
        }
        return first;
    }
}
