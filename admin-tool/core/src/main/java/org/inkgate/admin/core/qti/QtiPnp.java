package org.inkgate.admin.core.qti;

import java.io.IOException;
import java.io.Writer;
import java.math.BigDecimal;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import org.inkgate.admin.core.csv.Csv;
import org.inkgate.admin.core.export.OutputFolder;
import org.inkgate.admin.core.forms.Assignment;
import org.inkgate.admin.core.forms.FormDesigner;
import org.inkgate.admin.core.roster.RosterCandidate;
import org.inkgate.admin.core.roster.RosterReader;
import org.inkgate.admin.core.source.ExamSource;
import org.inkgate.format.bundle.FormSlot;
import org.inkgate.format.bundle.FormSpec;
import org.inkgate.format.bundle.RosterEntry;
import org.inkgate.packs.policy.ResourcePolicy;
import org.w3c.dom.Element;
import org.w3c.dom.Node;

/**
 * The roster's accommodations and each task's writing tools as 1EdTech Access for All 3.0 Personal
 * Needs and Preferences (QTI 3.0 profile, namespace {@value QtiNames#PNP}), one document per
 * candidate, and back into a roster. Field by field: docs/formats.md, "Accessibility preferences".
 * <ul>
 *   <li>extra time {@code p}% = {@code additional-testing-time/time-multiplier} {@code 1 + p/100};</li>
 *   <li>large print = {@code magnification/all-content@zoom-amount} {@link RosterEntry#LARGE_PRINT_SCALE};</li>
 *   <li>high contrast = {@code high-contrast};</li>
 *   <li>per task sat (with the forms assignment): one record whose {@code appointment-id} is
 *       {@code <exam id>/<task id>}, the tools offered in {@code activate-as-option-set} and those
 *       not offered in {@code prohibit-set} ({@code spell-checker-on-screen}, {@code dictionary-on-screen},
 *       {@code glossary-on-screen}).</li>
 * </ul>
 */
public final class QtiPnp {

    /** The {@code person-sourced-id@source-system} naming the roster's candidate numbers. */
    public static final String SOURCE_SYSTEM = "urn:inkgate:candidate-number";

    private QtiPnp() {
    }

    /** One candidate's preferences as read from a PNP document. */
    public record Preferences(String candidateNumber, int extraTimePercent, boolean largePrint, boolean highContrast) {
    }

    /** What an import read and what it could not place. */
    public record ImportReport(Map<String, Preferences> byCandidate, List<String> notes) {
        public ImportReport {
            byCandidate = Map.copyOf(byCandidate);
            notes = List.copyOf(notes);
        }
    }

    /**
     * Writes {@code <candidate>.xml} per roster candidate into {@code folder} (candidate number as a
     * QTI identifier, checked to stay inside it); returns the files written. With an assignment,
     * each candidate gets one record per task of their form, carrying that task's tools.
     */
    public static List<Path> write(ExamSource exam, List<RosterCandidate> roster, Optional<Assignment> assignment,
            Path folder) throws IOException {
        Map<String, FormSpec> forms = new LinkedHashMap<>();
        FormDesigner.forms(exam).forEach(f -> forms.put(f.id(), f));
        Map<String, String> formOf = new LinkedHashMap<>();
        assignment.ifPresent(a -> a.rows().forEach(r -> formOf.put(r.candidateNumber(), r.formId())));
        Map<Path, RosterCandidate> files = new LinkedHashMap<>();
        for (RosterCandidate c : roster) {
            files.put(OutputFolder.file(folder, QtiIdentifier.encode(c.candidateNumber()) + ".xml"), c);
        }
        Files.createDirectories(folder);
        List<Path> written = new ArrayList<>();
        for (var e : files.entrySet()) {
            RosterCandidate c = e.getValue();
            FormSpec form = forms.get(formOf.get(c.candidateNumber()));
            try (Writer w = Files.newBufferedWriter(e.getKey(), StandardCharsets.UTF_8); XmlOut x = new XmlOut(w)) {
                x.start("access-for-all-pnp-records").attribute("xmlns", QtiNames.PNP);
                if (form == null) {
                    record(x, c, exam.examId(), null);
                } else {
                    for (FormSlot slot : form.slots()) {
                        record(x, c, exam.examId() + "/" + slot.taskId(), slot.policy());
                    }
                }
                x.end();
            }
            written.add(e.getKey());
        }
        return written;
    }

    private static void record(XmlOut x, RosterCandidate c, String appointment, ResourcePolicy policy) throws IOException {
        x.start("access-for-all-pnp-record");
        x.start("person-sourced-id").attribute("source-system", SOURCE_SYSTEM).text(c.candidateNumber()).end();
        x.element("appointment-id", appointment);
        x.start("access-for-all-pnp");
        if (c.extraTimePercent() > 0) {
            x.start("additional-testing-time");
            x.element("time-multiplier", number(1 + c.extraTimePercent() / 100.0));
            x.end();
        }
        if (c.largePrint()) {
            x.start("magnification");
            x.start("all-content").attribute("zoom-amount", number(RosterEntry.LARGE_PRINT_SCALE)).end();
            x.end();
        }
        if (c.highContrast()) {
            x.start("high-contrast").end();
        }
        if (policy != null) {
            Map<String, Boolean> tools = new LinkedHashMap<>();
            tools.put("dictionary-on-screen", policy.dictionaryPack() != null);
            tools.put("glossary-on-screen", policy.glossaryPack() != null);
            tools.put("spell-checker-on-screen", policy.spelling().checksSpelling());
            featureSet(x, "activate-as-option-set", tools, true);
            featureSet(x, "prohibit-set", tools, false);
        }
        x.end();
        x.end();
    }

    private static void featureSet(XmlOut x, String name, Map<String, Boolean> tools, boolean offered) throws IOException {
        if (tools.containsValue(offered)) {
            x.start(name);
            for (var t : tools.entrySet()) {
                if (t.getValue() == offered) {
                    x.start(t.getKey()).end();
                }
            }
            x.end();
        }
    }

    private static String number(double v) {
        return BigDecimal.valueOf(v).stripTrailingZeros().toPlainString();
    }

    /** Reads every {@code .xml} PNP document in {@code folder} (or one file). */
    public static ImportReport read(Path input) throws IOException, SafeXml.XmlRefusal {
        List<Path> files = new ArrayList<>();
        if (Files.isDirectory(input)) {
            try (var s = Files.list(input)) {
                s.filter(p -> p.getFileName().toString().toLowerCase(Locale.ROOT).endsWith(".xml"))
                        .filter(Files::isRegularFile).sorted().forEach(files::add);
            }
        } else {
            files.add(input);
        }
        Map<String, Preferences> out = new LinkedHashMap<>();
        List<String> notes = new ArrayList<>();
        for (Path file : files) {
            if (Files.size(file) > PackageFiles.LIMITS.maxEntryBytes()) {
                notes.add(file.getFileName() + " is larger than a PNP document may be; left out");
                continue;
            }
            Element root = SafeXml.parse(file.getFileName().toString(), Files.readAllBytes(file)).getDocumentElement();
            if (!QtiNames.PNP.equals(root.getNamespaceURI())) {
                notes.add(file.getFileName() + " is not a QTI 3.0 PNP document (namespace " + root.getNamespaceURI()
                        + "); left out");
                continue;
            }
            List<Element> records = root.getLocalName().equals("access-for-all-pnp-records")
                    ? children(root, "access-for-all-pnp-record") : List.of();
            if (records.isEmpty()) {
                notes.add(file.getFileName() + " holds no access-for-all-pnp-record (a bare access-for-all-pnp names no"
                        + " candidate); left out");
            }
            for (Element record : records) {
                Element person = children(record, "person-sourced-id").stream().findFirst().orElse(null);
                Element pnp = children(record, "access-for-all-pnp").stream().findFirst().orElse(null);
                if (person == null || pnp == null) {
                    notes.add(file.getFileName() + ": a record without person-sourced-id or access-for-all-pnp; left out");
                    continue;
                }
                String number = person.getTextContent().strip();
                String where = file.getFileName() + " (candidate " + QtiDom.printable(number) + ")";
                Preferences p = preferences(number, pnp, where, notes);
                Preferences before = out.putIfAbsent(number, p);
                if (before != null && !before.equals(p)) {
                    notes.add(where + ": records disagree on the accommodations; the first was kept");
                }
            }
        }
        return new ImportReport(out, notes);
    }

    private static Preferences preferences(String number, Element pnp, String where, List<String> notes) {
        int extra = 0;
        boolean large = false;
        boolean contrast = false;
        for (Element e : children(pnp, null)) {
            switch (e.getLocalName()) {
                case "additional-testing-time" -> {
                    for (Element t : children(e, null)) {
                        switch (t.getLocalName()) {
                            case "time-multiplier" -> {
                                try {
                                    double m = Double.parseDouble(t.getTextContent().strip());
                                    extra = (int) Math.round((m - 1) * 100);
                                    if (extra < 0 || extra > 400) {
                                        notes.add(where + ": time multiplier " + m + " lies outside 1-5; extra time left at 0");
                                        extra = 0;
                                    }
                                } catch (NumberFormatException ex) {
                                    notes.add(where + ": time multiplier is not a number; extra time left at 0");
                                }
                            }
                            case "fixed-minutes" -> notes.add(where + ": " + t.getTextContent().strip() + " fixed extra"
                                    + " minutes have no place in a roster (extra time is a percentage of each limit);"
                                    + " set extra_time_percent by hand");
                            case "unlimited" -> notes.add(where + ": unlimited time has no place in a roster (at most"
                                    + " 400 % extra); set extra_time_percent by hand");
                            default -> {
                            }
                        }
                    }
                }
                case "magnification" -> large = true;
                case "text-appearance" -> {
                    for (Element t : children(e, "font-size")) {
                        try {
                            large |= Double.parseDouble(t.getTextContent().strip()) > 12.0;
                        } catch (NumberFormatException ex) {
                            notes.add(where + ": font-size is not a number");
                        }
                    }
                }
                case "high-contrast" -> contrast = true;
                case "activate-as-option-set", "prohibit-set", "activate-at-initialization-set" -> {
                    String note = where + ": tool settings (activate-as-option-set, prohibit-set) have no place in a roster:"
                            + " exam.yaml sets tools per task and condition; check they match the candidate's form";
                    if (!notes.contains(note)) {
                        notes.add(note);
                    }
                }
                default -> notes.add(where + ": " + e.getLocalName() + " has no place in an Inkgate roster");
            }
        }
        return new Preferences(number, extra, large, contrast);
    }

    /**
     * A new roster: {@code roster}'s rows and columns as they were, with {@code extra_time_percent},
     * {@code large_print} and {@code high_contrast} set from the PNP documents for the candidates they
     * name (columns added when missing). Returns notes on candidates the roster does not hold.
     */
    public static List<String> mergeIntoRoster(Path roster, ImportReport pnp, Path out) throws IOException,
            org.inkgate.admin.core.source.InvalidSourceException {
        RosterReader.read(roster);
        List<Csv.Row> rows;
        try {
            rows = Csv.parse(Files.readString(roster, StandardCharsets.UTF_8));
        } catch (Csv.CsvSyntaxException e) {
            throw new IOException(roster + ": " + e.getMessage(), e);
        }
        List<String> header = new ArrayList<>(rows.get(0).fields());
        for (String column : List.of(RosterReader.EXTRA_TIME, RosterReader.LARGE_PRINT, RosterReader.HIGH_CONTRAST)) {
            if (!header.contains(column)) {
                header.add(column);
            }
        }
        int number = header.indexOf(RosterReader.CANDIDATE);
        List<String> notes = new ArrayList<>();
        java.util.Set<String> seen = new java.util.HashSet<>();
        StringBuilder text = new StringBuilder();
        try (Writer w = new java.io.StringWriter()) {
            Csv.writeRow(w, header);
            for (Csv.Row row : rows.subList(1, rows.size())) {
                List<String> f = new ArrayList<>(row.fields());
                while (f.size() < header.size()) {
                    f.add("");
                }
                Preferences p = pnp.byCandidate().get(f.get(number).strip());
                if (p != null) {
                    seen.add(p.candidateNumber());
                    f.set(header.indexOf(RosterReader.EXTRA_TIME), String.valueOf(p.extraTimePercent()));
                    f.set(header.indexOf(RosterReader.LARGE_PRINT), p.largePrint() ? "yes" : "no");
                    f.set(header.indexOf(RosterReader.HIGH_CONTRAST), p.highContrast() ? "yes" : "no");
                }
                Csv.writeRow(w, f);
            }
            text.append(w);
        }
        for (String candidate : pnp.byCandidate().keySet()) {
            if (!seen.contains(candidate)) {
                notes.add("candidate " + QtiDom.printable(candidate) + " has PNP preferences but is not on the"
                        + " roster; not added (a roster row needs a level)");
            }
        }
        Path tmp = out.resolveSibling(out.getFileName() + ".part");
        Files.writeString(tmp, text, StandardCharsets.UTF_8);
        Files.move(tmp, out, java.nio.file.StandardCopyOption.REPLACE_EXISTING);
        RosterReader.read(out);
        return notes;
    }

    private static List<Element> children(Element parent, String name) {
        List<Element> out = new ArrayList<>();
        for (Node n = parent.getFirstChild(); n != null; n = n.getNextSibling()) {
            if (n instanceof Element e && (name == null || name.equals(e.getLocalName()))) {
                out.add(e);
            }
        }
        return out;
    }
}
