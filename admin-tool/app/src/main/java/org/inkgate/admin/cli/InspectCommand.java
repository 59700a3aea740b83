package org.inkgate.admin.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.concurrent.Callable;
import org.inkgate.admin.core.keys.OwnerKeyStore;
import org.inkgate.format.archive.SafeZipReader;
import org.inkgate.format.bundle.BundleManifest;
import org.inkgate.format.bundle.BundleReader;
import org.inkgate.format.bundle.FormSlot;
import org.inkgate.format.bundle.FormSpec;
import org.inkgate.format.bundle.OpenedBundle;
import org.inkgate.format.bundle.PackRef;
import org.inkgate.format.bundle.TaskSpec;
import org.inkgate.format.crypto.Fingerprint;
import org.inkgate.format.json.Json;
import org.inkgate.format.refusal.FormatRefusal;
import org.inkgate.format.response.OpenedResponse;
import org.inkgate.format.response.ResponsePackageReader;
import org.inkgate.format.response.TaskResponse;
import org.inkgate.format.trust.TrustPolicy;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/** {@code inspect}: checks a bundle or response package completely and prints what it holds. */
@Command(name = "inspect", description = "Check an exam bundle (.inkexam) or response package (.inkresp) and print"
        + " its contents. A package's contents need the owner keys (--keys).")
final class InspectCommand implements Callable<Integer> {
    @Spec
    CommandSpec spec;

    @Parameters(paramLabel = "FILE", description = "the .inkexam or .inkresp file")
    Path file;

    @Option(names = "--keys", paramLabel = "DIR", description = "owner key folder: compares a bundle's signer with"
            + " your key; opens a package")
    Path keys;

    @Option(names = "--passphrase-env", paramLabel = "VAR", description = "environment variable holding the key passphrase")
    String passphraseEnv;

    @Override
    public Integer call() throws Exception {
        PrintWriter w = spec.commandLine().getOut();
        String name = file.getFileName().toString();
        try {
            if (name.endsWith(".inkexam")) {
                return bundle(w);
            }
            if (name.endsWith(".inkresp")) {
                return responsePackage(w);
            }
        } catch (FormatRefusal refusal) {
            spec.commandLine().getErr().println("REFUSED (" + refusal.getClass().getSimpleName() + "): " + refusal.getMessage());
            return InkgateAdmin.PROBLEMS;
        }
        spec.commandLine().getErr().println(name + ": not an .inkexam or .inkresp file");
        return 2;
    }

    private int bundle(PrintWriter w) throws Exception {
        try (OpenedBundle b = new BundleReader(TrustPolicy.anySigner()).open(file)) {
            BundleManifest m = b.manifest();
            w.println(file + ": exam bundle, every check passed (signature, digests, entry names, rules).");
            w.println("  signed by      " + b.signerFingerprint());
            boolean notMine = false;
            if (keys != null) {
                String mine = new OwnerKeyStore(keys).publicKeys().signingFingerprint();
                notMine = !Fingerprint.normalise(mine).equals(Fingerprint.normalise(b.signerFingerprint()));
                w.println(!notMine
                        ? "  signer         matches your signing key in " + keys
                        : "  signer         DOES NOT match your signing key (" + mine + "): do not use this bundle as yours");
            } else {
                w.println("                 (compare with the published fingerprint; --keys compares with yours)");
            }
            w.println("  manifest       SHA-256 " + b.manifestSha256());
            w.println("  exam           " + TerminalText.value(m.examId()) + " \"" + TerminalText.value(m.title()) + "\" ("
                    + TerminalText.value(m.language()) + ")"
                    + (m.practice() ? ", practice" : ", live") + (m.sealed() ? ", SEALED" : ""));
            for (TaskSpec t : m.tasks()) {
                w.println("  task           " + TerminalText.value(t.id()) + " \"" + TerminalText.value(t.title()) + "\", " + (t.timeLimitSeconds() / 60) + " min");
            }
            for (FormSpec f : m.forms()) {
                StringBuilder s = new StringBuilder("  form           " + f.id() + ":");
                for (FormSlot slot : f.slots()) {
                    s.append(' ').append(slot.taskId()).append('[').append(slot.conditionId()).append(", tools ")
                            .append(slot.policy().offeredTools().isEmpty() ? "none" : String.join(" ", slot.policy().offeredTools()
                                    .stream().sorted().map(t -> t.name().toLowerCase(java.util.Locale.ROOT)).toList()))
                            .append(']');
                }
                w.println(TerminalText.value(s));
            }
            for (PackRef p : m.packs()) {
                w.println("  pack           " + p.id() + " (" + p.kind() + " " + p.version() + ") " + p.file() + " sha256 " + p.sha256());
            }
            w.println("  roster         " + m.roster().size() + " candidates");
            w.println("  entries        " + m.entries().size());
            if (notMine) {
                // a bundle someone else signed is not usable as this owner's: scripts must see it in the exit code
                return InkgateAdmin.PROBLEMS;
            }
        }
        return InkgateAdmin.OK;
    }

    private int responsePackage(PrintWriter w) throws Exception {
        if (keys == null) {
            try (SafeZipReader zip = SafeZipReader.open(file, ResponsePackageReader.defaultLimits())) {
                var envelope = Json.tree(file.getFileName().toString(), "envelope.json",
                        zip.read(zip.entry("envelope.json").orElseThrow(() -> new IllegalArgumentException(
                                "no envelope.json: not a response package"))));
                w.println(file + ": response package (contents not checked: give --keys to decrypt and verify).");
                w.println("  package id     " + envelope.path("packageId").asText());
                w.println("  encrypted to   " + envelope.path("recipient").asText());
            }
            return InkgateAdmin.OK;
        }
        OwnerKeyStore store = new OwnerKeyStore(keys);
        char[] pass = Secrets.read(spec, passphraseEnv, "key passphrase", false);
        OpenedResponse r = new ResponsePackageReader(store.encryptionKey(pass), TrustPolicy.anySigner()).open(file);
        var d = r.response();
        w.println(file + ": response package, every check passed (decryption, signature, digests, event chain).");
        w.println("  installation   " + r.installationFingerprint() + " (compare with the seat's enrolled installation)");
        w.println("  package id     " + d.packageId());
        w.println("  exam / form    " + d.examId() + " / " + d.formId() + ", bundle manifest " + d.bundleManifestSha256());
        w.println("  candidate      " + d.candidateNumber() + " at seat " + d.seat());
        w.println("  submitted      " + d.submittedAt());
        for (TaskResponse t : d.tasks()) {
            w.println("  task           " + t.taskId() + " [" + t.conditionId() + "] " + t.wordCount() + " words, ended "
                    + t.endReason().name().toLowerCase(java.util.Locale.ROOT) + ", tools offered "
                    + (t.toolsOffered().isEmpty() ? "none" : String.join(" ", t.toolsOffered().stream().sorted()
                            .map(x -> x.name().toLowerCase(java.util.Locale.ROOT)).toList())));
        }
        w.println("  events         " + r.events().size());
        return InkgateAdmin.OK;
    }
}
