package org.inkgate.admin.demo;

import java.nio.file.Files;
import java.nio.file.Path;
import java.security.KeyPair;
import java.util.Base64;
import java.util.List;
import java.util.concurrent.Callable;
import org.inkgate.admin.core.keys.OwnerKeyStore;
import org.inkgate.admin.core.simulation.SimulatedSitting;
import org.inkgate.format.bundle.BundleReader;
import org.inkgate.format.bundle.OpenedBundle;
import org.inkgate.format.bundle.RosterEntry;
import org.inkgate.format.crypto.Ed25519;
import org.inkgate.format.crypto.Fingerprint;
import org.inkgate.format.crypto.X25519;
import org.inkgate.format.trust.TrustPolicy;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

/**
 * Demo only: writes SIMULATED response packages for every candidate on a bundle's roster (but
 * the ones left out), as a stand-in for a sitting until the locked client writes real ones. The
 * texts are invented filler and say so. The simulated client installation's fingerprint is
 * written to {@code installations.txt} in the output folder for {@code collect --installations}.
 */
@Command(name = "simulate-demo-sitting", mixinStandardHelpOptions = true,
        description = "DEMO ONLY: write simulated (invented) response packages for a bundle's roster.")
public final class SimulateDemoSitting implements Callable<Integer> {

    @Parameters(index = "0", paramLabel = "BUNDLE", description = "the .inkexam bundle")
    Path bundle;

    @Option(names = "--keys", required = true, paramLabel = "DIR", description = "owner key folder (public keys only)")
    Path keys;

    @Option(names = "--out", required = true, paramLabel = "DIR", description = "folder for the packages")
    Path out;

    @Option(names = "--leave-out", paramLabel = "N", description = "candidate numbers to leave out (to see the missing report)")
    List<String> leaveOut = List.of();

    @Option(names = "--events", paramLabel = "N", description = "events per package (default 400)")
    int events = 400;

    @Override
    public Integer call() throws Exception {
        OwnerKeyStore.PublicKeys owner = new OwnerKeyStore(keys).publicKeys();
        KeyPair installation = Ed25519.generate();
        Files.createDirectories(out);
        String fingerprint = Fingerprint.of(Ed25519.rawPublic(installation.getPublic()));
        Files.writeString(out.resolve("installations.txt"), "# simulated demo installation\n" + fingerprint + "\n");
        int written = 0;
        try (OpenedBundle b = new BundleReader(TrustPolicy.trusting(java.util.Set.of(owner.signingFingerprint()))).open(bundle)) {
            SimulatedSitting sitting = new SimulatedSitting(b.manifest(), b.manifestSha256(), installation.getPrivate(),
                    X25519.publicFromRaw(Base64.getDecoder().decode(owner.encryption())));
            long seed = 1;
            for (RosterEntry r : b.manifest().roster()) {
                if (leaveOut.contains(r.candidateNumber())) {
                    continue;
                }
                sitting.write(r.candidateNumber(), r.formId(), seed++, events, out.resolve(r.candidateNumber() + ".inkresp"));
                written++;
            }
        }
        CommandLine cl = new CommandLine(this);
        cl.getOut().println("Wrote " + written + " SIMULATED response packages (invented texts) to " + out);
        cl.getOut().println("Simulated installation fingerprint " + fingerprint + " in " + out.resolve("installations.txt"));
        cl.getOut().flush();
        return 0;
    }

    public static void main(String[] args) {
        System.exit(new CommandLine(new SimulateDemoSitting()).execute(args));
    }
}
