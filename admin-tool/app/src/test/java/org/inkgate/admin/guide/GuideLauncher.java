package org.inkgate.admin.guide;

import java.util.List;
import org.inkgate.admin.cli.InkgateAdmin;
import picocli.CommandLine;

/**
 * What {@code admin-tool/app/inkgate-admin} runs in {@link GuideExamplesTest}'s folder: the real
 * command line, except that a command that opens a window ({@code gui}, {@code preview},
 * {@code rate desk}) is parsed by the real command tree and not opened (the test has no screen to
 * look at); a wrong command or option name there still fails with picocli's exit code 2.
 */
public final class GuideLauncher {

    private GuideLauncher() {
    }

    public static void main(String[] args) {
        List<String> a = List.of(args);
        boolean window = !a.isEmpty() && (a.get(0).equals("gui") || a.get(0).equals("preview")
                || (a.size() > 1 && a.get(0).equals("rate") && a.get(1).equals("desk")));
        if (!window) {
            InkgateAdmin.main(args);
            return;
        }
        CommandLine cl = InkgateAdmin.commandLine();
        try {
            cl.parseArgs(args);
            System.out.println("window command parsed, not opened: " + String.join(" ", args));
            System.exit(0);
        } catch (CommandLine.ParameterException e) {
            System.err.println(e.getMessage());
            System.exit(2);
        }
    }
}
