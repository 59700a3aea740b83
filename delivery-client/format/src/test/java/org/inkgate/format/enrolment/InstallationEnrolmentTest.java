package org.inkgate.format.enrolment;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.security.KeyPair;
import java.time.Instant;
import java.util.Base64;
import org.inkgate.format.crypto.Ed25519;
import org.inkgate.format.crypto.Fingerprint;
import org.inkgate.format.refusal.FormatRefusal;
import org.inkgate.format.refusal.InvalidContent;
import org.inkgate.format.refusal.MalformedJson;
import org.inkgate.format.refusal.UnsupportedSchema;
import org.junit.jupiter.api.Test;

class InstallationEnrolmentTest {

    private final KeyPair installation = Ed25519.generate();
    private final Instant created = Instant.parse("2026-05-04T08:15:30Z");

    private String written(String machine) {
        return new String(InstallationEnrolment.write(installation.getPrivate(), machine, "lab-pc-07", created),
                StandardCharsets.UTF_8);
    }

    @Test
    void readsBackWhatTheInstallationWrote() throws FormatRefusal {
        InstallationEnrolment e = InstallationEnrolment.read("seat.inkenrol",
                written("Room 2, seat 14").getBytes(StandardCharsets.UTF_8));
        // the fingerprint is computed from the key, independently of the file's own claim
        assertEquals(Fingerprint.of(Ed25519.rawPublic(installation.getPublic())), e.fingerprint());
        assertEquals("Room 2, seat 14", e.machine());
        assertEquals("lab-pc-07", e.hostName());
        assertEquals(created, e.createdAt());
        assertEquals("installation-" + e.fingerprint() + ".inkenrol", e.fileName());
    }

    @Test
    void aChangedLabelBreaksTheSignature() {
        String tampered = written("Room 2, seat 14").replace("seat 14", "seat 15");
        InvalidContent refusal = assertThrows(InvalidContent.class,
                () -> InstallationEnrolment.read("seat.inkenrol", tampered.getBytes(StandardCharsets.UTF_8)));
        assertTrue(refusal.getMessage().contains("signature does not match"), refusal.getMessage());
    }

    @Test
    void anotherKeyPastedInWithoutItsSecretIsRefused() {
        // someone swaps in their own key and fingerprint but cannot sign as the installation
        KeyPair other = Ed25519.generate();
        byte[] raw = Ed25519.rawPublic(other.getPublic());
        String original = written("seat 3");
        String swapped = original
                .replace(Base64.getEncoder().encodeToString(Ed25519.rawPublic(installation.getPublic())),
                        Base64.getEncoder().encodeToString(raw))
                .replace(Fingerprint.of(Ed25519.rawPublic(installation.getPublic())), Fingerprint.of(raw));
        InvalidContent refusal = assertThrows(InvalidContent.class,
                () -> InstallationEnrolment.read("seat.inkenrol", swapped.getBytes(StandardCharsets.UTF_8)));
        assertTrue(refusal.getMessage().contains("signature does not match"), refusal.getMessage());
    }

    @Test
    void aFingerprintThatIsNotTheKeysIsRefused() {
        String original = written("seat 3");
        String fp = Fingerprint.of(Ed25519.rawPublic(installation.getPublic()));
        String changed = original.replace("\"fingerprint\" : \"" + fp, "\"fingerprint\" : \"0000" + fp.substring(4));
        InvalidContent refusal = assertThrows(InvalidContent.class,
                () -> InstallationEnrolment.read("seat.inkenrol", changed.getBytes(StandardCharsets.UTF_8)));
        assertTrue(refusal.getMessage().contains("does not belong to its key"), refusal.getMessage());
    }

    @Test
    void foreignAndDamagedFilesAreRefusedWithTheReason() {
        assertThrows(UnsupportedSchema.class, () -> InstallationEnrolment.read("x.json",
                "{\"format\":\"inkgate-response-content\",\"schemaVersion\":1}".getBytes(StandardCharsets.UTF_8)));
        UnsupportedSchema zip = assertThrows(UnsupportedSchema.class,
                () -> InstallationEnrolment.read("x.inkresp", new byte[] {'P', 'K', 3, 4, 0}));
        assertTrue(zip.getMessage().contains("not an installation enrolment file"), zip.getMessage());
        String cut = written("seat 3");
        assertThrows(MalformedJson.class, () -> InstallationEnrolment.read("x.inkenrol",
                cut.substring(0, cut.length() / 2).getBytes(StandardCharsets.UTF_8)));
        UnsupportedSchema newer = assertThrows(UnsupportedSchema.class, () -> InstallationEnrolment.read("x.inkenrol",
                cut.replace("\"schemaVersion\" : 1", "\"schemaVersion\" : 2").getBytes(StandardCharsets.UTF_8)));
        assertTrue(newer.getMessage().contains("schemaVersion 2"), newer.getMessage());
    }

    @Test
    void labelsThatCouldSteerATerminalAreRefusedOnBothSides() {
        assertThrows(IllegalArgumentException.class,
                () -> InstallationEnrolment.write(installation.getPrivate(), "seat\u001b[2J", "h", created));
        assertThrows(IllegalArgumentException.class,
                () -> InstallationEnrolment.write(installation.getPrivate(), "seat\u202e41", "h", created));
        assertThrows(IllegalArgumentException.class,
                () -> InstallationEnrolment.write(installation.getPrivate(), "x".repeat(81), "h", created));
    }
}
