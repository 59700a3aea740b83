package org.inkgate.client.practice;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.inkgate.client.testutil.DemoBundles;
import org.inkgate.client.testutil.LiveBundles;
import org.inkgate.client.testutil.Tampering;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class PracticeLoaderTest {

    @TempDir
    Path temp;

    @Test
    void load_demoBundle_readsBothFormsWithTasksConditionsAndPrompts() throws Exception {
        PracticeLoad load = new PracticeLoader().load(DemoBundles.buildInto(temp));

        PracticeExam exam = assertInstanceOf(PracticeLoad.Opened.class, load).exam();
        assertEquals("Everyday Writing: Practice Paper (invented demo)", exam.title());
        PracticeForm a = exam.forms().getFirst();
        assertEquals("Form A", a.name());
        assertEquals(List.of("A note to a neighbour", "The empty shop on Mill Street"),
                a.tasks().stream().map(PracticeTask::title).toList());
        assertEquals(List.of("With resources", "Without resources"),
                a.tasks().stream().map(PracticeTask::conditionLabel).toList());
        assertTrue(a.tasks().getFirst().prompt().plainText().contains("Sam Okafor"));
        assertTrue(a.afterTasks().contains("About the two tasks"), a.afterTasks());
        assertTrue(exam.instructions().plainText().startsWith("Before you start"));
    }

    @Test
    void load_liveBundle_isRefusedAsNotForPractice() throws Exception {
        PracticeLoad load = new PracticeLoader().load(LiveBundles.buildInto(temp));

        String message = assertInstanceOf(PracticeLoad.Refused.class, load).message();
        assertTrue(message.startsWith("live.inkexam: this bundle is for a live sitting, not for practice"), message);
    }

    @Test
    void load_tamperedPrompt_isRefusedNamingTheEntry() throws Exception {
        Path tampered = temp.resolve("tampered.inkexam");
        Tampering.flipByteInEntry(DemoBundles.buildInto(temp), "prompts/task-1-neighbour-note.md", tampered);

        String message = assertInstanceOf(PracticeLoad.Refused.class, new PracticeLoader().load(tampered)).message();
        assertTrue(message.contains("\"prompts/task-1-neighbour-note.md\" does not match the digest"), message);
    }

    @Test
    void load_missingFile_isRefusedSayingThereIsNoSuchFile() {
        String message = assertInstanceOf(PracticeLoad.Refused.class,
                new PracticeLoader().load(temp.resolve("nowhere.inkexam"))).message();
        assertTrue(message.startsWith("nowhere.inkexam: there is no such file"), message);
    }

    @Test
    void load_notAnArchive_isRefusedWithTheReadersReason() throws Exception {
        Path junk = Files.writeString(temp.resolve("junk.inkexam"), "this is not an exam bundle");
        String message = assertInstanceOf(PracticeLoad.Refused.class, new PracticeLoader().load(junk)).message();
        assertTrue(message.startsWith("junk.inkexam: "), message);
    }
}
