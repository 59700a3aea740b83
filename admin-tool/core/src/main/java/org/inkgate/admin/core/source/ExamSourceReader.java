package org.inkgate.admin.core.source;

import com.fasterxml.jackson.databind.JsonNode;
import java.io.IOException;
import java.nio.charset.CharacterCodingException;
import java.nio.charset.CodingErrorAction;
import java.nio.charset.StandardCharsets;
import java.nio.ByteBuffer;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import org.inkgate.admin.core.source.ExamSource.Band;
import org.inkgate.admin.core.source.ExamSource.Condition;
import org.inkgate.admin.core.source.ExamSource.Criterion;
import org.inkgate.admin.core.source.ExamSource.Design;
import org.inkgate.admin.core.source.ExamSource.Pack;
import org.inkgate.admin.core.source.ExamSource.Rubric;
import org.inkgate.admin.core.source.ExamSource.Task;
import org.inkgate.admin.core.source.YamlChecker.At;
import org.inkgate.format.archive.EntryNames;
import org.inkgate.format.bundle.QuestionItem;
import org.inkgate.format.bundle.QuestionnaireSpec;
import org.inkgate.format.bundle.WordGuidance;
import org.inkgate.packs.policy.PastePolicy;
import org.inkgate.packs.policy.ResourcePolicy;
import org.inkgate.packs.policy.SpellingMode;

/**
 * Reads and checks an exam source folder: {@code exam.yaml}, the Markdown files it names, the
 * pack files and the rubric YAML. The whole folder is checked at once; every problem is listed
 * with its file, line and field, and nothing is returned unless there are none.
 */
public final class ExamSourceReader {

    public static final String EXAM_FILE = "exam.yaml";
    private static final int MAX_TEXT_FILE_BYTES = 1 << 20;

    private static final Set<String> TOP = Set.of("id", "title", "language", "instructions", "practice", "tasks",
            "conditions", "design", "questionnaires", "packs", "rubric");
    private static final Set<String> TASK = Set.of("id", "title", "prompt", "timeLimitMinutes", "warningMinutes", "words");
    private static final Set<String> CONDITION = Set.of("id", "label", "tools", "perTask");
    private static final Set<String> TOOLS = Set.of("spelling", "glossary", "dictionary", "insertFromPanel",
            "showWordCount", "paste");
    private static final Set<String> QUESTIONNAIRE = Set.of("id", "title", "items");
    private static final Set<String> ITEM = Set.of("id", "text", "kind", "labels");
    private static final Set<String> PACK = Set.of("id", "kind", "version", "file");
    private static final Set<String> RUBRIC_TOP = Set.of("criteria");
    private static final Set<String> CRITERION = Set.of("id", "name", "scores", "bands");
    private static final Set<String> BAND = Set.of("scores", "descriptor");

    private ExamSourceReader() {
    }

    /** Checks the folder and returns the exam, or throws with every problem found. */
    public static ExamSource read(Path folder) throws InvalidSourceException {
        List<Problem> problems = new ArrayList<>();
        Optional<ExamSource> source = check(folder, problems);
        if (!problems.isEmpty() || source.isEmpty()) {
            throw new InvalidSourceException("the exam source " + folder + " cannot be used", problems);
        }
        return source.get();
    }

    /** Checks the folder, adding every problem to {@code problems}; returns the exam when it could be read. */
    public static Optional<ExamSource> check(Path folder, List<Problem> problems) {
        Path examFile = folder.resolve(EXAM_FILE);
        if (!Files.isRegularFile(examFile)) {
            problems.add(new Problem(EXAM_FILE, 0, 0, "", "not found in " + folder
                    + ": an exam source folder holds exam.yaml (see docs/test-owner-guide.md)"));
            return Optional.empty();
        }
        byte[] bytes;
        try {
            bytes = Files.readAllBytes(examFile);
        } catch (IOException e) {
            problems.add(new Problem(EXAM_FILE, 0, 0, "", "cannot be read: " + e.getMessage()));
            return Optional.empty();
        }
        Optional<LocatedYaml> yaml = LocatedYaml.parse(EXAM_FILE, bytes, problems);
        if (yaml.isEmpty()) {
            return Optional.empty();
        }
        return new Pass(folder, yaml.get(), problems).read();
    }

    /** One reading of one folder. */
    private static final class Pass {
        private final Path folder;
        private final LocatedYaml yaml;
        private final List<Problem> problems;
        private final YamlChecker c;

        Pass(Path folder, LocatedYaml yaml, List<Problem> problems) {
            this.folder = folder;
            this.yaml = yaml;
            this.problems = problems;
            this.c = new YamlChecker(yaml, problems);
        }

        Optional<ExamSource> read() {
            JsonNode root = yaml.root();
            At at = YamlChecker.root();
            if (!c.isObject(root, at, true)) {
                return Optional.empty();
            }
            int before = problems.size();
            c.onlyKeys(root, at, TOP);
            String id = c.id(root, at.child("id"));
            String title = c.text(root, at.child("title"), true);
            String language = c.text(root, at.child("language"), true);
            if (language != null && !isLanguageTag(language)) {
                c.problem(at.child("language"), "\"" + language + "\" is not a BCP 47 language tag; write e.g. en-GB");
            }
            String instructions = c.text(root, at.child("instructions"), false);
            if (instructions != null) {
                textFile(instructions, at.child("instructions"));
            }
            boolean practice = c.bool(root, at.child("practice"), false);

            List<Pack> packs = packs(root, at.child("packs"));
            List<Task> tasks = tasks(root, at.child("tasks"));
            List<Condition> conditions = conditions(root, at.child("conditions"), tasks, packs);
            List<QuestionnaireSpec> questionnaires = questionnaires(root, at.child("questionnaires"));
            Design design = design(root.get("design"), at.child("design"), tasks, conditions, questionnaires);
            Rubric rubric = null;
            String rubricFile = c.text(root, at.child("rubric"), false);
            if (rubricFile != null && safeFile(rubricFile, at.child("rubric"))) {
                rubric = RubricReader.read(folder, rubricFile, problems);
            }
            if (problems.size() != before) {
                return Optional.empty();
            }
            return Optional.of(new ExamSource(folder, id, title, language, instructions, practice, tasks, conditions,
                    design, questionnaires, packs, rubric));
        }

        private List<Task> tasks(JsonNode root, At at) {
            List<JsonNode> nodes = c.list(root, at, true);
            if (nodes.isEmpty() && root.has("tasks")) {
                c.problem(at, "lists no task; an exam needs at least one");
            }
            List<Task> tasks = new ArrayList<>();
            Set<String> ids = new HashSet<>();
            for (int i = 0; i < nodes.size(); i++) {
                JsonNode n = nodes.get(i);
                At t = at.index(i);
                if (!c.isObject(n, t, true)) {
                    continue;
                }
                c.onlyKeys(n, t, TASK);
                String id = c.id(n, t.child("id"));
                if (id != null && !ids.add(id)) {
                    c.problem(t.child("id"), "task id \"" + id + "\" is used twice; give each task its own id");
                }
                String title = c.text(n, t.child("title"), true);
                String prompt = c.text(n, t.child("prompt"), true);
                if (prompt != null) {
                    textFile(prompt, t.child("prompt"));
                }
                Integer minutes = c.integer(n, t.child("timeLimitMinutes"), true, 0, 600);
                List<Integer> warnings = new ArrayList<>();
                List<JsonNode> w = c.list(n, t.child("warningMinutes"), false);
                for (int j = 0; j < w.size(); j++) {
                    Integer m = c.integer(n.get("warningMinutes"), t.child("warningMinutes").index(j), true, 1, 600);
                    if (m != null && minutes != null && m >= Math.max(minutes, 1)) {
                        c.problem(t.child("warningMinutes").index(j), "a warning " + m + " minutes before the end lies outside the "
                                + minutes + "-minute limit; use a smaller number or remove it (an untimed task has no warnings)");
                    }
                    if (m != null) {
                        warnings.add(m);
                    }
                }
                WordGuidance words = null;
                JsonNode wn = n.get("words");
                if (wn != null && c.isObject(wn, t.child("words"), false)) {
                    c.onlyKeys(wn, t.child("words"), Set.of("min", "max"));
                    Integer min = c.integer(wn, t.child("words").child("min"), false, 0, 100_000);
                    Integer max = c.integer(wn, t.child("words").child("max"), false, 0, 100_000);
                    int lo = min == null ? 0 : min;
                    int hi = max == null ? 0 : max;
                    if (hi != 0 && lo > hi) {
                        c.problem(t.child("words"), "min " + lo + " is above max " + hi + "; swap them");
                    }
                    words = new WordGuidance(lo, hi);
                }
                if (id != null && title != null && prompt != null && minutes != null) {
                    tasks.add(new Task(id, title, prompt, minutes * 60, warnings, words));
                }
            }
            return tasks;
        }

        private List<Condition> conditions(JsonNode root, At at, List<Task> tasks, List<Pack> packs) {
            List<JsonNode> nodes = c.list(root, at, true);
            List<Condition> conditions = new ArrayList<>();
            Set<String> ids = new HashSet<>();
            Set<String> taskIds = new HashSet<>(tasks.stream().map(Task::id).toList());
            for (int i = 0; i < nodes.size(); i++) {
                JsonNode n = nodes.get(i);
                At ca = at.index(i);
                if (!c.isObject(n, ca, true)) {
                    continue;
                }
                c.onlyKeys(n, ca, CONDITION);
                String id = c.id(n, ca.child("id"));
                if (id != null && !ids.add(id)) {
                    c.problem(ca.child("id"), "condition id \"" + id + "\" is used twice; give each condition its own id");
                }
                String label = c.text(n, ca.child("label"), true);
                ResourcePolicy policy = policy(n.get("tools"), ca.child("tools"), packs);
                Map<String, ResourcePolicy> perTask = new LinkedHashMap<>();
                JsonNode pt = n.get("perTask");
                if (pt != null && c.isObject(pt, ca.child("perTask"), false)) {
                    for (var e : pt.properties()) {
                        At pa = ca.child("perTask").child(e.getKey());
                        if (!taskIds.contains(e.getKey())) {
                            c.problem(pa, "names task \"" + e.getKey() + "\", which is not among the tasks; use one of " + taskIds);
                        }
                        ResourcePolicy p = policy(e.getValue(), pa, packs);
                        if (p != null) {
                            perTask.put(e.getKey(), p);
                        }
                    }
                }
                if (id != null && label != null && policy != null) {
                    conditions.add(new Condition(id, label, policy, perTask));
                }
            }
            return conditions;
        }

        private ResourcePolicy policy(JsonNode n, At at, List<Pack> packs) {
            if (!c.isObject(n, at, true)) {
                return null;
            }
            c.onlyKeys(n, at, TOOLS);
            int before = problems.size();
            SpellingMode spelling = choice(n, at.child("spelling"), Map.of("off", SpellingMode.OFF,
                    "underline-only", SpellingMode.UNDERLINE_ONLY, "suggestions", SpellingMode.SUGGESTIONS,
                    "spelling-and-grammar", SpellingMode.SPELLING_AND_GRAMMAR), SpellingMode.OFF);
            String glossary = packRef(n, at.child("glossary"), packs, "glossary");
            String dictionary = packRef(n, at.child("dictionary"), packs, "dictionary");
            boolean insert = c.bool(n, at.child("insertFromPanel"), false);
            boolean wordCount = c.bool(n, at.child("showWordCount"), true);
            PastePolicy paste = choice(n, at.child("paste"), Map.of("none", PastePolicy.NONE,
                    "within-response", PastePolicy.WITHIN_RESPONSE), PastePolicy.NONE);
            if (problems.size() != before) {
                return null;
            }
            return new ResourcePolicy(spelling, glossary, dictionary, insert, wordCount, paste);
        }

        private String packRef(JsonNode n, At at, List<Pack> packs, String kind) {
            String id = c.text(n, at, false);
            if (id == null) {
                return null;
            }
            Optional<Pack> pack = packs.stream().filter(p -> p.id().equals(id)).findFirst();
            if (pack.isEmpty()) {
                c.problem(at, "names pack \"" + id + "\", which is not declared under packs; declare it there or fix the id");
            } else if (!pack.get().kind().equals(kind)) {
                c.problem(at, "pack \"" + id + "\" is a " + pack.get().kind() + ", not a " + kind);
            }
            return id;
        }

        private <T> T choice(JsonNode n, At at, Map<String, T> choices, T fallback) {
            String word = c.text(n, at, false);
            if (word == null) {
                return fallback;
            }
            T value = choices.get(word);
            if (value == null) {
                c.problem(at, "\"" + word + "\" is not one of " + String.join(", ", new java.util.TreeSet<>(choices.keySet())));
                return fallback;
            }
            return value;
        }

        private Design design(JsonNode n, At at, List<Task> tasks, List<Condition> conditions,
                List<QuestionnaireSpec> questionnaires) {
            return new DesignReader(c).read(n, at, tasks, conditions, questionnaires);
        }

        private List<QuestionnaireSpec> questionnaires(JsonNode root, At at) {
            List<QuestionnaireSpec> out = new ArrayList<>();
            Set<String> ids = new HashSet<>();
            List<JsonNode> nodes = c.list(root, at, false);
            for (int i = 0; i < nodes.size(); i++) {
                JsonNode n = nodes.get(i);
                At qa = at.index(i);
                if (!c.isObject(n, qa, true)) {
                    continue;
                }
                c.onlyKeys(n, qa, QUESTIONNAIRE);
                String id = c.id(n, qa.child("id"));
                if (id != null && !ids.add(id)) {
                    c.problem(qa.child("id"), "questionnaire id \"" + id + "\" is used twice");
                }
                String title = c.text(n, qa.child("title"), true);
                List<QuestionItem> items = new ArrayList<>();
                Set<String> itemIds = new HashSet<>();
                List<JsonNode> itemNodes = c.list(n, qa.child("items"), true);
                for (int j = 0; j < itemNodes.size(); j++) {
                    JsonNode in = itemNodes.get(j);
                    At ia = qa.child("items").index(j);
                    if (!c.isObject(in, ia, true)) {
                        continue;
                    }
                    c.onlyKeys(in, ia, ITEM);
                    String iid = c.id(in, ia.child("id"));
                    if (iid != null && !itemIds.add(iid)) {
                        c.problem(ia.child("id"), "item id \"" + iid + "\" is used twice in this questionnaire");
                    }
                    String text = c.text(in, ia.child("text"), true);
                    QuestionItem.Kind kind = choice(in, ia.child("kind"), Map.of("likert", QuestionItem.Kind.LIKERT,
                            "free-text", QuestionItem.Kind.FREE_TEXT), null);
                    if (kind == null && !in.has("kind")) {
                        c.problem(ia.child("kind"), "is missing; use likert or free-text");
                    }
                    List<String> labels = new ArrayList<>();
                    List<JsonNode> ln = c.list(in, ia.child("labels"), false);
                    for (int k = 0; k < ln.size(); k++) {
                        String label = c.text(in.get("labels"), ia.child("labels").index(k), true);
                        if (label != null) {
                            labels.add(label);
                        }
                    }
                    if (kind == QuestionItem.Kind.LIKERT && ln.size() < 2) {
                        c.problem(ia.child("labels"), "a Likert item needs at least 2 labelled points, lowest first");
                    }
                    if (kind == QuestionItem.Kind.FREE_TEXT && !ln.isEmpty()) {
                        c.problem(ia.child("labels"), "a free-text item has no labels; remove them or make it likert");
                    }
                    if (iid != null && text != null && kind != null) {
                        items.add(new QuestionItem(iid, text, kind, labels));
                    }
                }
                if (id != null && title != null) {
                    out.add(new QuestionnaireSpec(id, title, items));
                }
            }
            return out;
        }

        private List<Pack> packs(JsonNode root, At at) {
            List<Pack> out = new ArrayList<>();
            Set<String> ids = new HashSet<>();
            List<JsonNode> nodes = c.list(root, at, false);
            for (int i = 0; i < nodes.size(); i++) {
                JsonNode n = nodes.get(i);
                At pa = at.index(i);
                if (!c.isObject(n, pa, true)) {
                    continue;
                }
                c.onlyKeys(n, pa, PACK);
                String id = c.id(n, pa.child("id"));
                if (id != null && !ids.add(id)) {
                    c.problem(pa.child("id"), "pack id \"" + id + "\" is used twice");
                }
                String kind = choice(n, pa.child("kind"), Map.of("glossary", "glossary", "dictionary", "dictionary"), null);
                if (kind == null && !n.has("kind")) {
                    c.problem(pa.child("kind"), "is missing; use glossary or dictionary");
                }
                String version = c.text(n, pa.child("version"), true);
                String file = c.text(n, pa.child("file"), true);
                if (file != null && safeFile(file, pa.child("file"))) {
                    if (!file.endsWith(".inkpack")) {
                        c.problem(pa.child("file"), "\"" + file + "\" is not an .inkpack file; build the pack first");
                    } else if (!Files.isRegularFile(folder.resolve(file))) {
                        c.problem(pa.child("file"), "\"" + file + "\" does not exist in the exam folder; copy the pack there");
                    }
                }
                if (id != null && kind != null && version != null && file != null) {
                    out.add(new Pack(id, kind, version, file));
                }
            }
            return out;
        }

        /** A file named in exam.yaml must stay inside the folder and be usable as a bundle entry name. */
        private boolean safeFile(String name, At at) {
            String problem = EntryNames.problem(name);
            if (problem != null) {
                c.problem(at, "\"" + name + "\" cannot be used: " + problem
                        + ". Name a file inside the exam folder with a relative path using '/'");
                return false;
            }
            String outside = InsideFolder.problem(folder, name);
            if (outside != null) {
                c.problem(at, outside);
                return false;
            }
            return true;
        }

        private void textFile(String name, At at) {
            if (!safeFile(name, at)) {
                return;
            }
            Path file = folder.resolve(name);
            if (!Files.isRegularFile(file)) {
                c.problem(at, "\"" + name + "\" does not exist in the exam folder; create it or fix the name");
                return;
            }
            try {
                long size = Files.size(file);
                if (size == 0 || size > MAX_TEXT_FILE_BYTES) {
                    c.problem(at, "\"" + name + "\" is " + (size == 0 ? "empty" : "larger than 1 MiB")
                            + "; a prompt or instructions file holds Markdown text");
                    return;
                }
                StandardCharsets.UTF_8.newDecoder().onMalformedInput(CodingErrorAction.REPORT)
                        .decode(ByteBuffer.wrap(Files.readAllBytes(file)));
            } catch (CharacterCodingException e) {
                problems.add(new Problem(name, 0, 0, "", "is not UTF-8 text; save it as UTF-8"));
            } catch (IOException e) {
                problems.add(new Problem(name, 0, 0, "", "cannot be read: " + e.getMessage()));
            }
        }
    }

    /** A loose BCP 47 shape check: the JDK parses any tag, so only the shape is checked here. */
    static boolean isLanguageTag(String tag) {
        return tag.matches("[A-Za-z]{2,3}(-[A-Za-z0-9]{1,8})*")
                && !Locale.forLanguageTag(tag).getLanguage().isEmpty();
    }

    /** Reads the rubric YAML named in exam.yaml. */
    static final class RubricReader {
        private RubricReader() {
        }

        static Rubric read(Path folder, String name, List<Problem> problems) {
            Path file = folder.resolve(name);
            if (!Files.isRegularFile(file)) {
                problems.add(new Problem(EXAM_FILE, 0, 0, "rubric", "\"" + name + "\" does not exist in the exam folder"));
                return null;
            }
            String outside = InsideFolder.problem(folder, name);
            if (outside != null) {
                problems.add(new Problem(EXAM_FILE, 0, 0, "rubric", outside));
                return null;
            }
            byte[] bytes;
            try {
                bytes = Files.readAllBytes(file);
            } catch (IOException e) {
                problems.add(new Problem(name, 0, 0, "", "cannot be read: " + e.getMessage()));
                return null;
            }
            Optional<LocatedYaml> yaml = LocatedYaml.parse(name, bytes, problems);
            if (yaml.isEmpty()) {
                return null;
            }
            YamlChecker c = new YamlChecker(yaml.get(), problems);
            JsonNode root = yaml.get().root();
            At at = YamlChecker.root();
            if (!c.isObject(root, at, true)) {
                return null;
            }
            c.onlyKeys(root, at, RUBRIC_TOP);
            List<Criterion> criteria = new ArrayList<>();
            Set<String> ids = new HashSet<>();
            List<JsonNode> nodes = c.list(root, at.child("criteria"), true);
            if (nodes.isEmpty() && root.has("criteria")) {
                c.problem(at.child("criteria"), "lists no criterion; a rubric needs at least one");
            }
            for (int i = 0; i < nodes.size(); i++) {
                JsonNode n = nodes.get(i);
                At ca = at.child("criteria").index(i);
                if (!c.isObject(n, ca, true)) {
                    continue;
                }
                c.onlyKeys(n, ca, CRITERION);
                String id = c.id(n, ca.child("id"));
                if (id != null && !ids.add(id)) {
                    c.problem(ca.child("id"), "criterion id \"" + id + "\" is used twice");
                }
                String cname = c.text(n, ca.child("name"), true);
                int[] range = range(c, n, ca.child("scores"));
                List<Band> bands = new ArrayList<>();
                List<JsonNode> bn = c.list(n, ca.child("bands"), true);
                Map<Integer, Integer> covered = new HashMap<>();
                for (int j = 0; j < bn.size(); j++) {
                    JsonNode b = bn.get(j);
                    At ba = ca.child("bands").index(j);
                    if (!c.isObject(b, ba, true)) {
                        continue;
                    }
                    c.onlyKeys(b, ba, BAND);
                    int[] br = range(c, b, ba.child("scores"));
                    String descriptor = c.text(b, ba.child("descriptor"), true);
                    if (br != null && range != null) {
                        if (br[0] < range[0] || br[1] > range[1]) {
                            c.problem(ba.child("scores"), "band " + br[0] + "-" + br[1] + " lies outside the criterion's scores "
                                    + range[0] + "-" + range[1]);
                        }
                        for (int s = br[0]; s <= br[1]; s++) {
                            Integer other = covered.putIfAbsent(s, j);
                            if (other != null) {
                                c.problem(ba.child("scores"), "score " + s + " is already described by bands[" + other
                                        + "]; each score belongs to exactly one band");
                                break;
                            }
                        }
                    }
                    if (br != null && descriptor != null) {
                        bands.add(new Band(br[0], br[1], descriptor));
                    }
                }
                if (range != null && bn.size() > 0) {
                    List<Integer> missing = new ArrayList<>();
                    for (int s = range[0]; s <= range[1]; s++) {
                        if (!covered.containsKey(s)) {
                            missing.add(s);
                        }
                    }
                    if (!missing.isEmpty() && covered.size() > 0) {
                        c.problem(ca.child("bands"), "no band describes score" + (missing.size() > 1 ? "s " : " ")
                                + String.join(", ", missing.stream().map(String::valueOf).toList())
                                + "; every score in " + range[0] + "-" + range[1] + " needs a descriptor raters can read");
                    }
                }
                if (id != null && cname != null && range != null) {
                    bands.sort(java.util.Comparator.comparingInt(Band::from));
                    criteria.add(new Criterion(id, cname, range[0], range[1], bands));
                }
            }
            return new Rubric(name, criteria);
        }

        /** A score range written {@code 1-9} or a single score {@code 5}. */
        private static int[] range(YamlChecker c, JsonNode parent, At at) {
            String text = c.text(parent, at, true);
            if (text == null) {
                return null;
            }
            var m = java.util.regex.Pattern.compile("(\\d{1,3})(?:\\s*-\\s*(\\d{1,3}))?").matcher(text);
            if (!m.matches()) {
                c.problem(at, "\"" + text + "\" is not a score range; write it like 1-9, or a single score like 5");
                return null;
            }
            int from = Integer.parseInt(m.group(1));
            int to = m.group(2) == null ? from : Integer.parseInt(m.group(2));
            if (from > to) {
                c.problem(at, "range " + text + " runs backwards; write the lower score first");
                return null;
            }
            return new int[] {from, to};
        }
    }
}
