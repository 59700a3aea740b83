package org.inkgate.admin.testutil;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Set;
import java.util.concurrent.TimeUnit;
import org.inkgate.admin.cli.InkgateAdmin;
import org.inkgate.admin.core.keys.OwnerKeyStore;
import org.inkgate.admin.core.simulation.SimulatedSitting;
import org.inkgate.format.bundle.BundleManifest;
import org.inkgate.format.bundle.BundleReader;
import org.inkgate.format.bundle.OpenedBundle;
import org.inkgate.format.crypto.Ed25519;
import org.inkgate.format.crypto.X25519;
import org.inkgate.format.response.ResponseDocument;
import org.inkgate.format.trust.TrustPolicy;

/**
 * A test owner's real key folder and demo bundle, made by the real command line, and a forger who
 * holds only what is public: the owner's public keys (owner-public.json) and the bundle. The forger
 * writes response packages with the real package writer, signed by an installation key of their
 * own, so {@code collect --any-installation} opens them as it would a real one.
 */
public final class ForgedPackages {

    public static final String PASSPHRASE_ENV = "TEST_PASSPHRASE";

    /** Output and exit code of one run of the command line. */
    public record Run(int code, String out) {
    }

    private final Path dir;
    private final Path keys;
    private final Path bundle;
    private final BundleManifest manifest;
    private final String manifestSha256;
    private final SimulatedSitting forger;
    private final org.inkgate.format.response.ResponsePackageWriter writer;

    private ForgedPackages(Path dir, Path keys, Path bundle, BundleManifest manifest, String manifestSha256,
            SimulatedSitting forger, org.inkgate.format.response.ResponsePackageWriter writer) {
        this.dir = dir;
        this.keys = keys;
        this.bundle = bundle;
        this.manifest = manifest;
        this.manifestSha256 = manifestSha256;
        this.forger = forger;
        this.writer = writer;
    }

    /** Keys and the demo bundle (with the demo roster) in {@code dir}, through the real command line. */
    public static ForgedPackages prepare(Path dir) throws Exception {
        Path keys = dir.resolve("keys");
        check(process(dir, "keys", "init", "--keys", keys.toString(), "--passphrase-env", PASSPHRASE_ENV));
        Path source = DemoSource.DEMO.resolve("exam-source");
        Path roster = DemoSource.DEMO.resolve("roster.csv");
        Path assignment = dir.resolve("assignment.csv");
        check(process(dir, "forms", source.toString(), "--roster", roster.toString(), "--seed", "7", "--out",
                assignment.toString()));
        Path bundle = dir.resolve("demo.inkexam");
        check(process(dir, "bundle", source.toString(), "--out", bundle.toString(), "--keys", keys.toString(), "--roster",
                roster.toString(), "--assignment", assignment.toString(), "--passphrase-env", PASSPHRASE_ENV,
                "--pin-env", "TEST_PIN"));
        OwnerKeyStore.PublicKeys pub = new OwnerKeyStore(keys).publicKeys();
        try (OpenedBundle b = new BundleReader(TrustPolicy.trusting(Set.of(pub.signingFingerprint()))).open(bundle)) {
            var installation = Ed25519.generate().getPrivate();
            var ownerEncryption = X25519.publicFromRaw(java.util.Base64.getDecoder().decode(pub.encryption()));
            SimulatedSitting forger = new SimulatedSitting(b.manifest(), b.manifestSha256(), installation, ownerEncryption);
            return new ForgedPackages(dir, keys, bundle, b.manifest(), b.manifestSha256(), forger,
                    new org.inkgate.format.response.ResponsePackageWriter(installation, ownerEncryption));
        }
    }

    private static void check(Run run) {
        if (run.code() != 0) {
            throw new IllegalStateException("setting up the forged packages failed: " + run.out());
        }
    }

    /** The bundle the real command line built. */
    public Path bundle() {
        return bundle;
    }

    /** The owner key folder the real command line made. */
    public Path keys() {
        return keys;
    }

    public BundleManifest manifest() {
        return manifest;
    }

    /** The form of the roster's first candidate, a form every forged package may name. */
    public String form() {
        return manifest.roster().getFirst().formId();
    }

    /** A plausible document for {@code candidate}, to change before {@link #write(ResponseDocument, Path)}. */
    public ResponseDocument document(String candidate, long seed) {
        return forger.document(candidate, form(), seed, java.util.UUID.nameUUIDFromBytes(
                (candidate + seed).getBytes(StandardCharsets.UTF_8)).toString());
    }

    public Path write(ResponseDocument d, Path file) throws IOException {
        java.nio.file.Files.createDirectories(file.getParent());
        forger.write(d, 40, 1, file);
        return file;
    }

    /** Writes {@code d} with the given process log (the simulated log of {@code d} is {@link SimulatedSitting#events}). */
    public Path write(ResponseDocument d, List<org.inkgate.format.response.ProcessEvent> events, Path file)
            throws IOException {
        java.nio.file.Files.createDirectories(file.getParent());
        writer.write(d, events, file);
        return file;
    }

    /** {@code collect --any-installation} of {@code folder} into {@code store}, in its own process. */
    public Run collect(Path folder, Path store) throws Exception {
        return process(dir, "collect", folder.toString(), "--store", store.toString(), "--bundle", bundle.toString(),
                "--keys", keys.toString(), "--any-installation", "--passphrase-env", PASSPHRASE_ENV);
    }

    /** The admin command line in this process (for steps that need no passphrase). */
    public static Run here(String... args) {
        StringWriter out = new StringWriter();
        var cl = InkgateAdmin.commandLine();
        cl.setOut(new PrintWriter(out, true));
        cl.setErr(new PrintWriter(out, true));
        int code = cl.execute(args);
        return new Run(code, out.toString());
    }

    /** The admin command line in its own JVM, with the invented passphrase and PIN in the environment. */
    public static Run process(Path workDir, String... args) throws Exception {
        return process(workDir, java.util.Map.of(), args);
    }

    /** The same with more variables in the environment (e.g. a wrong passphrase under another name). */
    public static Run process(Path workDir, java.util.Map<String, String> environment, String... args) throws Exception {
        List<String> command = new ArrayList<>(List.of(Path.of(System.getProperty("java.home"), "bin", "java").toString(),
                "--enable-native-access=ALL-UNNAMED", "-cp", System.getProperty("java.class.path"),
                InkgateAdmin.class.getName()));
        command.addAll(List.of(args));
        ProcessBuilder pb = new ProcessBuilder(command).redirectErrorStream(true);
        pb.environment().put(PASSPHRASE_ENV, "invented passphrase for a hostile-input test");
        pb.environment().put("TEST_PIN", "invented-pin-5731");
        pb.environment().putAll(environment);
        Process p = pb.start();
        String out = new String(p.getInputStream().readAllBytes(), StandardCharsets.UTF_8);
        if (!p.waitFor(300, TimeUnit.SECONDS)) {
            p.destroyForcibly();
            throw new IllegalStateException("inkgate-admin " + args[0] + " did not finish in 300 s: " + out);
        }
        return new Run(p.exitValue(), out);
    }

    /** The arguments of {@link #collect} for {@code folder} into {@code store}, with {@code more} after them. */
    public String[] collectArguments(Path folder, Path store, String... more) {
        List<String> args = new ArrayList<>(List.of("collect", folder.toString(), "--store", store.toString(), "--bundle",
                bundle.toString(), "--keys", keys.toString(), "--any-installation", "--passphrase-env", PASSPHRASE_ENV));
        args.addAll(List.of(more));
        return args.toArray(String[]::new);
    }

    /**
     * The admin command line in its own JVM, left running for the test to stop (SIGINT, SIGKILL); its output goes
     * to {@code log}. POSIX only: a build started in the background (nohup, &, some CI runners) ignores SIGINT, and
     * children inherit that, so the JVM would never see a Ctrl+C; coreutils' env puts the default action back.
     */
    public static Process start(Path log, String... args) throws IOException {
        List<String> command = new ArrayList<>(List.of("/usr/bin/env", "--default-signal=INT",
                Path.of(System.getProperty("java.home"), "bin", "java").toString(), "--enable-native-access=ALL-UNNAMED",
                "-cp", System.getProperty("java.class.path"), InkgateAdmin.class.getName()));
        command.addAll(List.of(args));
        ProcessBuilder pb = new ProcessBuilder(command).redirectErrorStream(true).redirectOutput(log.toFile());
        pb.environment().put(PASSPHRASE_ENV, "invented passphrase for a hostile-input test");
        return pb.start();
    }
}
