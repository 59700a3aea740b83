package org.inkgate.client.sitting.submit;

import java.io.IOException;
import java.net.InetAddress;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import org.inkgate.format.enrolment.InstallationEnrolment;
import org.inkgate.format.io.AtomicFiles;

/**
 * Writes this installation's enrolment file (docs/formats.md, "Installation enrolment file") for
 * the invigilator to hand to the test owner, who imports it so that the collector trusts this
 * machine's packages. Used by {@code inkgate-client --installation} and the set-up screen.
 */
public final class EnrolmentExport {

    private EnrolmentExport() {
    }

    /**
     * Writes the enrolment file into {@code folder}, named after the fingerprint only.
     *
     * @param machine the seat or machine label the invigilator gave; blank means the host name
     * @return the file written
     * @throws IllegalArgumentException when the label cannot go into the file (it says why)
     */
    public static Path write(InstallationKey key, String machine, Path folder, Instant now) throws IOException {
        String host = hostName();
        String label = machine == null || machine.isBlank() ? host : machine.strip();
        String problem = InstallationEnrolment.labelProblem(label);
        if (problem != null) {
            throw new IllegalArgumentException(problem + ". Give a plain label such as \"Room 2, seat 14\".");
        }
        byte[] bytes = InstallationEnrolment.write(key.key(), label, host, now);
        Files.createDirectories(folder);
        Path file = folder.resolve("installation-" + key.fingerprint() + InstallationEnrolment.FILE_SUFFIX);
        AtomicFiles.write(file, out -> out.write(bytes));
        return file;
    }

    /** The host name as the system reports it, or "" when it is unknown or not printable. */
    static String hostName() {
        String name;
        try {
            name = InetAddress.getLocalHost().getHostName();
        } catch (IOException | RuntimeException e) {
            name = System.getenv("HOSTNAME");
        }
        if (name == null || InstallationEnrolment.labelProblem(name) != null) {
            return "";
        }
        return name;
    }
}
