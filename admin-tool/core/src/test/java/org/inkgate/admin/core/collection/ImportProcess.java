package org.inkgate.admin.core.collection;

import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.Set;
import org.inkgate.admin.core.store.ResultsStore;
import org.inkgate.admin.core.testutil.StoreFixture;
import org.inkgate.format.bundle.BundleReader;
import org.inkgate.format.bundle.OpenedBundle;
import org.inkgate.format.testutil.TestKeys;
import org.inkgate.format.trust.TrustPolicy;

/** A separate JVM that imports a folder of packages, for {@link KilledImportTest} to kill. Test code only. */
public final class ImportProcess {

    private ImportProcess() {
    }

    public static void main(String[] args) throws Exception {
        Path store = Path.of(args[0]);
        Path bundle = Path.of(args[1]);
        Path packages = Path.of(args[2]);
        try (ResultsStore s = StoreFixture.of(store).results();
                OpenedBundle b = new BundleReader(TrustPolicy.trusting(Set.of(TestKeys.ownerFingerprint()))).open(bundle)) {
            s.registerBundle(b.manifest(), b.manifestSha256(), b.signerFingerprint());
            new Collector(s, TestKeys.OWNER_ENCRYPTION, TestKeys.installations(), Map.of(b.manifestSha256(), b.manifest()), 1)
                    .collect(Collector.packageFiles(List.of(packages)), o -> { });
        }
    }
}
