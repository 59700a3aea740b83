package org.inkgate.packs.bench;

import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Random;
import java.util.Set;
import org.inkgate.packs.glossary.GlossaryEntry;
import org.inkgate.packs.glossary.GlossaryTerm;
import org.inkgate.packs.glossary.LanguageSection;

/** A generated bilingual term bank of pseudo-words (seeded, so every run indexes the same data). Benchmarks only. */
final class SyntheticGlossary {
    private static final String[] EN = {"ba", "ker", "lo", "mi", "tan", "ve", "sor", "pel", "dri", "gon", "fa", "rum", "tes", "nal", "qui", "hob"};
    private static final String[] ES = {"ca", "rro", "mi", "sa", "ten", "li", "bo", "ra", "que", "dal", "ño", "vi", "ga", "zur", "pe", "llo"};

    private SyntheticGlossary() {
    }

    static List<GlossaryEntry> generate(int n, long seed) {
        Random r = new Random(seed);
        Set<String> seen = new HashSet<>();
        List<GlossaryEntry> out = new ArrayList<>(n);
        while (out.size() < n) {
            String en = phrase(r, EN);
            if (!seen.add(en)) {
                continue;
            }
            String es = phrase(r, ES);
            out.add(new GlossaryEntry("g" + out.size(), "synthetic", List.of(), List.of(
                    new LanguageSection("en", "Definition of " + en, List.of(), List.of(new GlossaryTerm(en, "noun", null, List.of(), List.of())), List.of()),
                    new LanguageSection("es", "Definición de " + es, List.of(), List.of(new GlossaryTerm(es, "noun", null, List.of(), List.of())), List.of())),
                    List.of()));
        }
        return out;
    }

    private static String phrase(Random r, String[] syllables) {
        int words = 1 + r.nextInt(3);
        StringBuilder sb = new StringBuilder();
        for (int w = 0; w < words; w++) {
            if (w > 0) {
                sb.append(' ');
            }
            int s = 2 + r.nextInt(3);
            for (int i = 0; i < s; i++) {
                sb.append(syllables[r.nextInt(syllables.length)]);
            }
        }
        return sb.toString();
    }
}
