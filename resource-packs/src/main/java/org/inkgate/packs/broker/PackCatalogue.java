package org.inkgate.packs.broker;

import java.nio.file.Path;
import java.util.Map;
import java.util.TreeMap;
import org.inkgate.packs.pack.PackRefusal;

/** Where the packs of an exam are on this machine, by pack id (e.g. the packs embedded in a bundle, once extracted). */
public final class PackCatalogue {
    private final Map<String, Path> packs;

    private PackCatalogue(Map<String, Path> packs) {
        this.packs = Map.copyOf(packs);
    }

    /** A catalogue of these packs. */
    public static PackCatalogue of(Map<String, Path> packs) {
        return new PackCatalogue(packs);
    }

    /** The file of a pack; refuses an id the exam does not carry. */
    public Path locate(String packId) throws PackRefusal {
        Path p = packs.get(packId);
        if (p == null) {
            throw new PackRefusal(PackRefusal.Reason.WRONG_PACK, "the task names pack \"" + packId
                    + "\", which this exam does not carry (it carries " + new TreeMap<>(packs).keySet() + ")");
        }
        return p;
    }
}
