package org.inkgate.packs.cli;

import java.io.IOException;
import java.io.InputStream;
import java.util.Properties;
import picocli.CommandLine;

/**
 * The release number of this build, from the Maven project version (written into a filtered
 * resource at build time). It lives in the lowest module so that both launchers, the stand-alone
 * pack command and the client's response packages print the same number; the launchers run from
 * {@code target/classes}, where a jar manifest's Implementation-Version does not exist.
 */
public final class ReleaseVersion implements CommandLine.IVersionProvider {

    private static final String RESOURCE = "release.properties";

    private final String program;

    /** For picocli: names the program by the command it is asked for. */
    public ReleaseVersion() {
        this(null);
    }

    public ReleaseVersion(String program) {
        this.program = program;
    }

    /** The release number, e.g. {@code 0.1.0-SNAPSHOT}; {@code unknown} only if the build did not write it. */
    public static String number() {
        try (InputStream in = ReleaseVersion.class.getResourceAsStream(RESOURCE)) {
            if (in == null) {
                return "unknown";
            }
            Properties p = new Properties();
            p.load(in);
            String v = p.getProperty("version", "unknown");
            return v.startsWith("${") ? "unknown" : v;
        } catch (IOException e) {
            return "unknown";
        }
    }

    /** "inkgate-admin 0.1.0" and the Java runtime, the two things a bug report needs. */
    public static String[] lines(String program) {
        return new String[] {program + " " + number(),
            "Java " + System.getProperty("java.version") + " (" + System.getProperty("java.vendor") + ")"};
    }

    @Override
    public String[] getVersion() {
        return lines(program == null ? "inkgate" : program);
    }
}
