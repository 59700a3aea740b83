package org.inkgate.client.sitting.killtest;

import java.io.BufferedReader;
import java.io.InputStreamReader;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.time.Duration;
import java.util.List;
import java.util.Map;
import org.inkgate.client.sitting.Sitting;
import org.inkgate.client.sitting.clock.SittingClock;
import org.inkgate.client.sitting.TaskStart;
import org.inkgate.client.sitting.recovery.RecoveryScan;
import org.inkgate.client.sitting.recovery.UnfinishedSitting;
import org.inkgate.client.sitting.store.ClientDataFolder;
import org.inkgate.client.testutil.SittingFixtures;
import org.inkgate.format.response.EventType;
import org.inkgate.format.testutil.SampleExam;

/**
 * The child process of {@link CoreKillTest}: the real sitting core (SQLite process log, snapshots,
 * recovery) with a scripted typist in place of the editor, NOT the JavaFX client. It starts or
 * resumes the sitting in the data folder given as argument, enters task t1, prints READY with the
 * recovered text, then applies keystrokes from stdin exactly as the workspace does (an event per
 * change, a snapshot offered after each) and acknowledges each.
 */
public final class ScriptedTypist {

    private ScriptedTypist() {
    }

    public static void main(String[] args) throws Exception {
        ClientDataFolder folder = new ClientDataFolder(Path.of(args[0]));
        SittingClock clock = SittingClock.system();
        List<UnfinishedSitting> found = RecoveryScan.find(folder);
        Sitting sitting = found.isEmpty() ? Sitting.begin(SittingFixtures.candidate1001(), folder, clock)
                : Sitting.resume(found.getFirst(), SampleExam.manifest(), SittingFixtures.SHA, Duration.ZERO, folder, clock);
        String task = sitting.currentTask().orElse(sitting.nextTask().orElseThrow());
        TaskStart start = sitting.enterTask(task);
        StringBuilder text = new StringBuilder(start.text());
        PrintStream out = new PrintStream(System.out, true, StandardCharsets.UTF_8);
        out.println(TypingProtocol.ready(text.toString()));
        BufferedReader in = new BufferedReader(new InputStreamReader(System.in, StandardCharsets.UTF_8));
        int applied = 0;
        for (String line = in.readLine(); line != null; line = in.readLine()) {
            int key = TypingProtocol.keystroke(line);
            if (key < 0) {
                if (text.length() > 0) {
                    int end = text.length();
                    int from = Character.isLowSurrogate(text.charAt(end - 1)) && end >= 2 ? end - 2 : end - 1;
                    String removed = text.substring(from, end);
                    text.delete(from, end);
                    sitting.log().record(EventType.TEXT_DELETE, task,
                            Map.of("pos", from, "len", removed.length(), "text", removed, "source", "typing"));
                }
            } else {
                String typed = Character.toString(key);
                int pos = text.length();
                text.append(typed);
                sitting.log().record(EventType.TEXT_INSERT, task,
                        Map.of("pos", pos, "len", typed.length(), "text", typed, "source", "typing"));
            }
            sitting.log().snapshot(task, text.toString(), text.length());
            sitting.poll();
            applied++;
            out.println(TypingProtocol.ACK + applied);
        }
        sitting.close();
    }
}
