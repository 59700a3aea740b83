package org.inkgate.admin.core.collection;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import org.inkgate.admin.core.simulation.SimulatedSitting;
import org.inkgate.admin.core.store.ResultsStore;
import org.inkgate.admin.core.testutil.Sitting;
import org.inkgate.admin.core.testutil.StoreFixture;
import org.inkgate.format.testutil.TestKeys;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * A package of a candidate the bundle's roster does not name is imported and marked off the roster, so that the
 * collect's report lists it for checking; the packages of candidates on the roster, the first, a middle and the last,
 * are not marked. The collector looks candidate numbers up in a set made once from the roster.
 */
class OffRosterTest {

    @TempDir
    Path dir;

    @Test
    void aCandidateNotOnTheRoster_isImportedAndMarked_theOthersNot() throws Exception {
        Sitting sitting = Sitting.make(dir, 30);
        SimulatedSitting client = new SimulatedSitting(sitting.manifest(), sitting.manifestSha256(),
                TestKeys.INSTALLATION_SIGNING, TestKeys.ownerEncryptionPublic());
        Path packages = Files.createDirectories(dir.resolve("packages"));
        List<String> candidates = List.of("C001", "C015", "C030", "C031");
        for (int i = 0; i < candidates.size(); i++) {
            String c = candidates.get(i);
            client.write(c, sitting.formOf("C001"), i, 20, packages.resolve(c + Collector.EXTENSION));
        }
        try (ResultsStore store = StoreFixture.create(StoreFixture.Kind.SQLITE, dir).results()) {
            store.registerBundle(sitting.manifest(), sitting.manifestSha256(), TestKeys.ownerFingerprint());
            List<Outcome> outcomes = new Collector(store, TestKeys.OWNER_ENCRYPTION, TestKeys.installations(),
                    Map.of(sitting.manifestSha256(), sitting.manifest()), 2).collect(Collector.packageFiles(List.of(packages)), o -> { });
            assertEquals(Map.of("C001", true, "C015", true, "C030", true, "C031", false), Map.of(
                    number(outcomes, 0), onRoster(outcomes, 0), number(outcomes, 1), onRoster(outcomes, 1),
                    number(outcomes, 2), onRoster(outcomes, 2), number(outcomes, 3), onRoster(outcomes, 3)), outcomes.toString());
        }
    }

    private static String number(List<Outcome> outcomes, int i) {
        return ((Outcome.Imported) outcomes.get(i)).candidateNumber();
    }

    private static boolean onRoster(List<Outcome> outcomes, int i) {
        return ((Outcome.Imported) outcomes.get(i)).onRoster();
    }
}
