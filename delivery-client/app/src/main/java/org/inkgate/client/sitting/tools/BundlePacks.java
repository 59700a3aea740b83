package org.inkgate.client.sitting.tools;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.LinkedHashMap;
import java.util.Map;
import org.inkgate.format.bundle.OpenedBundle;
import org.inkgate.format.bundle.PackRef;
import org.inkgate.format.io.PrivateTempFolder;
import org.inkgate.packs.broker.PackCatalogue;
import org.inkgate.packs.broker.PackToolFactory;
import org.inkgate.packs.broker.ResourceBroker;

/**
 * The broker for one sitting, over the packs embedded in the bundle. Packs are read from where
 * the verified bundle lies unpacked; a sealed bundle's packs are decrypted into this sitting's
 * private temporary folder, because the search indexes need files (the folder is deleted when
 * the sitting closes, and after a crash when the OS clears its temporary files).
 */
public final class BundlePacks implements AutoCloseable {

    private final PrivateTempFolder work;
    private final ResourceBroker broker;

    public BundlePacks(OpenedBundle bundle) throws IOException {
        work = PrivateTempFolder.create("inkgate-sitting-packs-");
        try {
            Map<String, Path> files = new LinkedHashMap<>();
            for (PackRef pack : bundle.manifest().packs()) {
                if (bundle.sealed()) {
                    Path file = work.resolve("packs/" + pack.id() + ".inkpack");
                    Files.createDirectories(file.getParent());
                    Files.write(file, bundle.readBytes(pack.file()));
                    files.put(pack.id(), file);
                } else {
                    files.put(pack.id(), bundle.path(pack.file()));
                }
            }
            Path opened = work.resolve("opened");
            Files.createDirectories(opened);
            broker = new ResourceBroker(new PackToolFactory(PackCatalogue.of(files), opened, java.time.Clock.systemUTC()));
        } catch (IOException | RuntimeException e) {
            work.close();
            throw e;
        }
    }

    public ResourceBroker broker() {
        return broker;
    }

    @Override
    public void close() throws IOException {
        work.close();
    }
}
