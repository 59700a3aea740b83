package org.inkgate.client.demo;

import com.fasterxml.jackson.core.JsonProcessingException;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Base64;
import java.util.List;
import java.util.Map;
import org.inkgate.format.bundle.BundleManifest;
import org.inkgate.format.bundle.BundleWriter;
import org.inkgate.format.bundle.PinHash;
import org.inkgate.format.bundle.RosterEntry;
import org.inkgate.format.crypto.Hex;
import org.inkgate.format.crypto.Pbkdf2;
import org.inkgate.format.json.Json;

/**
 * Builds the demo's live-sitting bundle from the same demo source: not a practice bundle, with
 * the demo roster and the demo invigilator PIN of {@code sitting.json} (DEMO ONLY, NOT SECRET:
 * both are published, so this bundle protects nothing). The PIN hash uses the salt written in
 * {@code sitting.json}, so the same source always gives the same bytes.
 *
 * <p>Usage: {@code DemoSittingBuild <source folder> <output .inkexam>}
 */
public final class DemoSittingBuild {

    /** The file beside exam.json that holds the demo PIN and roster. */
    public static final String SITTING_FILE = "sitting.json";
    static final String USAGE = "usage: DemoSittingBuild <demo source folder> <output .inkexam file>";
    /** Written beside the bundle: what the launcher prints when it opens the demo sitting. */
    public static final String NOTE_SUFFIX = ".note.txt";

    /** What {@code sitting.json} holds. */
    public record DemoSitting(String note, String invigilatorPin, String pinSaltHex, List<RosterEntry> roster) {
    }

    private DemoSittingBuild() {
    }

    public static void main(String[] args) throws DemoSourceException {
        try {
            if (args.length != 2) {
                throw new DemoSourceException("expected 2 arguments, got " + args.length + ". " + USAGE);
            }
            build(Path.of(args[0]), Path.of(args[1]));
        } catch (DemoSourceException e) {
            System.err.println("Demo sitting bundle not built: " + e.getMessage());
            throw e;
        }
    }

    /** Reads the demo PIN and roster (for the launcher's console note and for tests). */
    public static DemoSitting readSitting(Path sourceDir) throws DemoSourceException {
        Path file = sourceDir.resolve(SITTING_FILE);
        try {
            DemoSitting sitting = Json.mapper().readValue(Files.readAllBytes(file), DemoSitting.class);
            if (sitting.invigilatorPin() == null || sitting.pinSaltHex() == null || sitting.roster() == null) {
                throw new DemoSourceException(file + ": give invigilatorPin, pinSaltHex and roster.");
            }
            return sitting;
        } catch (JsonProcessingException e) {
            throw new DemoSourceException(file + ": " + e.getOriginalMessage() + ". Fix the JSON.", e);
        } catch (IOException e) {
            throw new DemoSourceException(file + " cannot be read (" + e.getMessage() + ")", e);
        }
    }

    /** The console note: the demo PIN and candidate numbers, marked as demo-only. */
    public static String note(DemoSitting sitting) {
        StringBuilder out = new StringBuilder();
        out.append("DEMO ONLY, NOT SECRET: this is the invented demo sitting. Its PIN and candidate numbers are published.\n");
        out.append("  invigilator PIN: ").append(sitting.invigilatorPin()).append('\n');
        for (RosterEntry r : sitting.roster()) {
            out.append("  candidate ").append(r.candidateNumber()).append(": form ").append(r.formId());
            if (r.extraTimePercent() > 0) {
                out.append(", ").append(r.extraTimePercent()).append("% extra time");
            }
            if (r.largePrint()) {
                out.append(", large print");
            }
            if (r.highContrast()) {
                out.append(", high contrast");
            }
            out.append('\n');
        }
        out.append("  open the invigilator screen during the sitting with Ctrl+Shift+F12.\n");
        return out.toString();
    }

    /** Writes the live demo bundle to {@code out}. */
    public static void build(Path sourceDir, Path out) throws DemoSourceException {
        DemoSource source = DemoSource.read(sourceDir);
        DemoSitting sitting = readSitting(sourceDir);
        BundleManifest m = source.manifest();
        byte[] salt = Hex.parse(sitting.pinSaltHex());
        byte[] hash = Pbkdf2.derive(sitting.invigilatorPin().toCharArray(), salt, Pbkdf2.ITERATIONS, 32);
        Base64.Encoder b64 = Base64.getEncoder();
        PinHash pin = new PinHash(b64.encodeToString(salt), Pbkdf2.ITERATIONS, b64.encodeToString(hash));
        BundleManifest live = new BundleManifest(m.format(), m.schemaVersion(), m.examId() + "-sitting",
                m.title().replace("Practice Paper", "Demo Sitting"), m.language(), m.instructionsFile(), m.tasks(),
                m.conditions(), m.forms(), m.questionnaires(), m.packs(), sitting.roster(), m.ownerKeys(), pin, null,
                false, Map.of(), m.design());
        try {
            Path parent = out.toAbsolutePath().getParent();
            if (parent != null) {
                Files.createDirectories(parent);
            }
            new BundleWriter(source.signingKey()).write(live, source.contents(), out);
            Files.writeString(out.resolveSibling(out.getFileName() + NOTE_SUFFIX), note(sitting));
        } catch (IllegalArgumentException e) {
            throw new DemoSourceException(sourceDir.resolve(SITTING_FILE) + ": " + e.getMessage(), e);
        } catch (IOException e) {
            throw new DemoSourceException("cannot write " + out + " (" + e.getMessage() + ")", e);
        }
    }
}
