package org.inkgate.format.enrolment;

import java.nio.charset.StandardCharsets;
import java.security.PrivateKey;
import java.security.PublicKey;
import java.time.Instant;
import java.time.format.DateTimeParseException;
import java.time.temporal.ChronoUnit;
import java.util.Base64;
import java.util.Objects;
import org.inkgate.format.crypto.Ed25519;
import org.inkgate.format.crypto.Fingerprint;
import org.inkgate.format.json.Json;
import org.inkgate.format.refusal.FormatRefusal;
import org.inkgate.format.refusal.InvalidContent;
import org.inkgate.format.refusal.SizeLimitExceeded;
import org.inkgate.format.refusal.UnsupportedSchema;

/**
 * A client installation's enrolment (docs/formats.md, "Installation enrolment file"): its Ed25519
 * public key and fingerprint, the machine label the invigilator gave, the host name and when it
 * was made, signed by the installation key itself. The signature proves that whoever wrote the
 * file held the installation's private key, so a file cannot enrol a key its writer does not
 * hold, and any change to the label or key after writing is detected.
 *
 * @param fingerprint the fingerprint of {@code signingKey} (see docs/formats.md, "Trust")
 * @param signingKey  the installation's raw 32-byte Ed25519 public key
 * @param machine     the seat or machine label the invigilator gave, or the host name
 * @param hostName    the machine's host name as the client saw it ("" when unknown)
 * @param createdAt   when the file was written, to the second
 */
public record InstallationEnrolment(String fingerprint, byte[] signingKey, String machine, String hostName,
        Instant createdAt) {

    public static final String FORMAT = "inkgate-installation-enrolment";
    public static final int SCHEMA_VERSION = 1;
    /** The file name ending the client writes and the admin tool expects. */
    public static final String FILE_SUFFIX = ".inkenrol";
    /** Larger files are refused before parsing: a real one is under 1 KiB. */
    public static final int MAX_FILE_BYTES = 16 * 1024;
    /** Labels longer than this are refused: they are read aloud and printed in lists. */
    public static final int MAX_LABEL_LENGTH = 80;

    public InstallationEnrolment {
        Objects.requireNonNull(fingerprint, "fingerprint");
        signingKey = signingKey.clone();
        Objects.requireNonNull(machine, "machine");
        Objects.requireNonNull(hostName, "hostName");
        createdAt = createdAt.truncatedTo(ChronoUnit.SECONDS);
    }

    @Override
    public byte[] signingKey() {
        return signingKey.clone();
    }

    /** The JSON document on disk; {@code signature} covers {@link #signedText}. */
    public record Document(String format, int schemaVersion, String fingerprint, String signingKey, String machine,
            String hostName, String createdAt, String signature) {
    }

    /**
     * Writes the enrolment of the installation whose private key is given.
     *
     * @throws IllegalArgumentException when a label is not allowed ({@link #labelProblem})
     */
    public static byte[] write(PrivateKey installationKey, String machine, String hostName, Instant createdAt) {
        for (String label : new String[] {machine, hostName}) {
            String problem = labelProblem(label);
            if (problem != null) {
                throw new IllegalArgumentException(problem);
            }
        }
        byte[] raw = Ed25519.rawPublic(Ed25519.publicOf(installationKey));
        InstallationEnrolment e = new InstallationEnrolment(Fingerprint.of(raw), raw, machine, hostName, createdAt);
        byte[] signature = Ed25519.sign(installationKey, e.signedText());
        Base64.Encoder b64 = Base64.getEncoder();
        return Json.write(new Document(FORMAT, SCHEMA_VERSION, e.fingerprint(), b64.encodeToString(raw), machine, hostName,
                e.createdAt().toString(), b64.encodeToString(signature)));
    }

    /** Reads and checks an enrolment file on disk, refusing an oversized one before reading it. */
    public static InstallationEnrolment read(java.nio.file.Path file) throws java.io.IOException, FormatRefusal {
        long size = java.nio.file.Files.size(file);
        if (size > MAX_FILE_BYTES) {
            throw new SizeLimitExceeded(file.toString(), "the enrolment file (" + size + " bytes)", MAX_FILE_BYTES);
        }
        return read(file.toString(), java.nio.file.Files.readAllBytes(file));
    }

    /**
     * Reads and checks an enrolment file.
     *
     * @param file  the file's name, for messages
     * @param bytes its content
     * @throws FormatRefusal when it is not an enrolment file, is damaged, or was changed after signing
     */
    public static InstallationEnrolment read(String file, byte[] bytes) throws FormatRefusal {
        if (bytes.length > MAX_FILE_BYTES) {
            throw new SizeLimitExceeded(file, "the enrolment file (" + bytes.length + " bytes)", MAX_FILE_BYTES);
        }
        if (!startsLikeAnObject(bytes)) {
            throw new UnsupportedSchema(file, "this is not an installation enrolment file (it is not a JSON object)."
                    + " Use the file that  inkgate-client --installation  wrote on the client machine");
        }
        var tree = Json.tree(file, "enrolment", bytes);
        if (!tree.isObject() || !FORMAT.equals(tree.path("format").asText(null))) {
            throw new UnsupportedSchema(file, "this is not an installation enrolment file (its \"format\" is not \""
                    + FORMAT + "\"). Use the file that  inkgate-client --installation  wrote on the client machine");
        }
        if (tree.path("schemaVersion").asInt(-1) != SCHEMA_VERSION) {
            throw new UnsupportedSchema(file, "the enrolment file has schemaVersion " + tree.path("schemaVersion")
                    + "; this tool reads version " + SCHEMA_VERSION + ". Use the same Inkgate version on the client"
                    + " and the admin machine");
        }
        Document d = Json.bind(file, "enrolment", bytes, Document.class);
        byte[] raw = base64(file, "signingKey", d.signingKey());
        byte[] signature = base64(file, "signature", d.signature());
        if (raw.length != Ed25519.KEY_BYTES) {
            throw new InvalidContent(file, "signingKey has " + raw.length + " bytes, not " + Ed25519.KEY_BYTES
                    + ". The file is damaged: ask the invigilator to run  inkgate-client --installation  again");
        }
        for (String label : new String[] {d.machine(), d.hostName()}) {
            String problem = labelProblem(label);
            if (problem != null) {
                throw new InvalidContent(file, problem + ". The file was not written by the Inkgate client");
            }
        }
        Instant created;
        try {
            created = Instant.parse(String.valueOf(d.createdAt()));
        } catch (DateTimeParseException e) {
            throw new InvalidContent(file, "createdAt \"" + d.createdAt() + "\" is not an ISO-8601 UTC time");
        }
        InstallationEnrolment e = new InstallationEnrolment(Fingerprint.of(raw), raw, d.machine(), d.hostName(), created);
        if (!e.createdAt().toString().equals(d.createdAt())) {
            throw new InvalidContent(file, "createdAt \"" + d.createdAt() + "\" is not written to the second in UTC,"
                    + " as the client writes it");
        }
        PublicKey key;
        try {
            key = Ed25519.publicFromRaw(raw);
        } catch (IllegalArgumentException ex) {
            throw new InvalidContent(file, "signingKey is not an Ed25519 public key. The file is damaged: ask the"
                    + " invigilator to run  inkgate-client --installation  again");
        }
        if (!e.fingerprint().equals(d.fingerprint())) {
            throw new InvalidContent(file, "the fingerprint written in the file (" + d.fingerprint() + ") does not belong"
                    + " to its key (" + e.fingerprint() + "). The file was changed after it was written: do not enrol"
                    + " it; ask the invigilator for a fresh one from the machine itself");
        }
        if (!Ed25519.verify(key, e.signedText(), signature)) {
            throw new InvalidContent(file, "the signature does not match the file's content: it was changed after the"
                    + " client wrote it, or is damaged. Do not enrol it; ask the invigilator to run"
                    + "  inkgate-client --installation  on that machine again and hand over the new file");
        }
        return e;
    }

    /**
     * The exact bytes the installation key signs: UTF-8 of the format name and version, then the
     * raw key in base64, the machine label, the host name and the creation time, each on its own
     * line ending in a line feed. Labels cannot contain line breaks, so the text has one reading.
     */
    byte[] signedText() {
        return (FORMAT + "/" + SCHEMA_VERSION + "\n" + Base64.getEncoder().encodeToString(signingKey) + "\n" + machine
                + "\n" + hostName + "\n" + createdAt + "\n").getBytes(StandardCharsets.UTF_8);
    }

    /**
     * Why a machine label or host name cannot go into an enrolment file, or null when it can:
     * it is shown in lists and terminals, so control, line-separator and direction characters are
     * refused, and so is a label over {@value #MAX_LABEL_LENGTH} characters.
     */
    public static String labelProblem(String label) {
        if (label == null) {
            return "a machine label is missing";
        }
        if (label.codePointCount(0, label.length()) > MAX_LABEL_LENGTH) {
            return "the machine label is longer than " + MAX_LABEL_LENGTH + " characters";
        }
        boolean hidden = label.codePoints().anyMatch(c -> c < 0x20 || (c >= 0x7f && c <= 0x9f) || c == 0x061c
                || c == 0x200e || c == 0x200f || (c >= 0x2028 && c <= 0x202e) || (c >= 0x2066 && c <= 0x2069));
        return hidden ? "the machine label contains control, line-break or direction characters" : null;
    }

    /** The file name the client gives this enrolment: made of the fingerprint only, never of a label. */
    public String fileName() {
        return "installation-" + fingerprint + FILE_SUFFIX;
    }

    private static boolean startsLikeAnObject(byte[] bytes) {
        for (byte b : bytes) {
            if (b != ' ' && b != '\t' && b != '\r' && b != '\n') {
                return b == '{';
            }
        }
        return false;
    }

    private static byte[] base64(String file, String field, String value) throws InvalidContent {
        try {
            return Base64.getDecoder().decode(String.valueOf(value));
        } catch (IllegalArgumentException e) {
            throw new InvalidContent(file, field + " is not base64. The file is damaged: ask the invigilator to run"
                    + "  inkgate-client --installation  again");
        }
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof InstallationEnrolment e && fingerprint.equals(e.fingerprint)
                && java.util.Arrays.equals(signingKey, e.signingKey) && machine.equals(e.machine)
                && hostName.equals(e.hostName) && createdAt.equals(e.createdAt);
    }

    @Override
    public int hashCode() {
        return Objects.hash(fingerprint, java.util.Arrays.hashCode(signingKey), machine, hostName, createdAt);
    }
}
