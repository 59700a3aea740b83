package org.inkgate.admin.core.export;

import java.io.IOException;
import java.nio.file.Path;

/**
 * Where an export may write: a file name made from outside data (candidate numbers, exam ids from
 * packages and bundles) is accepted only when it is a plain name ({@code A-Z a-z 0-9 . - _}, not
 * starting with a dot) and the resolved path stays inside the output folder.
 */
public final class OutputFolder {

    private OutputFolder() {
    }

    /** The file {@code name} inside {@code folder}, or an error saying why the name is refused. */
    public static Path file(Path folder, String name) throws IOException {
        if (name == null || !name.matches("[A-Za-z0-9_-][A-Za-z0-9._-]{0,200}")) {
            throw new IOException("refusing to write a file named \"" + printable(name) + "\" into " + folder
                    + ": export file names may hold only letters, digits, '.', '-' and '_' and may not start with '.'");
        }
        Path base = folder.toAbsolutePath().normalize();
        Path file = base.resolve(name).normalize();
        if (!file.getParent().equals(base)) {
            throw new IOException("refusing to write " + printable(name) + " outside the output folder " + folder);
        }
        return file;
    }

    /** A name as it may be shown on a terminal: controls and non-ASCII as \\uXXXX, at most 80 characters. */
    static String printable(String s) {
        if (s == null) {
            return "(none)";
        }
        StringBuilder out = new StringBuilder();
        s.chars().limit(80).forEach(c -> {
            if (c >= 0x20 && c < 0x7F) {
                out.append((char) c);
            } else {
                out.append(String.format("\\u%04X", c));
            }
        });
        return s.length() > 80 ? out + "..." : out.toString();
    }
}
