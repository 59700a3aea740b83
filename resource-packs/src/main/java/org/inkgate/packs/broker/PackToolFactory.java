package org.inkgate.packs.broker;

import java.nio.file.Path;
import java.time.Clock;
import java.util.Collection;
import org.inkgate.packs.dictionary.Dictionary;
import org.inkgate.packs.glossary.Glossary;
import org.inkgate.packs.pack.OpenedPack;
import org.inkgate.packs.pack.PackFiles;
import org.inkgate.packs.pack.PackRefusal;
import org.inkgate.packs.policy.SpellingMode;
import org.inkgate.packs.spelling.EnglishVariant;
import org.inkgate.packs.spelling.SpellingChecker;
import org.inkgate.packs.spelling.SpellingEngine;

/** The real factory: LanguageTool checkers, and packs from a catalogue, each verified and checked for id on open. */
public final class PackToolFactory implements ToolFactory {
    private final PackCatalogue catalogue;
    private final Path workFolder;
    private final Clock clock;

    /**
     * @param catalogue  where the exam's packs are
     * @param workFolder where opened packs are extracted (each in its own folder, deleted on close)
     * @param clock      the clock events are stamped with
     */
    public PackToolFactory(PackCatalogue catalogue, Path workFolder, Clock clock) {
        this.catalogue = catalogue;
        this.workFolder = workFolder;
        this.clock = clock;
    }

    @Override
    public SpellingChecker spellingChecker(EnglishVariant variant, SpellingMode mode, Collection<String> examWords) {
        return SpellingEngine.create(variant, mode, examWords, clock);
    }

    @Override
    public Glossary glossary(String packId) throws PackRefusal {
        return Glossary.open(openChecked(packId), clock);
    }

    @Override
    public Dictionary dictionary(String packId) throws PackRefusal {
        return Dictionary.open(openChecked(packId), clock);
    }

    private OpenedPack openChecked(String packId) throws PackRefusal {
        Path file = catalogue.locate(packId);
        OpenedPack opened = PackFiles.open(file, workFolder);
        if (!opened.manifest().id().equals(packId)) {
            opened.close();
            throw new PackRefusal(PackRefusal.Reason.WRONG_PACK, file + " holds pack \"" + opened.manifest().id()
                    + "\", but the task names \"" + packId + "\"");
        }
        return opened;
    }
}
