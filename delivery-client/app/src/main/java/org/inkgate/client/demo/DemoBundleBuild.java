package org.inkgate.client.demo;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import org.inkgate.format.bundle.BundleWriter;

/**
 * Builds the signed demo practice bundle from the demo source folder. The build runs it in the
 * process-classes phase; the same source always gives the same bytes.
 *
 * <p>Usage: {@code DemoBundleBuild <source folder> <output .inkexam>}
 */
public final class DemoBundleBuild {

    static final String USAGE = "usage: DemoBundleBuild <demo source folder> <output .inkexam file>";

    private DemoBundleBuild() {
    }

    /**
     * Runs inside Maven (exec:java), so it must not call System.exit: a failure is reported on
     * stderr and thrown, which fails the build with the same message.
     */
    public static void main(String[] args) throws DemoSourceException {
        try {
            if (args.length != 2) {
                throw new DemoSourceException("expected 2 arguments, got " + args.length + ". " + USAGE);
            }
            build(Path.of(args[0]), Path.of(args[1]));
        } catch (DemoSourceException e) {
            System.err.println("Demo bundle not built: " + e.getMessage());
            throw e;
        }
    }

    /** Reads the demo source folder and writes the signed bundle to {@code out}. */
    public static void build(Path sourceDir, Path out) throws DemoSourceException {
        DemoSource source = DemoSource.read(sourceDir);
        try {
            Path parent = out.toAbsolutePath().getParent();
            if (parent != null) {
                Files.createDirectories(parent);
            }
            new BundleWriter(source.signingKey()).write(source.manifest(), source.contents(), out);
        } catch (IllegalArgumentException e) {
            throw new DemoSourceException(sourceDir.resolve(DemoSource.EXAM_FILE) + ": " + e.getMessage(), e);
        } catch (IOException e) {
            throw new DemoSourceException("cannot write " + out + " (" + e.getMessage() + ")", e);
        }
    }
}
