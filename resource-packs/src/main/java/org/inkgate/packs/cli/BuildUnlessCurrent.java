package org.inkgate.packs.cli;

import java.io.File;
import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.Arrays;
import java.util.HexFormat;
import java.util.List;
import java.util.stream.Stream;
import picocli.CommandLine;

/**
 * The build's way of running {@code pack build}: skips the build when a stamp file beside the
 * pack records the same SHA-256 of every input (the arguments, each input file they name, and
 * every class path entry: our compiled classes and the WordNet data jar), so a second
 * {@code mvn package} (the quick start) does not rebuild an unchanged dictionary pack. The stamp
 * is written only after a successful build, and removed before a new one, so an interrupted
 * build is never taken for a current one.
 *
 * <p>Usage: {@code BuildUnlessCurrent build dictionary --out FILE ...} (the arguments of
 * {@code pack}); the stamp is {@code FILE.inputs-sha256}.
 */
public final class BuildUnlessCurrent {

    private BuildUnlessCurrent() {
    }

    public static void main(String[] args) throws IOException {
        QuietJdkLogging.install();
        System.exit(run(args));
    }

    static int run(String[] args) throws IOException {
        Path out = outputOf(args);
        Path stamp = out.resolveSibling(out.getFileName() + ".inputs-sha256");
        String digest = inputsDigest(args, out);
        CommandLine pack = PackCommand.commandLine(); // its writers: the cores never touch System.out (ArchitectureTest)
        if (Files.isRegularFile(out) && Files.isRegularFile(stamp)
                && Files.readString(stamp, StandardCharsets.US_ASCII).strip().equals(digest)) {
            pack.getOut().println("up to date, not rebuilt: " + out + " (inputs unchanged since " + stamp.getFileName() + ")");
            pack.getOut().flush();
            return ExitCodes.OK;
        }
        Files.deleteIfExists(stamp);
        int code = pack.execute(args);
        if (code == ExitCodes.OK) {
            Files.writeString(stamp, digest + System.lineSeparator(), StandardCharsets.US_ASCII);
        }
        return code;
    }

    private static Path outputOf(String[] args) {
        List<String> list = Arrays.asList(args);
        int i = list.indexOf("--out");
        if (i < 0 || i + 1 >= args.length) {
            throw new IllegalArgumentException("BuildUnlessCurrent needs the pack build's --out FILE");
        }
        return Path.of(args[i + 1]).toAbsolutePath();
    }

    /** One digest over everything the pack is made from; a changed class or data file changes it. */
    static String inputsDigest(String[] args, Path out) throws IOException {
        MessageDigest d = sha256();
        for (String arg : args) {
            add(d, "arg", arg);
            Path p = Path.of(arg).toAbsolutePath();
            if (!p.equals(out) && Files.isRegularFile(p)) {
                addFile(d, p);
            }
        }
        for (String entry : System.getProperty("java.class.path").split(File.pathSeparator)) {
            Path p = Path.of(entry);
            add(d, "classpath", entry);
            if (Files.isDirectory(p)) {
                try (Stream<Path> walk = Files.walk(p)) {
                    for (Path f : walk.filter(Files::isRegularFile).sorted().toList()) {
                        add(d, "file", p.relativize(f).toString());
                        addFile(d, f);
                    }
                }
            } else if (Files.isRegularFile(p)) {
                addFile(d, p);
            }
        }
        return HexFormat.of().formatHex(d.digest());
    }

    private static void add(MessageDigest d, String kind, String value) {
        d.update((kind + "\u0000" + value + "\u0000").getBytes(StandardCharsets.UTF_8));
    }

    private static void addFile(MessageDigest d, Path f) throws IOException {
        byte[] buffer = new byte[1 << 16];
        try (InputStream in = Files.newInputStream(f)) {
            for (int n; (n = in.read(buffer)) > 0; ) {
                d.update(buffer, 0, n);
            }
        }
        d.update((byte) 0);
    }

    private static MessageDigest sha256() {
        try {
            return MessageDigest.getInstance("SHA-256");
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException("SHA-256 is part of every Java runtime", e);
        }
    }
}
