package org.inkgate.packs.cli;

import java.util.List;
import java.util.logging.Level;
import java.util.logging.Logger;

/**
 * Silences the one java.util.logging notice our launchers meet on every normal run: Lucene's
 * advice that the incubating Vector API is not enabled (enabling it with
 * {@code --add-modules jdk.incubator.vector} makes the JVM print its own incubator warning
 * instead, and the packs' searches are fast enough without it: docs/benchmarks.md). Real errors
 * (level SEVERE) still print. Called first thing by every main method.
 */
public final class QuietJdkLogging {

    /** java.util.logging keeps loggers weakly: hold them, or the level is lost with the logger. */
    private static final List<Logger> HELD = List.of(Logger.getLogger("org.apache.lucene.internal.vectorization"));

    private QuietJdkLogging() {
    }

    public static void install() {
        for (Logger logger : HELD) {
            logger.setLevel(Level.SEVERE);
        }
    }
}
