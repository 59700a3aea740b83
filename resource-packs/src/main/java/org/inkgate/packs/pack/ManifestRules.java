package org.inkgate.packs.pack;

import java.util.HashSet;
import java.util.IllformedLocaleException;
import java.util.Locale;
import java.util.Set;
import java.util.regex.Pattern;

/** The field rules of a pack manifest, checked by the writer before writing and the reader on open. */
final class ManifestRules {
    static final String MANIFEST_ENTRY = "manifest.json";
    private static final Pattern ID = Pattern.compile("[a-z0-9][a-z0-9._-]{0,63}");
    private static final Pattern HEX64 = Pattern.compile("[0-9a-f]{64}");
    private static final Pattern SAFE_PATH = Pattern.compile("[A-Za-z0-9_][A-Za-z0-9._-]{0,127}(/[A-Za-z0-9_][A-Za-z0-9._-]{0,127}){0,3}");

    private ManifestRules() {
    }

    /** Throws a BAD_MANIFEST refusal naming the first field that breaks a rule. */
    static void check(PackManifest m, String where) throws PackRefusal {
        if (!PackManifest.FORMAT.equals(m.format())) {
            throw bad(where, "format", "is \"" + m.format() + "\", expected \"" + PackManifest.FORMAT + "\"");
        }
        if (m.formatVersion() > PackManifest.CURRENT_VERSION) {
            throw new PackRefusal(PackRefusal.Reason.NEWER_VERSION, where + ": formatVersion " + m.formatVersion()
                    + " is newer than this program reads (" + PackManifest.CURRENT_VERSION + "); update Inkgate");
        }
        if (m.formatVersion() < 1) {
            throw bad(where, "formatVersion", "must be 1 or more, is " + m.formatVersion());
        }
        if (m.id() == null || !ID.matcher(m.id()).matches()) {
            throw bad(where, "id", "\"" + m.id() + "\" must be 1-64 characters of a-z, 0-9, '.', '_' or '-', starting with a letter or digit");
        }
        requireText(where, "version", m.version());
        requireText(where, "title", m.title());
        requireText(where, "licence", m.licence());
        if (m.attribution() == null) {
            throw bad(where, "attribution", "is missing; use an empty string when the licence asks for none");
        }
        if (m.languages().isEmpty()) {
            throw bad(where, "languages", "is empty; give at least one BCP 47 tag such as \"en\"");
        }
        for (String tag : m.languages()) {
            checkLanguage(where, tag);
        }
        if (m.entryCount() < 0) {
            throw bad(where, "entryCount", "is negative (" + m.entryCount() + ")");
        }
        if (m.builtAt() == null) {
            throw bad(where, "builtAt", "is missing");
        }
        if (m.contentSha256() == null || !HEX64.matcher(m.contentSha256()).matches()) {
            throw bad(where, "contentSha256", "must be 64 lower-case hex digits");
        }
        if (m.files().isEmpty()) {
            throw bad(where, "files", "is empty: a pack without content files holds nothing");
        }
        Set<String> folded = new HashSet<>();
        String previous = null;
        for (PackFileEntry f : m.files()) {
            checkEntryName(where, f.path());
            if (!folded.add(f.path().toLowerCase(Locale.ROOT))) {
                throw new PackRefusal(PackRefusal.Reason.UNSAFE_ENTRY, where + ": files lists \"" + f.path()
                        + "\" twice (names are compared ignoring case, as Windows and macOS do)");
            }
            if (previous != null && previous.compareTo(f.path()) >= 0) {
                throw bad(where, "files", "must be sorted by path; \"" + f.path() + "\" comes after \"" + previous + "\"");
            }
            if (f.size() < 0) {
                throw bad(where, "files[" + f.path() + "].size", "is negative");
            }
            if (!HEX64.matcher(f.sha256()).matches()) {
                throw bad(where, "files[" + f.path() + "].sha256", "must be 64 lower-case hex digits");
            }
            previous = f.path();
        }
        String expected = PackDigests.contentDigest(m.files());
        if (!expected.equals(m.contentSha256())) {
            throw new PackRefusal(PackRefusal.Reason.CONTENT_MISMATCH, where + ": contentSha256 " + m.contentSha256()
                    + " does not match the file list (" + expected + "); the manifest was altered");
        }
    }

    /** Entry names: relative, forward slashes, no "..", no odd characters, at most four levels. */
    static void checkEntryName(String where, String path) throws PackRefusal {
        if (path == null || !SAFE_PATH.matcher(path).matches() || path.contains("..") || path.equals(MANIFEST_ENTRY)) {
            throw new PackRefusal(PackRefusal.Reason.UNSAFE_ENTRY, where + ": entry name \"" + path
                    + "\" is not allowed; names are relative paths of letters, digits, '.', '_' and '-', without \"..\"");
        }
    }

    private static void checkLanguage(String where, String tag) throws PackRefusal {
        try {
            Locale locale = new Locale.Builder().setLanguageTag(tag).build();
            if (locale.getLanguage().isEmpty()) {
                throw bad(where, "languages", "\"" + tag + "\" has no language subtag");
            }
        } catch (IllformedLocaleException | NullPointerException e) {
            throw bad(where, "languages", "\"" + tag + "\" is not a BCP 47 language tag (e.g. en, en-GB, es)");
        }
    }

    private static void requireText(String where, String field, String value) throws PackRefusal {
        if (value == null || value.isBlank()) {
            throw bad(where, field, "is missing or blank");
        }
    }

    private static PackRefusal bad(String where, String field, String problem) {
        return new PackRefusal(PackRefusal.Reason.BAD_MANIFEST, where + ": manifest field " + field + " " + problem);
    }
}
