package org.inkgate.packs.glossary;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.InputStream;
import java.util.ArrayList;
import java.util.List;
import javax.xml.XMLConstants;
import javax.xml.parsers.DocumentBuilderFactory;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.w3c.dom.Document;
import org.w3c.dom.Element;
import org.w3c.dom.Node;

/**
 * TBX import against the structure of ISO 30042 TBX-Basic (see the README beside the test files
 * for where the structure comes from). "Every field kept" is checked independently of the
 * importer: the JDK's DOM parser lists every text and target value inside the concepts, and
 * each must appear somewhere in the imported entries.
 */
class TbxImporterTest {
    private static final ObjectMapper JSON = new ObjectMapper();

    private static List<GlossaryEntry> read(String name) throws Exception {
        try (InputStream in = TbxImporterTest.class.getResourceAsStream(name)) {
            return TbxImporter.read(in, name);
        }
    }

    @ParameterizedTest
    @ValueSource(strings = {"basic-v3-dca.tbx", "basic-2019-dca.tbx", "basic-dct.tbx", "legacy-v2.tbx"})
    void read_eachDialect_keepsEveryValueOfTheSource(String file) throws Exception {
        List<GlossaryEntry> entries = read(file);
        List<String> imported = new ArrayList<>();
        collectText(JSON.valueToTree(entries), imported);
        for (String value : sourceValues(file)) {
            assertTrue(imported.contains(value), file + ": value \"" + value + "\" of the source is missing after import");
        }
    }

    @Test
    void read_basicDca_mapsTheNamedFields() throws Exception {
        List<GlossaryEntry> entries = read("basic-v3-dca.tbx");
        assertEquals(2, entries.size());
        GlossaryEntry hive = entries.get(0);
        assertEquals("b1", hive.id());
        assertEquals("Apiculture", hive.subjectField());
        assertEquals(List.of("Concept note about hives"), hive.notes());
        LanguageSection en = hive.languages().get(0);
        assertEquals("en", en.language());
        // whitespace of the wrapped definition collapses to single spaces
        assertEquals("A structure in which a colony of honey bees lives.", en.definition());
        GlossaryTerm beehive = en.terms().get(0);
        assertEquals("beehive", beehive.text());
        assertEquals("noun", beehive.partOfSpeech());
        assertEquals("The beehive stood at the edge of the orchard.", beehive.context());
        assertEquals(List.of("Term note one", "Term note two"), beehive.notes());
        assertTrue(beehive.other().contains(new GlossaryField("termNote:administrativeStatus", "preferredTerm-admn-sts", null)));
        assertTrue(beehive.other().contains(new GlossaryField("context/admin:source", "Orchard Diary", null)));
        assertTrue(hive.other().contains(new GlossaryField("xref:xGraphic", "hive.png", "https://example.org/img/hive.png")));
        assertEquals("colmena", hive.languages().get(1).terms().get(0).text());
    }

    @Test
    void read_legacyNtig_readsTermGroup() throws Exception {
        GlossaryEntry e = read("legacy-v2.tbx").get(0);
        assertEquals("L1", e.id());
        GlossaryTerm apiarist = e.languages().get(0).terms().get(1);
        assertEquals("apiarist", apiarist.text());
        assertEquals("noun", apiarist.partOfSpeech());
        assertEquals("The apiarist checked every frame.", apiarist.context());
        assertEquals("fr", e.languages().get(1).language());
    }

    @Test
    void read_dtdWithExternalEntity_isRefusedWithoutReadingTheFile() {
        GlossaryImportException e = assertThrows(GlossaryImportException.class, () -> read("xxe.tbx"));
        assertTrue(e.getMessage().contains("DTD") || e.getMessage().contains("entity"), e.getMessage());
        assertEquals(2, e.line(), "the DOCTYPE is on line 2 of xxe.tbx");
    }

    @Test
    void read_legacyDoctypeLine_isReadWithoutTheDtd() throws Exception {
        // legacy-v2-doctype.tbx names TBXcoreStructV02.dtd, which does not exist here: reading it would fail
        List<GlossaryEntry> entries = read("legacy-v2-doctype.tbx");
        assertEquals(1, entries.size());
        assertEquals("ferry slip", entries.get(0).languages().get(0).terms().get(0).text());
    }

    @Test
    void read_conceptLevelDefinition_isTheDefinitionOfSectionsWithoutTheirOwn() throws Exception {
        // ISO 30042 (TBX) allows <descrip type="definition"> at concept level (termEntry/conceptEntry) [memory]
        GlossaryEntry e = read("legacy-v2-doctype.tbx").get(0);
        assertEquals("A landing stage where a ferry takes on passengers.", e.languages().get(0).definition());
        assertEquals("Muelle donde el transbordador embarca pasajeros.", e.languages().get(1).definition(),
                "a section's own definition wins");
    }

    @Test
    void read_doctypeWithInternalSubset_isRefusedWithItsLine() {
        GlossaryImportException e = assertThrows(GlossaryImportException.class, () -> read("internal-subset.tbx"));
        assertEquals(2, e.line(), "the DOCTYPE is on line 2 of internal-subset.tbx");
        assertTrue(e.getMessage().contains("square brackets"), e.getMessage());
    }

    @Test
    void read_mismatchedTag_reportsLineAndColumn() {
        GlossaryImportException e = assertThrows(GlossaryImportException.class, () -> read("malformed.tbx"));
        // malformed.tbx line 4: <term>comb</termSec> closes the wrong element
        assertEquals(4, e.line());
        assertTrue(e.column() > 0);
        assertTrue(e.getMessage().contains("malformed.tbx, line 4"), e.getMessage());
    }

    @Test
    void read_languageSectionWithoutLang_namesTheConcept() {
        String tbx = "<tbx xmlns=\"urn:iso:std:iso:30042:ed:3.0\"><text><body>\n<conceptEntry id=\"q\">\n"
                + "<langSec><termSec><term>x</term></termSec></langSec></conceptEntry></body></text></tbx>";
        GlossaryImportException e = assertThrows(GlossaryImportException.class,
                () -> TbxImporter.read(new java.io.ByteArrayInputStream(tbx.getBytes(java.nio.charset.StandardCharsets.UTF_8)), "inline"));
        assertTrue(e.getMessage().contains("\"q\"") && e.getMessage().contains("xml:lang"), e.getMessage());
        assertEquals(3, e.line());
    }

    /** Every leaf text and every target attribute inside the concepts, read with the JDK's DOM parser. */
    private static List<String> sourceValues(String file) throws Exception {
        DocumentBuilderFactory f = DocumentBuilderFactory.newInstance();
        f.setNamespaceAware(true);
        f.setFeature(XMLConstants.FEATURE_SECURE_PROCESSING, true);
        f.setFeature("http://apache.org/xml/features/disallow-doctype-decl", true);
        Document doc;
        try (InputStream in = TbxImporterTest.class.getResourceAsStream(file)) {
            doc = f.newDocumentBuilder().parse(in);
        }
        List<String> out = new ArrayList<>();
        for (String tag : List.of("conceptEntry", "termEntry")) {
            var list = doc.getElementsByTagNameNS("*", tag);
            for (int i = 0; i < list.getLength(); i++) {
                leaves((Element) list.item(i), out);
            }
        }
        assertFalse(out.isEmpty(), file + " has no concept values: the check would prove nothing");
        return out;
    }

    private static void leaves(Element e, List<String> out) {
        if (!e.getAttribute("target").isEmpty()) {
            out.add(e.getAttribute("target"));
        }
        boolean hasChild = false;
        for (Node c = e.getFirstChild(); c != null; c = c.getNextSibling()) {
            if (c instanceof Element child) {
                hasChild = true;
                leaves(child, out);
            }
        }
        if (!hasChild) {
            out.add(e.getTextContent().replaceAll("\\s+", " ").strip());
        }
    }

    private static void collectText(JsonNode n, List<String> out) {
        if (n.isTextual()) {
            out.add(n.asText());
        }
        n.forEach(c -> collectText(c, out));
    }
}
