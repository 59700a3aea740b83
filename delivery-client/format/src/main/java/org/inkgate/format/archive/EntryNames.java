package org.inkgate.format.archive;

import java.nio.charset.StandardCharsets;
import java.text.Normalizer;
import java.util.HashSet;
import java.util.Locale;
import java.util.Set;

/**
 * The rule for entry names: plain relative paths that cannot leave the folder they unpack into
 * and that name one file, the same file, on every file system a client or admin machine may use
 * (POSIX, NTFS, APFS). So besides "..", absolute paths and control characters, names that
 * Windows cannot store (reserved device names, {@code <>:"|?*}, a trailing dot or space) are
 * refused, and so are two names that differ only in case or Unicode normalisation, or a name
 * that is both a file and a folder.
 */
public final class EntryNames {

    private static final String WINDOWS_FORBIDDEN = "<>:\"|?*";
    private static final Set<String> WINDOWS_DEVICES = Set.of("CON", "PRN", "AUX", "NUL",
            "COM1", "COM2", "COM3", "COM4", "COM5", "COM6", "COM7", "COM8", "COM9",
            "LPT1", "LPT2", "LPT3", "LPT4", "LPT5", "LPT6", "LPT7", "LPT8", "LPT9");

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
            if (c < 0x20 || (c >= 0x7f && c <= 0x9f)) {
                return "control character";
            }
            if (WINDOWS_FORBIDDEN.indexOf(c) >= 0) {
                return "character " + c + " that Windows cannot store";
            }
        }
        for (String part : name.split("/", -1)) {
            String problem = segmentProblem(part);
            if (problem != null) {
                return problem;
            }
        }
        return null;
    }

    private static String segmentProblem(String part) {
        if (part.isEmpty()) {
            return "empty path segment or directory entry";
        }
        if (part.equals("..") || part.equals(".")) {
            return "\"" + part + "\" segment";
        }
        if (part.endsWith(".") || part.endsWith(" ")) {
            return "a segment ending in a dot or space, which Windows drops";
        }
        int dot = part.indexOf('.');
        String base = (dot < 0 ? part : part.substring(0, dot)).toUpperCase(Locale.ROOT);
        if (WINDOWS_DEVICES.contains(base)) {
            return "reserved Windows device name " + base;
        }
        return null;
    }

    public static void requireSafe(String name) {
        String problem = problem(name);
        if (problem != null) {
            throw new IllegalArgumentException("unsafe entry name \"" + name + "\": " + problem);
        }
    }

    /** The name as a case-insensitive, normalising file system sees it. */
    static String folded(String name) {
        return Normalizer.normalize(name, Normalizer.Form.NFC).toLowerCase(Locale.ROOT);
    }

    /**
     * The names of one archive, checked as they are added: refuses a name that would be the same
     * file as an earlier one on some file system, or that is both a file and a folder.
     */
    public static final class NameSet {
        private final Set<String> files = new HashSet<>();
        private final Set<String> folders = new HashSet<>();

        /** Null when the name can join the set, else the reason it cannot. */
        public String add(String name) {
            String key = folded(name);
            if (files.contains(key)) {
                return "is the same file as another entry on a file system that ignores case or Unicode form";
            }
            if (folders.contains(key)) {
                return "is both a file and a folder";
            }
            String[] parts = key.split("/");
            StringBuilder prefix = new StringBuilder();
            for (int i = 0; i < parts.length - 1; i++) {
                if (i > 0) {
                    prefix.append('/');
                }
                prefix.append(parts[i]);
                if (files.contains(prefix.toString())) {
                    return "is inside \"" + prefix + "\", which is also a file";
                }
            }
            files.add(key);
            addFolders(parts, parts.length - 1);
            return null;
        }

        /**
         * Null when a directory entry (name without its trailing slash) can join the set, else the
         * reason it cannot: a folder that is also a file, or lies inside one.
         */
        public String addFolder(String name) {
            String key = folded(name);
            String[] parts = key.split("/");
            StringBuilder prefix = new StringBuilder();
            for (int i = 0; i < parts.length; i++) {
                if (i > 0) {
                    prefix.append('/');
                }
                prefix.append(parts[i]);
                if (files.contains(prefix.toString())) {
                    return i == parts.length - 1 ? "is both a file and a folder"
                            : "is inside \"" + prefix + "\", which is also a file";
                }
            }
            addFolders(parts, parts.length);
            return null;
        }

        private void addFolders(String[] parts, int count) {
            StringBuilder prefix = new StringBuilder();
            for (int i = 0; i < count; i++) {
                if (i > 0) {
                    prefix.append('/');
                }
                prefix.append(parts[i]);
                folders.add(prefix.toString());
            }
        }
    }
}
