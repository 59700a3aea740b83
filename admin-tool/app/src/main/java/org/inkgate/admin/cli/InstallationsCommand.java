package org.inkgate.admin.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.time.Instant;
import java.util.List;
import java.util.concurrent.Callable;
import org.inkgate.admin.core.installations.InstallationList;
import org.inkgate.format.enrolment.InstallationEnrolment;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/**
 * {@code installations enrol} and {@code installations list}: the client installations whose
 * response packages {@code collect --installations FILE} trusts.
 */
@Command(name = "installations", mixinStandardHelpOptions = true, description = "Enrol client installations from the enrolment files the invigilator"
        + " hands over (inkgate-client --installation writes them), or list the enrolled ones.",
        subcommands = {InstallationsCommand.Enrol.class, InstallationsCommand.ListEnrolled.class})
final class InstallationsCommand {

    @Command(name = "enrol", mixinStandardHelpOptions = true, description = "Check each enrolment file's signature and add its installation to the"
            + " installations list (created when missing). If any file is damaged, changed or not an enrolment"
            + " file, nothing is added.")
    static final class Enrol implements Callable<Integer> {
        @Spec
        CommandSpec spec;

        @Option(names = "--list", required = true, paramLabel = "FILE", description = "the installations list that"
                + " collect --installations FILE reads")
        Path list;

        @Parameters(paramLabel = "ENROLMENT", arity = "1..*", description = "enrolment files (.inkenrol)")
        List<Path> files;

        @Override
        public Integer call() throws Exception {
            PrintWriter out = spec.commandLine().getOut();
            int added = 0;
            for (InstallationList.Enrolled result : InstallationList.enrol(list, files, Instant.now())) {
                switch (result) {
                    case InstallationList.Enrolled.Added a -> {
                        added++;
                        out.println("enrolled   " + a.enrolment().fingerprint() + "  " + label(a.enrolment()));
                    }
                    case InstallationList.Enrolled.AlreadyThere t ->
                        out.println("already in " + t.enrolment().fingerprint() + "  " + label(t.enrolment()));
                }
            }
            out.println(added + " installation" + (added == 1 ? "" : "s") + " added to " + list + ". Collect with"
                    + "  --installations " + list + "  to trust exactly these installations.");
            return InkgateAdmin.OK;
        }

        private static String label(InstallationEnrolment e) {
            String machine = e.machine().isEmpty() ? "(no label)" : InstallationList.shown(e.machine(), 80);
            return machine + (e.hostName().isEmpty() ? "" : " (host " + InstallationList.shown(e.hostName(), 80) + ")")
                    + ", written " + e.createdAt();
        }
    }

    @Command(name = "list", mixinStandardHelpOptions = true, description = "List the installations in an installations list, with their notes.")
    static final class ListEnrolled implements Callable<Integer> {
        @Spec
        CommandSpec spec;

        @Option(names = "--list", required = true, paramLabel = "FILE", description = "the installations list")
        Path list;

        @Override
        public Integer call() throws Exception {
            PrintWriter out = spec.commandLine().getOut();
            List<InstallationList.Entry> entries = InstallationList.read(list);
            for (InstallationList.Entry e : entries) {
                out.println(e.fingerprint() + (e.note().isEmpty() ? "" : "  " + InstallationList.shown(e.note(), 200)));
            }
            out.println(entries.size() + " installation" + (entries.size() == 1 ? "" : "s") + " enrolled in " + list + ".");
            return InkgateAdmin.OK;
        }
    }
}
