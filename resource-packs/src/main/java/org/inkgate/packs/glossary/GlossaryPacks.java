package org.inkgate.packs.glossary;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Locale;
import java.util.Set;
import org.inkgate.packs.pack.ScratchFolder;
import org.inkgate.packs.pack.PackDraft;
import org.inkgate.packs.pack.PackFiles;
import org.inkgate.packs.pack.PackKind;
import org.inkgate.packs.pack.PackManifest;
import org.inkgate.packs.pack.PackRefusal;

/** Builds glossary packs from TBX, CSV or TSV term banks. */
public final class GlossaryPacks {
    /** Folder of the Lucene index inside a glossary pack. */
    static final String INDEX_FOLDER = "index";

    private GlossaryPacks() {
    }

    /** What the test owner says about the term bank; the rest comes from the data. */
    public record Metadata(String id, String version, String title, String licence, String attribution, Instant builtAt) {
    }

    /** Reads a term bank by its extension: {@code .tbx} or {@code .xml} as TBX, {@code .tsv} as TSV, else CSV. */
    public static List<GlossaryEntry> importFile(Path source) throws GlossaryImportException, IOException {
        String name = source.getFileName().toString().toLowerCase(Locale.ROOT);
        if (name.endsWith(".tbx") || name.endsWith(".xml")) {
            return TbxImporter.read(source);
        }
        return DelimitedImporter.read(source, DelimitedImporter.dialectOf(source));
    }

    /**
     * Builds a glossary pack: the entries are indexed in a scratch folder under {@code work}
     * and the pack is written atomically, so a failure leaves no pack behind.
     */
    public static PackManifest build(List<GlossaryEntry> entries, Metadata meta, Path target, Path work) throws IOException, PackRefusal {
        if (entries.isEmpty()) {
            throw new IllegalArgumentException("the term bank has no entries; a glossary pack needs at least one");
        }
        try (ScratchFolder folder = ScratchFolder.create(work, "glossary-build-")) {
            Path scratch = folder.path();
            Path index = scratch.resolve(INDEX_FOLDER);
            Files.createDirectories(index);
            GlossaryIndex.write(entries, index);
            Set<String> languages = new HashSet<>();
            List<String> ordered = new ArrayList<>();
            for (GlossaryEntry e : entries) {
                for (LanguageSection s : e.languages()) {
                    if (languages.add(s.language())) {
                        ordered.add(s.language());
                    }
                }
            }
            PackDraft draft = new PackDraft(meta.id(), PackKind.GLOSSARY, meta.version(), meta.title(), ordered,
                    meta.licence(), meta.attribution(), entries.size(), meta.builtAt());
            return PackFiles.write(target, draft, scratch);
        }
    }
}
