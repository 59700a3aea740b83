package org.inkgate.analysis.testutil;

import java.io.IOException;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import org.inkgate.analysis.data.Rating;

/**
 * An invented, simulated sitting for demos, smoke tests and benchmarks: NOT real data and never
 * used as a check value. Candidates at three invented levels write two tasks, one without and
 * one with resources (form F1: the letter without and the essay with resources; form F2 the other way
 * round, so task and condition are crossed); raters score five criteria 0-5 from a latent ability
 * plus noise.
 */
public final class SimulatedSitting {

    public static final String[] LEVELS = {"L1", "L2", "L3"};
    public static final String[] CRITERIA = {"content", "organisation", "vocabulary", "grammar", "mechanics"};
    public static final String[] TOOLS = {"dictionary", "thesaurus", "spelling"};

    private SimulatedSitting() {
    }

    /** candidates x 2 tasks x 2 raters x 5 criteria ratings. */
    public static List<Rating> ratings(int candidates, long seed) {
        Random rnd = new Random(seed);
        List<Rating> out = new ArrayList<>(candidates * 20);
        int raterPool = Math.max(4, candidates / 250);
        for (int c = 0; c < candidates; c++) {
            int level = c % 3;
            double ability = 1.2 + 1.0 * level + rnd.nextGaussian() * 0.7;
            String id = String.format("C%06d", c);
            String form = formOf(c);
            for (int task = 0; task < 2; task++) {
                boolean withResources = task == (form.equals("F1") ? 1 : 0);
                String condition = withResources ? "resources" : "none";
                double boost = withResources ? 0.25 + 0.1 * (2 - level) : 0;
                double taskDifficulty = task == 1 ? 0.2 : 0;
                int r1 = rnd.nextInt(raterPool);
                int r2 = (r1 + 1 + rnd.nextInt(raterPool - 1)) % raterPool;
                for (int r : new int[] {r1, r2}) {
                    double severity = (r % 5 - 2) * 0.1;
                    for (int k = 0; k < CRITERIA.length; k++) {
                        double v = ability + boost - taskDifficulty - severity + (k - 2) * 0.1 + rnd.nextGaussian() * 0.6;
                        double score = Math.max(0, Math.min(5, Math.round(v)));
                        out.add(new Rating(id, LEVELS[level], form, task == 0 ? "letter" : "essay", condition,
                                String.format("R%03d", r), CRITERIA[k], score));
                    }
                }
            }
        }
        return out;
    }

    /** The form of candidate number c: F1 for even, F2 for odd numbers. */
    public static String formOf(int c) {
        return c % 2 == 0 ? "F1" : "F2";
    }

    /** The task candidate number c sat with resources. */
    public static String resourcesTask(int c) {
        return formOf(c).equals("F1") ? "essay" : "letter";
    }

    /** Writes ratings as the tidy CSV. */
    public static void writeCsv(List<Rating> ratings, Path file) throws IOException {
        try (Writer w = Files.newBufferedWriter(file, StandardCharsets.UTF_8)) {
            w.write("candidate,level,form,task,condition,rater,criterion,score\n");
            StringBuilder b = new StringBuilder(64);
            for (Rating r : ratings) {
                b.setLength(0);
                b.append(r.candidate()).append(',').append(r.level()).append(',').append(r.form()).append(',')
                        .append(r.task()).append(',').append(r.condition()).append(',').append(r.rater()).append(',')
                        .append(r.criterion()).append(',').append((int) r.score()).append('\n');
                w.write(b.toString());
            }
        }
    }

    /** A tool-use table for the task each candidate sat with resources. */
    public static void writeToolUse(int candidates, long seed, Path file) throws IOException {
        Random rnd = new Random(seed);
        try (Writer w = Files.newBufferedWriter(file, StandardCharsets.UTF_8)) {
            w.write("candidate,task,tool,uses,empty_queries,suggestions_accepted,suggestions_ignored\n");
            for (int c = 0; c < candidates; c++) {
                for (int t = 0; t < TOOLS.length; t++) {
                    int uses = rnd.nextDouble() < 0.3 + 0.15 * (c % 3) ? rnd.nextInt(8) + 1 : 0;
                    int empty = uses == 0 ? 0 : rnd.nextInt(uses + 1) / 3;
                    int acc = t == 2 ? rnd.nextInt(uses + 1) : 0;
                    int ign = t == 2 ? rnd.nextInt(3) : 0;
                    w.write(String.format("C%06d,%s,%s,%d,%d,%d,%d%n", c, resourcesTask(c), TOOLS[t], uses, empty, acc,
                            ign));
                }
            }
        }
    }

    /** A process log: bursts of typing with pauses, a few deletions and lookups. */
    public static void writeProcessLog(int candidates, long seed, Path file) throws IOException {
        Random rnd = new Random(seed);
        String[] words = {"harbour", "ferry", "market", "lantern", "festival", "weather", "bridge", "museum"};
        try (Writer w = Files.newBufferedWriter(file, StandardCharsets.UTF_8)) {
            w.write("candidate,task,time_ms,type,position,text\n");
            for (int c = 0; c < candidates; c++) {
                for (String task : new String[] {"letter", "essay"}) {
                    long t = 0;
                    int len = 0;
                    for (int i = 0; i < 120; i++) {
                        t += rnd.nextDouble() < 0.1 ? 2000 + rnd.nextInt(6000) : 80 + rnd.nextInt(300);
                        if (task.equals(resourcesTask(c)) && rnd.nextDouble() < 0.03) {
                            String q = words[rnd.nextInt(words.length)];
                            w.write(String.format("C%06d,%s,%d,panel.open,,%n", c, task, t));
                            w.write(String.format("C%06d,%s,%d,tool.query,,%s%n", c, task, t + 500, q));
                            w.write(String.format("C%06d,%s,%d,panel.close,,%n", c, task, t + 3000));
                            t += 3500;
                            w.write(String.format("C%06d,%s,%d,text.insert,%d,%s%n", c, task, t, len, " " + q));
                            len += q.length() + 1;
                        } else if (len > 3 && rnd.nextDouble() < 0.08) {
                            w.write(String.format("C%06d,%s,%d,text.delete,%d,x%n", c, task, t, len - 1));
                            len--;
                        } else {
                            w.write(String.format("C%06d,%s,%d,text.insert,%d,%s%n", c, task, t, len,
                                    rnd.nextDouble() < 0.2 ? "s" : "e"));
                            len++;
                        }
                    }
                }
            }
        }
    }

    /** A candidate table with two survey items (1-5). */
    public static void writeCandidates(int candidates, long seed, Path file) throws IOException {
        Random rnd = new Random(seed);
        try (Writer w = Files.newBufferedWriter(file, StandardCharsets.UTF_8)) {
            w.write("candidate,level,tools_helped,felt_rushed\n");
            for (int c = 0; c < candidates; c++) {
                w.write(String.format("C%06d,%s,%d,%s%n", c, LEVELS[c % 3], 1 + rnd.nextInt(5),
                        rnd.nextDouble() < 0.1 ? "" : String.valueOf(1 + rnd.nextInt(5))));
            }
        }
    }
}
