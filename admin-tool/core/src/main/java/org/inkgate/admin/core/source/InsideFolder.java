package org.inkgate.admin.core.source;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;

/**
 * A file an exam source names must really be inside the exam folder: a symbolic link (the file
 * itself or a folder on its way) that leads elsewhere would carry a file from anywhere on the
 * machine into a bundle that travels to every seat.
 */
final class InsideFolder {

    private InsideFolder() {
    }

    /** Why {@code name} leads out of {@code folder}, or null when it stays inside (or does not exist yet). */
    static String problem(Path folder, String name) {
        Path file = folder.resolve(name);
        if (!Files.exists(file)) {
            return null;
        }
        try {
            Path real = file.toRealPath();
            if (real.startsWith(folder.toRealPath())) {
                return null;
            }
            return "\"" + name + "\" is a symbolic link, or lies under one, that leads out of the exam folder (to "
                    + real + "); Inkgate does not follow it. Copy the file into the exam folder instead";
        } catch (IOException e) {
            return "\"" + name + "\" cannot be resolved: " + e.getMessage();
        }
    }
}
