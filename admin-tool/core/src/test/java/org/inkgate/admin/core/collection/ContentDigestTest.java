package org.inkgate.admin.core.collection;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.security.MessageDigest;
import org.inkgate.admin.core.simulation.SimulatedSitting;
import org.inkgate.admin.core.testutil.Sitting;
import org.inkgate.format.crypto.Hex;
import org.inkgate.format.json.Json;
import org.inkgate.format.response.OpenedResponse;
import org.inkgate.format.response.ProcessEvent;
import org.inkgate.format.response.ResponsePackageReader;
import org.inkgate.format.testutil.TestKeys;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The content digest that tells a re-sent copy from a conflicting package is stored in every
 * results store, so a faster computation must give the same value: checked against the
 * definition written out here (length-prefixed response JSON, then seq|at|mono|type|task|data per
 * event), over a package opened from bytes as the collector now opens it.
 */
class ContentDigestTest {

    @TempDir
    Path dir;

    @Test
    void contentSha256_ofAWrittenPackage_equalsTheStoredDefinition() throws Exception {
        Sitting sitting = Sitting.make(dir, 2);
        SimulatedSitting client = new SimulatedSitting(sitting.manifest(), sitting.manifestSha256(),
                TestKeys.INSTALLATION_SIGNING, TestKeys.ownerEncryptionPublic());
        String c = sitting.roster().getFirst().candidateNumber();
        Path file = dir.resolve(c + ".inkresp");
        client.write(c, sitting.formOf(c), 7, 300, file);

        OpenedResponse opened = new ResponsePackageReader(TestKeys.OWNER_ENCRYPTION, TestKeys.installations())
                .open(file.getFileName().toString(), Files.readAllBytes(file));

        assertEquals(definition(opened), Collector.contentSha256(opened));
    }

    static String definition(OpenedResponse opened) throws Exception {
        MessageDigest digest = MessageDigest.getInstance("SHA-256");
        prefixed(digest, Json.writeLine(opened.response()));
        for (ProcessEvent e : opened.events()) {
            prefixed(digest, (e.seq() + "|" + e.at() + "|" + e.mono() + "|" + e.type() + "|" + e.task() + "|" + e.data())
                    .getBytes(StandardCharsets.UTF_8));
        }
        return Hex.of(digest.digest());
    }

    private static void prefixed(MessageDigest digest, byte[] bytes) {
        int n = bytes.length;
        digest.update(new byte[] {(byte) (n >>> 24), (byte) (n >>> 16), (byte) (n >>> 8), (byte) n});
        digest.update(bytes);
    }
}
