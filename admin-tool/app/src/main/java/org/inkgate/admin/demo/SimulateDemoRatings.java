package org.inkgate.admin.demo;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.io.StringWriter;
import java.util.ArrayList;
import java.util.List;
import java.util.SplittableRandom;
import java.util.concurrent.Callable;
import org.inkgate.admin.core.csv.Csv;
import org.inkgate.admin.core.rating.BlindIds;
import org.inkgate.admin.core.rating.RatingScripts;
import org.inkgate.admin.core.rating.RatingStore;
import org.inkgate.admin.core.source.ExamSource;
import org.inkgate.admin.core.store.StoreLocation;
import org.inkgate.admin.core.store.Stores;
import org.inkgate.format.io.OwnerOnly;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

/**
 * Demo only: fills rating sheets written by {@code rate sheet export} with SIMULATED (invented)
 * scores, so that a trial walk through the guide reaches discrepancies, adjudication and the
 * analysis without human raters. Every filled row says SIMULATED in its comment. A response's
 * invented quality comes from its text in the scripts folder beside the sheet (so two raters of
 * one response agree roughly), each rater gets an invented severity from the sheet's name, and a
 * seeded jitter of one point either way makes some pairs disagree. Rows already scored are kept.
 */
@Command(name = "simulate-demo-ratings", mixinStandardHelpOptions = true,
        description = "DEMO ONLY: fill exported rating sheets with simulated (invented) scores.")
public final class SimulateDemoRatings implements Callable<Integer> {

    @Parameters(paramLabel = "SHEET", arity = "1..*", description = "rating sheets written by rate sheet export")
    List<Path> sheets;

    @Option(names = "--store", required = true, paramLabel = "DB", description = "the results store (for the rubric)")
    String store;

    @Option(names = "--exam", paramLabel = "ID", description = "the exam, when the store holds more than one")
    String exam;

    @Override
    public Integer call() throws Exception {
        CommandLine cl = new CommandLine(this);
        StoreLocation location = StoreLocation.parse(store);
        String examId = exam;
        if (examId == null) {
            List<String> exams = Stores.exams(location);
            if (exams.size() != 1) {
                cl.getErr().println("the store holds " + exams.size() + " exams " + exams + ": name one with --exam");
                return 2;
            }
            examId = exams.get(0);
        }
        ExamSource.Rubric rubric;
        try (RatingStore s = Stores.openRating(location, examId)) {
            rubric = s.rubric();
        }
        for (Path sheet : sheets) {
            int filled = fill(sheet, rubric);
            cl.getOut().println("Filled " + filled + " rows of " + sheet.getFileName() + " with SIMULATED scores");
        }
        cl.getOut().flush();
        return 0;
    }

    private static int fill(Path sheet, ExamSource.Rubric rubric) throws Exception {
        List<Csv.Row> rows = Csv.parse(Files.readString(sheet, StandardCharsets.UTF_8));
        List<String> header = rows.get(0).fields();
        String rater = sheet.getFileName().toString().replaceFirst("(?i)\\.csv$", "");
        int severity = Math.floorMod(rater.hashCode(), 3) - 1; // String.hashCode is specified: -1, 0 or +1
        Path scripts = RatingScripts.folderFor(sheet);
        StringWriter out = new StringWriter();
        Csv.writeRow(out, header);
        int filled = 0;
        for (Csv.Row row : rows.subList(1, rows.size())) {
            List<String> f = new ArrayList<>(row.fields());
            String id = f.get(0);
            boolean blank = rubric.criteria().stream().allMatch(c -> f.get(header.indexOf(c.id())).isBlank());
            if (blank && BlindIds.looksLikeId(id)) {
                String text = Files.readString(scripts.resolve(id + ".txt"), StandardCharsets.UTF_8);
                // the text after the heading: the same for every rater of this response
                String body = text.substring(text.indexOf("\n\n") + 2);
                double quality = Math.floorMod(body.hashCode(), 1000) / 999.0;
                SplittableRandom jitter = new SplittableRandom(body.hashCode() * 31L + rater.hashCode());
                for (ExamSource.Criterion c : rubric.criteria()) {
                    int span = c.maxScore() - c.minScore();
                    long score = Math.round(c.minScore() + quality * span) + severity + jitter.nextInt(3) - 1;
                    f.set(header.indexOf(c.id()), Long.toString(Math.max(c.minScore(), Math.min(c.maxScore(), score))));
                }
                f.set(header.indexOf("comment"), "SIMULATED");
                filled++;
            }
            Csv.writeRow(out, f);
        }
        Path temporary = sheet.resolveSibling(sheet.getFileName() + ".filling");
        Files.writeString(temporary, out.toString(), StandardCharsets.UTF_8);
        OwnerOnly.file(temporary);
        Files.move(temporary, sheet, StandardCopyOption.REPLACE_EXISTING, StandardCopyOption.ATOMIC_MOVE);
        return filled;
    }

    public static void main(String[] args) {
        System.exit(new CommandLine(new SimulateDemoRatings()).execute(args));
    }
}
