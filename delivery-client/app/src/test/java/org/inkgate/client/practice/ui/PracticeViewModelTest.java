package org.inkgate.client.practice.ui;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.inkgate.client.practice.PracticeExam;
import org.inkgate.client.practice.PracticeForm;
import org.inkgate.client.practice.PracticeTask;
import org.inkgate.client.practice.PromptText;
import org.inkgate.client.practice.TaskWording;
import org.inkgate.format.bundle.WordGuidance;
import org.inkgate.packs.policy.PastePolicy;
import org.inkgate.packs.policy.ResourcePolicy;
import org.inkgate.packs.policy.SpellingMode;
import org.junit.jupiter.api.Test;

/** The view model alone: JavaFX properties work without a running toolkit. */
class PracticeViewModelTest {

    private static final ResourcePolicy SPELLING =
            new ResourcePolicy(SpellingMode.SUGGESTIONS, null, null, false, true, PastePolicy.NONE);
    private static final ResourcePolicy BARE =
            new ResourcePolicy(SpellingMode.OFF, null, null, false, false, PastePolicy.NONE);

    @Test
    void new_exam_selectsFirstFormAndItsFirstTask() {
        PracticeViewModel vm = new PracticeViewModel(exam());

        assertEquals("Form A", vm.selectedFormProperty().get().name());
        assertEquals("Task 1 of 2: Letter", vm.taskHeadingProperty().get());
        assertEquals("Spelling check with suggestions", vm.toolsTextProperty().get());
        assertTrue(vm.toolsOfferedProperty().get());
        assertEquals("Inkgate - Invented test exam (practice)", vm.windowTitle());
    }

    @Test
    void draft_whenPolicyShowsWordCount_countsLive() {
        PracticeViewModel vm = new PracticeViewModel(exam());
        vm.draftProperty().set("three short words");
        assertEquals("3 words", vm.wordCountTextProperty().get());
        assertTrue(vm.wordCountShownProperty().get());
    }

    @Test
    void draft_whenPolicyHidesWordCount_saysItIsNotShown() {
        PracticeViewModel vm = new PracticeViewModel(exam());
        vm.selectTask(vm.tasks().get(1));
        vm.draftProperty().set("three short words");

        assertEquals("The word count is not shown in this task", vm.wordCountTextProperty().get());
        assertFalse(vm.wordCountShownProperty().get());
        assertEquals(TaskWording.NO_TOOLS, vm.toolsTextProperty().get());
    }

    @Test
    void chooseForm_otherForm_keepsPracticeTextOfTheSameTask() {
        PracticeViewModel vm = new PracticeViewModel(exam());
        vm.draftProperty().set("my letter");

        vm.selectedFormProperty().set(vm.forms().get(1));
        assertEquals("Task 1 of 2: Essay", vm.taskHeadingProperty().get());
        assertEquals("", vm.draftProperty().get());

        vm.selectTask(vm.tasks().get(1));
        assertEquals("Task 2 of 2: Letter", vm.taskHeadingProperty().get());
        assertEquals("my letter", vm.draftProperty().get());
    }

    @Test
    void selectTask_null_keepsTheCurrentTask() {
        PracticeViewModel vm = new PracticeViewModel(exam());
        vm.selectTask(null);
        assertEquals("Task 1 of 2: Letter", vm.taskHeadingProperty().get());
    }

    private static PracticeExam exam() {
        PromptText prompt = PromptText.parse("Write something.");
        WordGuidance words = new WordGuidance(10, 20);
        PracticeForm a = new PracticeForm("A", "Form A", List.of(
                new PracticeTask(1, "letter", "Letter", "With", SPELLING, TaskWording.tools(SPELLING), prompt, words, 600),
                new PracticeTask(2, "essay", "Essay", "Without", BARE, TaskWording.tools(BARE), prompt, words, 600)), "");
        PracticeForm b = new PracticeForm("B", "Form B", List.of(
                new PracticeTask(1, "essay", "Essay", "With", SPELLING, TaskWording.tools(SPELLING), prompt, words, 600),
                new PracticeTask(2, "letter", "Letter", "Without", BARE, TaskWording.tools(BARE), prompt, words, 600)), "");
        return new PracticeExam("Invented test exam", "test.inkexam", "0000-0000-0000-0000-0000-0000-0000-0000",
                new PromptText(List.of()), List.of(a, b));
    }
}
