package org.inkgate.client.testutil;

import java.io.IOException;
import java.nio.file.Path;
import org.inkgate.client.demo.DemoSource;
import org.inkgate.client.demo.DemoSourceException;
import org.inkgate.format.bundle.BundleManifest;
import org.inkgate.format.bundle.BundleWriter;
import org.inkgate.format.bundle.PinHasher;

/** A bundle for a live sitting (practice=false, with an invigilator PIN), made from the demo source. */
public final class LiveBundles {

    private LiveBundles() {
    }

    public static Path buildInto(Path folder) throws DemoSourceException, IOException {
        DemoSource demo = DemoSource.read(DemoBundles.SOURCE);
        BundleManifest m = demo.manifest();
        BundleManifest live = new BundleManifest(m.format(), m.schemaVersion(), "live-" + m.examId(), m.title(),
                m.language(), m.instructionsFile(), m.tasks(), m.conditions(), m.forms(), m.questionnaires(),
                m.packs(), m.roster(), m.ownerKeys(), PinHasher.hash("246813".toCharArray()), null, false, null);
        Path out = folder.resolve("live.inkexam");
        new BundleWriter(demo.signingKey()).write(live, demo.contents(), out);
        return out;
    }
}
