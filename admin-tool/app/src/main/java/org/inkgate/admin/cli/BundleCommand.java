package org.inkgate.admin.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.Callable;
import org.inkgate.admin.core.bundling.BundleBuilder;
import org.inkgate.admin.core.forms.Assignment;
import org.inkgate.admin.core.forms.AssignmentTable;
import org.inkgate.admin.core.keys.OwnerKeyStore;
import org.inkgate.admin.core.roster.RosterCandidate;
import org.inkgate.admin.core.roster.RosterReader;
import org.inkgate.admin.core.source.ExamSource;
import org.inkgate.admin.core.source.ExamSourceReader;
import org.inkgate.admin.core.source.InvalidSourceException;
import org.inkgate.format.crypto.Sha256;
import org.inkgate.packs.cli.ProgressReporter;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/** {@code bundle}: builds the signed (optionally sealed) exam bundle. */
@Command(name = "bundle", description = "Build a signed exam bundle (.inkexam) from an exam source, a roster and its"
        + " form assignment, embedding the packs the conditions name.")
final class BundleCommand implements Callable<Integer> {
    @Spec
    CommandSpec spec;

    @Parameters(paramLabel = "EXAM_DIR", description = "the exam source folder")
    Path folder;

    @Option(names = "--out", required = true, paramLabel = "FILE", description = "the bundle to write (.inkexam)")
    Path out;

    @Option(names = "--keys", required = true, paramLabel = "DIR", description = "the owner key folder")
    Path keys;

    @Option(names = "--roster", paramLabel = "CSV", description = "the roster (required for a live exam)")
    Path roster;

    @Option(names = "--assignment", paramLabel = "CSV", description = "the assignment table written by \"forms --out\"")
    Path assignment;

    @Option(names = "--seal", description = "encrypt prompts and packs under a new release code, printed once")
    boolean seal;

    @Option(names = "--passphrase-env", paramLabel = "VAR", description = "environment variable holding the key passphrase")
    String passphraseEnv;

    @Option(names = "--pin-env", paramLabel = "VAR", description = "environment variable holding the invigilator PIN")
    String pinEnv;

    @Override
    public Integer call() throws Exception {
        ExamSource exam;
        List<RosterCandidate> candidates = List.of();
        Assignment table = null;
        try {
            exam = ExamSourceReader.read(folder);
            if (roster != null) {
                candidates = RosterReader.read(roster);
                if (assignment == null) {
                    spec.commandLine().getErr().println("--roster needs --assignment: assign forms first with"
                            + " \"inkgate-admin forms " + folder + " --roster " + roster + " --out assignment.csv\"");
                    return 2;
                }
                table = AssignmentTable.read(assignment);
            }
        } catch (InvalidSourceException e) {
            spec.commandLine().getErr().println(e.getMessage());
            return InkgateAdmin.PROBLEMS;
        }
        OwnerKeyStore store = new OwnerKeyStore(keys);
        char[] pass = Secrets.read(spec, passphraseEnv, "key passphrase", false);
        char[] pin = exam.practice() ? null : Secrets.read(spec, pinEnv, "invigilator PIN for this sitting", true);
        BundleBuilder.Built built;
        try (ProgressReporter progress = ProgressReporter.onStandardError(spec.commandLine().getErr(), "bundle", "stages", 0)) {
            built = BundleBuilder.build(exam, candidates, table, store.publicKeys().ownerKeys(), store.signingKey(pass), pin,
                    seal, out, (done, total, what) -> {
                        progress.total(total);
                        progress.stepTo(done, what);
                    });
        } catch (InvalidSourceException e) {
            spec.commandLine().getErr().println(e.getMessage());
            return InkgateAdmin.PROBLEMS;
        }
        PrintWriter w = spec.commandLine().getOut();
        w.println("Bundle written: " + out);
        w.println("  exam " + built.manifest().examId() + ", " + built.manifest().forms().size() + " forms, "
                + built.manifest().roster().size() + " candidates, " + built.manifest().packs().size() + " packs");
        w.println("  signed by " + store.publicKeys().signingFingerprint());
        w.println("  file SHA-256 " + Sha256.hex(java.nio.file.Files.readAllBytes(out)));
        if (built.releaseCode() != null) {
            w.println("  SEALED. Release code (shown only now; give it to invigilators at start time, not with the file):");
            w.println("    " + new String(built.releaseCode()));
        }
        return InkgateAdmin.OK;
    }
}
