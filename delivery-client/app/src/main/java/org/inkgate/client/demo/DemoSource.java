package org.inkgate.client.demo;

import com.fasterxml.jackson.core.JsonLocation;
import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.JsonMappingException;
import com.fasterxml.jackson.databind.JsonNode;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.security.PrivateKey;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import org.inkgate.format.archive.EntryNames;
import org.inkgate.format.bundle.BundleManifest;
import org.inkgate.format.bundle.TaskSpec;
import org.inkgate.format.json.Json;

/**
 * The demo exam as written in {@code src/demo}: {@code exam.json} (a bundle manifest without
 * {@code entries} and {@code ownerKeys}), the Markdown files it names, and the demo keys.
 *
 * @param manifest   the manifest with the owner's public keys filled in and no entries yet
 * @param contents   the content entries by entry name: only the files the manifest names
 * @param signingKey the demo owner's Ed25519 key (DEMO ONLY, NOT SECRET)
 */
public record DemoSource(BundleManifest manifest, Map<String, byte[]> contents, PrivateKey signingKey) {

    /** The exam description inside the source folder. */
    public static final String EXAM_FILE = "exam.json";

    public DemoSource {
        contents = Map.copyOf(contents);
    }

    /** Reads and checks the source folder; every problem is reported with the file it is in. */
    public static DemoSource read(Path sourceDir) throws DemoSourceException {
        if (!Files.isDirectory(sourceDir)) {
            throw new DemoSourceException(sourceDir + " is not a folder: pass the demo source folder"
                    + " (delivery-client/app/src/demo) as the first argument.");
        }
        BundleManifest described = readExam(sourceDir.resolve(EXAM_FILE));
        checkShape(sourceDir.resolve(EXAM_FILE), described);
        DemoKeys keys = DemoKeys.read(sourceDir);
        Map<String, byte[]> contents = new TreeMap<>();
        for (String entry : namedFiles(described)) {
            contents.put(entry, readEntry(sourceDir, entry));
        }
        return new DemoSource(withOwnerKeys(described, keys), contents, keys.signing());
    }

    private static BundleManifest readExam(Path examFile) throws DemoSourceException {
        if (!Files.isRegularFile(examFile)) {
            throw new DemoSourceException(examFile + " is missing: the demo source needs an exam description there.");
        }
        JsonNode tree;
        try {
            tree = Json.mapper().readTree(Files.readAllBytes(examFile));
        } catch (JsonProcessingException e) {
            JsonLocation at = e.getLocation();
            String where = at == null ? "" : ", line " + at.getLineNr() + ", column " + at.getColumnNr();
            throw new DemoSourceException(examFile + where + ": " + e.getOriginalMessage() + ". Fix the JSON syntax.", e);
        } catch (IOException e) {
            throw new DemoSourceException(examFile + " cannot be read (" + e.getMessage() + ")", e);
        }
        try {
            // bound from the tree: record fields are buffered, so a parser location would point at the
            // end of the object; the path names the field instead
            return Json.mapper().treeToValue(tree, BundleManifest.class);
        } catch (JsonMappingException e) {
            throw new DemoSourceException(examFile + ", at " + path(e) + ": " + e.getOriginalMessage()
                    + ". Fix it so that the file has the shape of a bundle manifest (see src/demo/README.md).", e);
        } catch (JsonProcessingException | IllegalArgumentException e) {
            throw new DemoSourceException(examFile + ": " + e.getMessage(), e);
        }
    }

    /** The JSON path of a binding problem, e.g. {@code forms[0].slots[1].policy.spelling}. */
    private static String path(JsonMappingException e) {
        StringBuilder path = new StringBuilder();
        for (JsonMappingException.Reference ref : e.getPath()) {
            if (ref.getFieldName() != null) {
                path.append(path.isEmpty() ? "" : ".").append(ref.getFieldName());
            } else if (ref.getIndex() >= 0) {
                path.append('[').append(ref.getIndex()).append(']');
            }
        }
        return path.isEmpty() ? "the top level" : path.toString();
    }

    private static void checkShape(Path examFile, BundleManifest m) throws DemoSourceException {
        List<String> problems = new ArrayList<>();
        if (!BundleManifest.FORMAT.equals(m.format())) {
            problems.add("\"format\" must be \"" + BundleManifest.FORMAT + "\"");
        }
        if (m.schemaVersion() != BundleManifest.versionFor(m.design())) {
            problems.add("\"schemaVersion\" must be " + BundleManifest.versionFor(m.design())
                    + ", the version this build writes for a bundle " + (m.design() == null ? "without" : "with") + " a design");
        }
        if (!m.entries().isEmpty()) {
            problems.add("leave \"entries\" out: the bundle writer lists the entries and their digests");
        }
        if (m.ownerKeys() != null) {
            problems.add("leave \"ownerKeys\" out: the build derives them from the files in keys/");
        }
        if (!m.practice()) {
            problems.add("\"practice\" must be true: the demo bundle is a practice bundle, signed with published keys");
        }
        if (m.sealed()) {
            problems.add("leave \"seal\" out: the demo bundle is not sealed");
        }
        if (!problems.isEmpty()) {
            throw new DemoSourceException(examFile + ": " + String.join("; ", problems) + ".");
        }
    }

    /** The instructions and prompt files, in the order the manifest names them, without repeats. */
    private static List<String> namedFiles(BundleManifest m) {
        List<String> names = new ArrayList<>();
        if (m.instructionsFile() != null) {
            names.add(m.instructionsFile());
        }
        for (TaskSpec task : m.tasks()) {
            if (task.promptFile() != null && !names.contains(task.promptFile())) {
                names.add(task.promptFile());
            }
        }
        return names;
    }

    private static byte[] readEntry(Path sourceDir, String entry) throws DemoSourceException {
        String problem = EntryNames.problem(entry);
        if (problem != null) {
            throw new DemoSourceException(sourceDir.resolve(EXAM_FILE) + " names the file \"" + entry
                    + "\", which cannot be a bundle entry (" + problem + "). Use a relative path inside "
                    + sourceDir + " with forward slashes.");
        }
        Path file = sourceDir.resolve(entry);
        if (!Files.isRegularFile(file)) {
            throw new DemoSourceException(sourceDir.resolve(EXAM_FILE) + " names the file \"" + entry
                    + "\", but " + file + " does not exist. Create it or correct the name.");
        }
        try {
            return Files.readAllBytes(file);
        } catch (IOException e) {
            throw new DemoSourceException(file + " cannot be read (" + e.getMessage() + ")", e);
        }
    }

    private static BundleManifest withOwnerKeys(BundleManifest m, DemoKeys keys) {
        return new BundleManifest(m.format(), m.schemaVersion(), m.examId(), m.title(), m.language(),
                m.instructionsFile(), m.tasks(), m.conditions(), m.forms(), m.questionnaires(), m.packs(), m.roster(),
                keys.ownerKeys(), m.invigilatorPin(), m.seal(), m.practice(), Map.of(), m.design());
    }
}
