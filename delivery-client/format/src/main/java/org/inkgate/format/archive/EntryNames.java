package org.inkgate.format.archive;

import java.nio.charset.StandardCharsets;

/** The rule for entry names: plain relative paths that cannot leave the folder they unpack into. */
public final class EntryNames {

    private EntryNames() {
    }

    /** Null when the name is safe, else the reason it is not. */
    public static String problem(String name) {
        if (name.isEmpty()) {
            return "empty name";
        }
        if (name.getBytes(StandardCharsets.UTF_8).length > ZipLayout.MAX_NAME_BYTES) {
            return "name longer than " + ZipLayout.MAX_NAME_BYTES + " bytes";
        }
        if (name.startsWith("/")) {
            return "absolute path";
        }
        if (name.indexOf('\\') >= 0) {
            return "backslash";
        }
        if (name.length() >= 2 && name.charAt(1) == ':') {
            return "drive letter";
        }
        for (int i = 0; i < name.length(); i++) {
            char c = name.charAt(i);
            if (c < 0x20 || c == 0x7f) {
                return "control character";
            }
        }
        for (String part : name.split("/", -1)) {
            if (part.isEmpty()) {
                return "empty path segment or directory entry";
            }
            if (part.equals("..") || part.equals(".")) {
                return "\"" + part + "\" segment";
            }
        }
        return null;
    }

    public static void requireSafe(String name) {
        String problem = problem(name);
        if (problem != null) {
            throw new IllegalArgumentException("unsafe entry name \"" + name + "\": " + problem);
        }
    }
}
