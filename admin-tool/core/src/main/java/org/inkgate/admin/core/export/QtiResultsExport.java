package org.inkgate.admin.core.export;

import java.io.IOException;
import java.io.OutputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import javax.xml.stream.XMLOutputFactory;
import javax.xml.stream.XMLStreamException;
import javax.xml.stream.XMLStreamWriter;
import org.inkgate.admin.core.store.ResultsStore;
import org.inkgate.admin.core.store.Rows;
import org.inkgate.admin.core.store.StoreException;

/**
 * QTI 3.0 results (namespace {@value #NAMESPACE}): one {@code assessmentResult} per candidate and
 * package, {@code context@sourcedId} the candidate number (no names), one {@code itemResult} per
 * task in the order sat, the final text as the {@code candidateResponse} of a single string
 * {@code RESPONSE} variable. Scores are not written yet: ratings are not collected by this tool.
 * A candidate with conflicting packages gets one file per package, each named by its package id.
 */
public final class QtiResultsExport {

    public static final String NAMESPACE = "http://www.imsglobal.org/xsd/imsqti_result_v3p0";

    private QtiResultsExport() {
    }

    /** Writes the files into {@code folder}; returns how many were written. */
    public static int write(ResultsStore store, String examId, Path folder) throws IOException, StoreException {
        Files.createDirectories(folder);
        Map<Long, List<Rows.Response>> bySitting = new LinkedHashMap<>();
        store.forEachResponse(examId, r -> bySitting.computeIfAbsent(r.sittingId(), k -> new ArrayList<>()).add(r));
        Map<String, Integer> perCandidate = new LinkedHashMap<>();
        bySitting.values().forEach(rs -> perCandidate.merge(rs.get(0).candidateNumber(), 1, Integer::sum));
        int written = 0;
        for (List<Rows.Response> rows : bySitting.values()) {
            Rows.Response first = rows.get(0);
            String name = perCandidate.get(first.candidateNumber()) > 1
                    ? first.candidateNumber() + "-" + first.packageId() + ".xml"
                    : first.candidateNumber() + ".xml";
            try (OutputStream out = Files.newOutputStream(folder.resolve(name))) {
                write(rows, out);
            } catch (XMLStreamException e) {
                throw new IOException("could not write " + name + ": " + e.getMessage(), e);
            }
            written++;
        }
        return written;
    }

    static void write(List<Rows.Response> rows, OutputStream out) throws XMLStreamException {
        XMLStreamWriter x = XMLOutputFactory.newFactory().createXMLStreamWriter(out, "UTF-8");
        Rows.Response first = rows.get(0);
        x.writeStartDocument("UTF-8", "1.0");
        x.writeCharacters("\n");
        x.setDefaultNamespace(NAMESPACE);
        x.writeStartElement(NAMESPACE, "assessmentResult");
        x.writeDefaultNamespace(NAMESPACE);
        x.writeCharacters("\n  ");
        x.writeEmptyElement(NAMESPACE, "context");
        x.writeAttribute("sourcedId", first.candidateNumber());
        x.writeCharacters("\n  ");
        x.writeEmptyElement(NAMESPACE, "testResult");
        x.writeAttribute("identifier", first.examId() + "/" + first.formId());
        x.writeAttribute("datestamp", first.submittedAt() == null ? first.endedAt() : first.submittedAt());
        for (Rows.Response r : rows) {
            x.writeCharacters("\n  ");
            x.writeStartElement(NAMESPACE, "itemResult");
            x.writeAttribute("identifier", r.taskId());
            x.writeAttribute("sequenceIndex", String.valueOf(r.position() + 1));
            x.writeAttribute("datestamp", r.endedAt());
            x.writeAttribute("sessionStatus", "final");
            x.writeCharacters("\n    ");
            x.writeStartElement(NAMESPACE, "responseVariable");
            x.writeAttribute("identifier", "RESPONSE");
            x.writeAttribute("cardinality", "single");
            x.writeAttribute("baseType", "string");
            x.writeCharacters("\n      ");
            x.writeStartElement(NAMESPACE, "candidateResponse");
            x.writeStartElement(NAMESPACE, "value");
            x.writeCharacters(r.text());
            x.writeEndElement();
            x.writeEndElement();
            x.writeCharacters("\n    ");
            x.writeEndElement();
            x.writeCharacters("\n  ");
            x.writeEndElement();
        }
        x.writeCharacters("\n");
        x.writeEndElement();
        x.writeCharacters("\n");
        x.writeEndDocument();
        x.close();
    }
}
