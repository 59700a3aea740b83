package org.inkgate.packs.glossary;

import java.io.IOException;
import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Set;
import javax.xml.XMLConstants;
import javax.xml.stream.Location;
import javax.xml.stream.XMLInputFactory;
import javax.xml.stream.XMLStreamConstants;
import javax.xml.stream.XMLStreamException;
import javax.xml.stream.XMLStreamReader;

/**
 * Imports TBX term banks (ISO 30042): TBX-Basic and TBX-Core in the 2019 namespace
 * {@code urn:iso:std:iso:30042:ed-2} and the current {@code urn:iso:std:iso:30042:ed:3.0},
 * in DCA style ({@code <descrip type="definition">}) and DCT style ({@code <basic:definition>}),
 * and legacy TBX v2 ({@code martif/termEntry/langSet/tig|ntig}). Elements are matched by local
 * name, so any of these namespaces (or none) is read the same way.
 *
 * <p>The parser never reads a DTD and never resolves an external entity (XXE), so a term bank
 * cannot make the importer read local files or reach the network. Each concept is read as a
 * small tree and mapped; fields without a place of their own are kept as {@link GlossaryField}s.
 */
public final class TbxImporter {
    private TbxImporter() {
    }

    /** Reads every concept of a TBX file; throws with line and column on the first problem. */
    public static List<GlossaryEntry> read(Path file) throws GlossaryImportException, IOException {
        try (InputStream in = Files.newInputStream(file)) {
            return read(in, file.toString());
        }
    }

    /** Reads every concept of a TBX stream; {@code where} names the source in error messages. */
    public static List<GlossaryEntry> read(InputStream in, String where) throws GlossaryImportException {
        XMLInputFactory factory = XMLInputFactory.newFactory();
        factory.setProperty(XMLInputFactory.SUPPORT_DTD, false);
        factory.setProperty(XMLInputFactory.IS_SUPPORTING_EXTERNAL_ENTITIES, false);
        factory.setProperty(XMLInputFactory.IS_REPLACING_ENTITY_REFERENCES, false);
        factory.setProperty(XMLInputFactory.IS_NAMESPACE_AWARE, true);
        factory.setProperty(XMLInputFactory.IS_COALESCING, true);
        XMLStreamReader reader = null;
        try {
            reader = factory.createXMLStreamReader(in);
            List<GlossaryEntry> entries = new ArrayList<>();
            Set<String> ids = new HashSet<>();
            boolean rootSeen = false;
            while (reader.hasNext()) {
                int event = reader.next();
                if (event == XMLStreamConstants.DTD && declaresInternalSubset(reader.getText())) {
                    throw error(where, reader.getLocation(), "the <!DOCTYPE ...> line declares its own entities or"
                            + " markup in [ ... ]; TBX files are read without DTDs for safety: remove the part in"
                            + " square brackets (or the whole line) and write characters themselves");
                }
                // a plain <!DOCTYPE martif SYSTEM "TBXcoreStructV02.dtd">, as older term bases and converters write it:
                // the DTD is never opened (SUPPORT_DTD is off), so the line is skipped
                if (event == XMLStreamConstants.ENTITY_REFERENCE) {
                    throw error(where, reader.getLocation(), "entity reference &" + reader.getLocalName()
                            + "; is not allowed: write the character itself or a numeric reference");
                }
                if (event != XMLStreamConstants.START_ELEMENT) {
                    continue;
                }
                String name = reader.getLocalName();
                if (!rootSeen) {
                    rootSeen = true;
                    if (!name.equals("tbx") && !name.equals("martif")) {
                        throw error(where, reader.getLocation(), "root element is <" + name
                                + ">, expected <tbx> (TBX 2019 or later) or <martif> (TBX v2)");
                    }
                    continue;
                }
                if (name.equals("conceptEntry") || name.equals("termEntry")) {
                    Node node = readTree(reader, where);
                    GlossaryEntry entry = TbxMapping.concept(node, where, entries.size() + 1);
                    if (!ids.add(entry.id())) {
                        throw error(where, node.location(), "concept id \"" + entry.id() + "\" is used twice; ids must be unique");
                    }
                    entries.add(entry);
                }
            }
            if (!rootSeen) {
                throw new GlossaryImportException(where, 0, 0, "the file holds no XML element; is it a TBX file?");
            }
            return entries;
        } catch (XMLStreamException e) {
            Location loc = e.getLocation();
            String msg = e.getMessage() == null ? "malformed XML" : e.getMessage().replaceFirst("(?s)^ParseError at \\[row,col\\]:\\[\\d+,\\d+\\]\\s*Message:\\s*", "");
            throw new GlossaryImportException(where, loc == null ? 0 : loc.getLineNumber(), loc == null ? 0 : loc.getColumnNumber(),
                    "malformed XML: " + msg.strip() + " (fix the XML at this place; the file was not imported)");
        } finally {
            if (reader != null) {
                try {
                    reader.close();
                } catch (XMLStreamException ignored) {
                    // closing a failed reader has nothing left to report
                }
            }
        }
    }

    /**
     * True when a DOCTYPE carries an internal subset ({@code [ ... ]}): only there can a file declare
     * entities of its own (XML 1.0, section 2.8); a bare external identifier is harmless unread.
     */
    static boolean declaresInternalSubset(String doctype) {
        if (doctype == null) {
            return false;
        }
        int quote = 0;
        for (int i = 0; i < doctype.length(); i++) {
            char c = doctype.charAt(i);
            if (quote != 0) {
                quote = c == quote ? 0 : quote;
            } else if (c == '"' || c == '\'') {
                quote = c;
            } else if (c == '[') {
                return true;
            }
        }
        return false;
    }

    /** Reads the element the reader stands on, with everything inside it, as a small tree. */
    private static Node readTree(XMLStreamReader r, String where) throws XMLStreamException, GlossaryImportException {
        Node node = startNode(r);
        List<Node> stack = new ArrayList<>();
        stack.add(node);
        while (!stack.isEmpty()) {
            int event = r.next();
            Node top = stack.get(stack.size() - 1);
            switch (event) {
                case XMLStreamConstants.START_ELEMENT -> {
                    Node child = startNode(r);
                    top.children().add(child);
                    stack.add(child);
                }
                case XMLStreamConstants.CHARACTERS, XMLStreamConstants.CDATA, XMLStreamConstants.SPACE -> top.text().append(r.getText());
                case XMLStreamConstants.ENTITY_REFERENCE -> throw error(where, r.getLocation(), "entity reference &"
                        + r.getLocalName() + "; is not allowed: write the character itself or a numeric reference");
                case XMLStreamConstants.END_ELEMENT -> stack.remove(stack.size() - 1);
                default -> {
                    // comments and processing instructions carry no term data
                }
            }
        }
        return node;
    }

    private static Node startNode(XMLStreamReader r) {
        String type = null;
        String target = null;
        String id = null;
        String lang = null;
        for (int i = 0; i < r.getAttributeCount(); i++) {
            String ns = r.getAttributeNamespace(i);
            String local = r.getAttributeLocalName(i);
            if (XMLConstants.XML_NS_URI.equals(ns) && local.equals("lang")) {
                lang = r.getAttributeValue(i);
            } else if (local.equals("lang") && "xml".equals(r.getAttributePrefix(i))) {
                lang = r.getAttributeValue(i);
            } else if (local.equals("type")) {
                type = r.getAttributeValue(i);
            } else if (local.equals("target")) {
                target = r.getAttributeValue(i);
            } else if (local.equals("id")) {
                id = r.getAttributeValue(i);
            } else if (local.equals("lang")) {
                lang = r.getAttributeValue(i);
            }
        }
        String ns = r.getNamespaceURI();
        boolean core = ns == null || ns.isEmpty() || ns.startsWith("urn:iso:std:iso:30042");
        Location loc = r.getLocation();
        return new Node(r.getLocalName(), core, type, target, id, lang, new StringBuilder(), new ArrayList<>(),
                new Where(loc.getLineNumber(), loc.getColumnNumber()));
    }

    static GlossaryImportException error(String where, Location loc, String problem) {
        return new GlossaryImportException(where, loc == null ? 0 : loc.getLineNumber(), loc == null ? 0 : loc.getColumnNumber(), problem);
    }

    static GlossaryImportException error(String where, Where loc, String problem) {
        return new GlossaryImportException(where, loc.line(), loc.column(), problem);
    }

    /** Where an element started. */
    record Where(int line, int column) {
    }

    /**
     * One element: {@code core} is false for DCT-style elements of a module namespace, whose
     * local name is then the data category.
     */
    record Node(String name, boolean core, String type, String target, String id, String lang,
                StringBuilder text, List<Node> children, Where location) {
        /** The data category: the type attribute, or the local name of a DCT-style element. */
        String category() {
            return type != null ? type : (core ? null : name);
        }

        /** Text content with whitespace runs collapsed to one space. */
        String value() {
            return text.toString().replaceAll("\\s+", " ").strip();
        }

        /** Text of this element and all descendants, whitespace collapsed (for inline markup in terms). */
        String deepValue() {
            StringBuilder sb = new StringBuilder(text);
            for (Node c : children) {
                sb.append(' ').append(c.deepValue());
            }
            return sb.toString().replaceAll("\\s+", " ").strip();
        }
    }
}
