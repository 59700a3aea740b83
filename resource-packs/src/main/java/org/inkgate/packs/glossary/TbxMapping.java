package org.inkgate.packs.glossary;

import java.util.ArrayList;
import java.util.List;
import org.inkgate.packs.glossary.TbxImporter.Node;

/** Maps one TBX concept tree to a {@link GlossaryEntry}; see docs/resource-packs.md for the table. */
final class TbxMapping {
    private TbxMapping() {
    }

    static GlossaryEntry concept(Node concept, String where, int ordinal) throws GlossaryImportException {
        String id = concept.id() == null || concept.id().isBlank() ? "c" + ordinal : concept.id().strip();
        String subject = null;
        List<String> notes = new ArrayList<>();
        List<LanguageSection> sections = new ArrayList<>();
        List<GlossaryField> other = new ArrayList<>();
        String conceptDefinition = null;
        for (Node n : concept.children()) {
            String cat = n.category();
            if (isDescrip(n) && "definition".equals(cat) && conceptDefinition == null) {
                conceptDefinition = n.value();
            } else if (n.name().equals("descripGrp") && "definition".equals(mainCategory(n)) && conceptDefinition == null) {
                conceptDefinition = main(n).value();
                keepCompanions(n, "definition", other);
            } else if (isDescrip(n) && "subjectField".equals(cat) && subject == null) {
                subject = n.value();
            } else if (n.name().equals("descripGrp") && "subjectField".equals(mainCategory(n)) && subject == null) {
                subject = main(n).value();
                keepCompanions(n, "subjectField", other);
            } else if (n.name().equals("note") && n.core()) {
                notes.add(n.value());
            } else if (n.name().equals("langSec") || n.name().equals("langSet")) {
                sections.add(language(n, where, id));
            } else {
                keep(n, "", other);
            }
        }
        if (sections.isEmpty()) {
            throw TbxImporter.error(where, concept.location(), "concept \"" + id + "\" has no langSec (or langSet); "
                    + "every concept needs at least one language section with a term");
        }
        if (conceptDefinition != null) {
            // ISO 30042 allows the definition at concept level (it describes the concept in every language);
            // a language section without a definition of its own shows that one
            List<LanguageSection> withDefinition = new ArrayList<>();
            for (LanguageSection s : sections) {
                withDefinition.add(s.definition() != null ? s
                        : new LanguageSection(s.language(), conceptDefinition, s.notes(), s.terms(), s.other()));
            }
            sections = withDefinition;
        }
        return new GlossaryEntry(id, subject, notes, sections, other);
    }

    private static LanguageSection language(Node sec, String where, String conceptId) throws GlossaryImportException {
        if (sec.lang() == null || sec.lang().isBlank()) {
            throw TbxImporter.error(where, sec.location(), "a language section of concept \"" + conceptId
                    + "\" has no xml:lang; add e.g. xml:lang=\"en\"");
        }
        String definition = null;
        List<String> notes = new ArrayList<>();
        List<GlossaryTerm> terms = new ArrayList<>();
        List<GlossaryField> other = new ArrayList<>();
        for (Node n : sec.children()) {
            if (isDescrip(n) && "definition".equals(n.category()) && definition == null) {
                definition = n.value();
            } else if (n.name().equals("descripGrp") && "definition".equals(mainCategory(n)) && definition == null) {
                definition = main(n).value();
                keepCompanions(n, "definition", other);
            } else if (n.name().equals("note") && n.core()) {
                notes.add(n.value());
            } else if (n.name().equals("termSec") || n.name().equals("tig") || n.name().equals("ntig")) {
                terms.add(term(n, where, conceptId));
            } else {
                keep(n, "", other);
            }
        }
        if (terms.isEmpty()) {
            throw TbxImporter.error(where, sec.location(), "language section " + sec.lang() + " of concept \"" + conceptId
                    + "\" has no term; add a termSec with a <term>");
        }
        return new LanguageSection(sec.lang().strip(), definition, notes, terms, other);
    }

    private static GlossaryTerm term(Node sec, String where, String conceptId) throws GlossaryImportException {
        String text = null;
        String pos = null;
        String context = null;
        List<String> notes = new ArrayList<>();
        List<GlossaryField> other = new ArrayList<>();
        List<Node> children = new ArrayList<>();
        for (Node n : sec.children()) {
            // TBX v2 ntig wraps term and termNotes in a termGrp
            if (n.name().equals("termGrp")) {
                children.addAll(n.children());
            } else {
                children.add(n);
            }
        }
        for (Node n : children) {
            String cat = n.category();
            if (n.name().equals("term") && text == null) {
                text = n.deepValue();
            } else if (isTermNote(n) && "partOfSpeech".equals(cat) && pos == null) {
                pos = n.value();
            } else if (isDescrip(n) && "context".equals(cat) && context == null) {
                context = n.value();
            } else if (n.name().equals("descripGrp") && "context".equals(mainCategory(n)) && context == null) {
                context = main(n).value();
                keepCompanions(n, "context", other);
            } else if (n.name().equals("note") && n.core()) {
                notes.add(n.value());
            } else {
                keep(n, "", other);
            }
        }
        if (text == null || text.isBlank()) {
            throw TbxImporter.error(where, sec.location(), "a term section of concept \"" + conceptId
                    + "\" has no <term> text; add the term or remove the section");
        }
        String tooLong = IndexLimits.tooLong("term", text);
        if (tooLong != null) {
            throw TbxImporter.error(where, sec.location(), "concept \"" + conceptId + "\": " + tooLong);
        }
        return new GlossaryTerm(text, pos, context, notes, other);
    }

    private static boolean isDescrip(Node n) {
        return n.name().equals("descrip") || !n.core();
    }

    private static boolean isTermNote(Node n) {
        return n.name().equals("termNote") || !n.core();
    }

    private static Node main(Node group) {
        for (Node c : group.children()) {
            if (isDescrip(c) && c.category() != null) {
                return c;
            }
        }
        return group;
    }

    private static String mainCategory(Node group) {
        Node m = main(group);
        return m == group ? null : m.category();
    }

    /** Keeps the other children of a descripGrp (source, note...) under the main category's name. */
    private static void keepCompanions(Node group, String mainCategory, List<GlossaryField> out) {
        Node m = main(group);
        for (Node c : group.children()) {
            if (c != m) {
                keep(c, mainCategory + "/", out);
            }
        }
    }

    /** Keeps an element with no place of its own; groups are flattened, one field per leaf. */
    private static void keep(Node n, String prefix, List<GlossaryField> out) {
        String name = prefix + n.name() + (n.category() != null && n.core() ? ":" + n.category() : "");
        if (n.children().isEmpty()) {
            out.add(new GlossaryField(name, n.value(), n.target()));
            return;
        }
        for (Node c : n.children()) {
            keep(c, name + "/", out);
        }
    }
}
