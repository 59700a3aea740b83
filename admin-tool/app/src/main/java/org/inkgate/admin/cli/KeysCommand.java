package org.inkgate.admin.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.concurrent.Callable;
import org.inkgate.admin.core.keys.OwnerKeyStore;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;

/** {@code keys init} and {@code keys show}: the test owner's signing and encryption keys. */
@Command(name = "keys", description = "Create or show the test owner's keys.",
        subcommands = {KeysCommand.Init.class, KeysCommand.Show.class})
final class KeysCommand {

    @Command(name = "init", description = "Create an Ed25519 signing key and an X25519 encryption key, private"
            + " halves encrypted under a passphrase (PKCS#8, PBES2).")
    static final class Init implements Callable<Integer> {
        @Spec
        CommandSpec spec;

        @Option(names = "--keys", required = true, paramLabel = "DIR", description = "folder for the key files (created)")
        Path folder;

        @Option(names = "--passphrase-env", paramLabel = "VAR",
                description = "take the passphrase from this environment variable instead of asking")
        String passphraseEnv;

        @Override
        public Integer call() throws Exception {
            char[] pass = Secrets.read(spec, passphraseEnv, "passphrase for the new keys (12 characters or more)", true);
            OwnerKeyStore.PublicKeys keys = new OwnerKeyStore(folder).init(pass);
            PrintWriter out = spec.commandLine().getOut();
            out.println("Keys created in " + folder);
            KeysCommand.print(out, keys);
            out.println("Publish the signing fingerprint to invigilators through a channel other than the exam media;");
            out.println("keep the passphrase and a backup of " + folder + " safe: without them responses cannot be opened.");
            return InkgateAdmin.OK;
        }
    }

    @Command(name = "show", description = "Show the public keys and their fingerprints (no passphrase needed).")
    static final class Show implements Callable<Integer> {
        @Spec
        CommandSpec spec;

        @Option(names = "--keys", required = true, paramLabel = "DIR", description = "the key folder")
        Path folder;

        @Override
        public Integer call() throws Exception {
            KeysCommand.print(spec.commandLine().getOut(), new OwnerKeyStore(folder).publicKeys());
            return InkgateAdmin.OK;
        }
    }

    static void print(PrintWriter out, OwnerKeyStore.PublicKeys keys) {
        out.println("  signing key (Ed25519)     fingerprint " + keys.signingFingerprint());
        out.println("  encryption key (X25519)   fingerprint " + keys.encryptionFingerprint());
    }
}
