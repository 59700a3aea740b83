package org.inkgate.client.sitting.course;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import org.inkgate.client.sitting.recovery.RecoveryScan;
import org.inkgate.client.sitting.recovery.UnfinishedSitting;
import org.inkgate.client.sitting.store.ClientDataFolder;
import org.inkgate.client.sitting.submit.InstallationKey;
import org.inkgate.client.testutil.FakeClock;
import org.inkgate.client.testutil.SittingFixtures;
import org.inkgate.format.response.OpenedResponse;
import org.inkgate.format.response.ResponsePackageReader;
import org.inkgate.format.response.TaskResponse;
import org.inkgate.format.response.TaskResponse.EndReason;
import org.inkgate.format.testutil.SampleExam;
import org.inkgate.format.testutil.TestKeys;
import org.inkgate.format.trust.TrustPolicy;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The sitting's decisions without a window, on the fake clock: the sample exam's form A (t1, 1200 s
 * with a warning at 5 minutes; t2, 1800 s; the "after" questionnaire), the real sitting core and
 * database, a recording view and stand-in tools.
 */
class SittingCourseTest {

    @TempDir
    Path dir;

    private final FakeClock clock = new FakeClock();
    private RecordingView view;
    private StandInTools tools;
    private ClientDataFolder data;
    private Path output;
    private SittingCourse course;

    @BeforeEach
    void openSeat() throws Exception {
        data = new ClientDataFolder(dir.resolve("data")).create();
        output = Files.createDirectories(dir.resolve("usb"));
        course = newCourse();
    }

    @AfterEach
    void close() {
        course.closeQuietly();
    }

    private SittingCourse newCourse() {
        view = new RecordingView();
        tools = new StandInTools();
        return new SittingCourse(new ExamAtSeat(SampleExam.manifest(), SittingFixtures.SHA, "sample.inkexam", "test"),
                data, clock, tools, view, Runnable::run, Runnable::run);
    }

    /** Set-up done, candidate 1001 signed in (form A), Begin pressed: the first task is on screen. */
    private void intoFirstTask() {
        course.seatReady(output, "seat 4", null);
        assertEquals(Optional.empty(), course.signIn("1001"));
        course.instructionsRead();
    }

    @Test
    void signIn_thenBegin_instructionsPrepareToolsAndTheFirstTaskTakesTheKeysTypedOnTheWay() {
        course.seatReady(output, "seat 4", null);
        assertEquals(FlowScreen.SIGN_IN, course.screen());
        assertTrue(course.signIn("9999").isPresent());
        assertEquals(FlowScreen.SIGN_IN, course.screen(), "a refused number leaves sign-in up");

        assertEquals(Optional.empty(), course.signIn("1001"));
        assertEquals(FlowScreen.INSTRUCTIONS, course.screen());
        assertTrue(tools.started(), "the tools are prepared while the instructions show");
        assertTrue(view.toolsStatus.contains("The writing tools are ready."), view.toolsStatus.toString());

        course.instructionsRead();
        assertEquals(FlowScreen.TASK, course.screen());
        assertEquals(TaskTurn.OPEN, course.turn());
        assertEquals(TypedKeys.HOLD_FOR_NEXT_TASK, view.keys.getFirst(), "Begin: keys typed at once go into the task");
        assertEquals("t1", view.page().taskId);
        assertTrue(view.focused.contains(view.page()), "the caret goes into the answer");
        assertEquals(Optional.of(Duration.ofSeconds(1200)), course.timeLeft());
    }

    @Test
    void signIn_unknownNumber_isRefusedInASentenceAndNoSittingBegins() {
        course.seatReady(output, "seat 4", null);
        Optional<String> refusal = course.signIn("9999");
        assertTrue(refusal.isPresent());
        assertTrue(refusal.get().contains("9999") && refusal.get().endsWith("."), refusal.get());
        assertEquals(FlowScreen.SIGN_IN, course.screen());
        assertFalse(course.candidateSitting());
    }

    @Test
    void timeUp_midTask_freezesSaysSoThenTheNextTaskFollows() throws Exception {
        intoFirstTask();
        RecordingView.FakePage first = view.page();
        first.type("Dear Sam, plans changed.");
        clock.advance(Duration.ofSeconds(1200 - 300));
        course.tick();
        assertEquals("5 minutes left in this task.", view.announcements.getLast());

        clock.advance(Duration.ofSeconds(300));
        course.tick();
        assertEquals("The time for this task is up. Your answer has been saved.", view.announcements.getLast());
        assertTrue(first.frozen, "no typing after the time is up");
        assertEquals(TypedKeys.DROP, view.keys.getLast(), "keys typed after time-up belong to no task");
        assertEquals(TaskTurn.ENDING, course.turn());
        assertNotNull(view.afterTimeUp, "the message stays a moment before the next task");

        course.endTaskByInvigilator();
        course.finishTaskAsked();
        assertFalse(first.closed, "a task that is ending is not ended twice");

        view.runTimeUpPause();
        assertTrue(first.closed);
        assertEquals(FlowScreen.TASK, course.screen());
        assertEquals("t2", view.page().taskId);
        assertEquals(Optional.of(Duration.ofSeconds(1800)), course.timeLeft());

        TaskResponse t1 = handInRest().tasks().getFirst();
        assertEquals(EndReason.TIME_UP, t1.endReason());
        assertEquals("Dear Sam, plans changed.", t1.text());
    }

    @Test
    void timeUp_beforeTheToolsArrive_endsTheTaskAndItsLateToolsNeverShow() throws Exception {
        tools.holdBack = true;
        intoFirstTask();
        assertTrue(view.pages.isEmpty(), "no page before the tools are ready");
        assertTrue(view.shown.contains("preparing"), view.shown.toString());
        course.finishTaskAsked();
        assertEquals(TaskTurn.OPEN, course.turn(), "nothing to finish before the page shows");

        clock.advance(Duration.ofSeconds(1200));
        course.tick();
        view.runTimeUpPause();
        tools.release();
        assertEquals(List.of("t2"), view.pages.stream().map(p -> p.taskId).toList(),
                "the ended task's page never showed; the next task's did, once its tools came");
    }

    @Test
    void endTask_byTheInvigilator_endsWithThatReasonDropsTheKeysAndMovesOn() throws Exception {
        intoFirstTask();
        view.page().type("Half a note");
        course.endTaskByInvigilator();
        assertEquals(TypedKeys.DROP, view.keys.getLast(), "what the candidate types now belongs to no task");
        assertEquals("t2", view.page().taskId);

        course.finishTaskAsked();
        assertEquals(TypedKeys.HOLD_FOR_NEXT_TASK, view.keys.get(view.keys.size() - 2),
                "finishing a task: the candidate's next keys go into what follows");
        assertEquals(FlowScreen.QUESTIONNAIRE, course.screen(), "after the last task: the form's questionnaire");

        TaskResponse t1 = answerAndHandIn().tasks().getFirst();
        assertEquals(EndReason.ENDED_BY_INVIGILATOR, t1.endReason());
        assertEquals("Half a note", t1.text());
    }

    @Test
    void pause_duringATask_freezesCoversAndStopsTheClockUntilResumed() {
        intoFirstTask();
        clock.advance(Duration.ofSeconds(100));
        course.setPaused(true);
        assertTrue(course.paused());
        assertTrue(view.page().frozen);
        assertTrue(view.covered);
        assertEquals(TypedKeys.DROP, view.keys.getLast());
        assertEquals("Paused by the invigilator", view.eventNotes.getLast());

        clock.advance(Duration.ofSeconds(2000));
        course.tick();
        assertEquals(TaskTurn.OPEN, course.turn(), "no time-up while paused");
        assertEquals(Optional.of(Duration.ofSeconds(1100)), course.timeLeft());

        course.setPaused(false);
        assertFalse(view.page().frozen);
        assertFalse(view.covered);
        assertEquals("Resumed after a pause of 33 minutes", view.eventNotes.getLast());
        assertEquals("The exam has resumed. Your time is running again.", view.announcements.getLast());
        clock.advance(Duration.ofSeconds(1100));
        course.tick();
        assertEquals(TaskTurn.ENDING, course.turn(), "the time runs out after the time left at the pause");
    }

    @Test
    void pause_whileTimeIsUp_resumeDoesNotUnfreezeTheEndingTask() {
        intoFirstTask();
        clock.advance(Duration.ofSeconds(1200));
        course.tick();
        course.setPaused(true);
        course.setPaused(false);
        assertTrue(view.page().frozen, "the ending task stays frozen");
    }

    @Test
    void recovery_crashMidTask_resumesIntoThatTaskWithItsText() throws Exception {
        intoFirstTask();
        view.page().type("Saved before the crash.");
        clock.advance(Duration.ofSeconds(100));
        course.closeQuietly(); // the machine goes down
        clock.advance(Duration.ofSeconds(200));

        course = newCourse();
        UnfinishedSitting found = onlyUnfinished();
        course.recoveryFound(found);
        assertEquals(FlowScreen.RECOVERY, course.screen());
        assertTrue(tools.started(), "the tools warm up while the invigilator reads the recovery screen");
        assertEquals(Optional.empty(), course.resume(found, found.downtime(clock.now()), true, output));
        assertEquals(Optional.of(ResumePoint.TASK), course.resumePoint());
        assertTrue(view.resumedWhere.startsWith("The task \"A note\" continues with the text saved so far."),
                view.resumedWhere);
        assertTrue(view.eventNotes.getLast().startsWith("The machine was down for 3 minutes (last saved at "),
                view.eventNotes.getLast());

        course.continueRecovered();
        assertEquals(FlowScreen.TASK, course.screen());
        assertEquals("t1", view.page().taskId);
        assertEquals("Saved before the crash.", view.page().text.toString());
        assertEquals(Optional.of(Duration.ofSeconds(1100)), course.timeLeft(), "the downtime was given back");
    }

    @Test
    void recovery_crashWhilePaused_theTaskWaitsForTheInvigilatorsResume() throws Exception {
        intoFirstTask();
        course.setPaused(true);
        course.closeQuietly();

        course = newCourse();
        UnfinishedSitting found = onlyUnfinished();
        course.recoveryFound(found);
        course.resume(found, Duration.ZERO, false, output);
        assertTrue(view.covered, "it continues paused");
        course.continueRecovered();
        assertEquals(TaskTurn.WAITING_FOR_RESUME, course.turn());
        assertTrue(view.pages.isEmpty(), "no task while paused");

        course.setPaused(false);
        assertEquals(FlowScreen.TASK, course.screen());
        assertEquals("t1", view.page().taskId);
    }

    @Test
    void recovery_crashAtTheQuestionnaire_resumesAtTheQuestionnaire() throws Exception {
        intoFirstTask();
        course.finishTaskAsked();
        course.finishTaskAsked();
        assertEquals(FlowScreen.QUESTIONNAIRE, course.screen());
        course.closeQuietly();

        course = newCourse();
        UnfinishedSitting found = onlyUnfinished();
        course.recoveryFound(found);
        course.resume(found, Duration.ZERO, false, output);
        assertEquals("All tasks had ended; the candidate continues with the last questions and hands in.",
                view.resumedWhere);
        assertEquals(Optional.of(ResumePoint.AFTER_TASKS), course.resumePoint());
        course.continueRecovered();
        assertEquals(FlowScreen.QUESTIONNAIRE, course.screen());
        assertEquals("after", view.questionnaire);
    }

    @Test
    void nextCandidate_afterTheHandIn_signInShowsAndTheNextSittingIsItsOwn() throws Exception {
        intoFirstTask();
        course.finishTaskAsked();
        course.finishTaskAsked();
        course.nextCandidate();
        assertEquals(FlowScreen.QUESTIONNAIRE, course.screen(), "no next candidate before the hand-in");
        course.questionnaireAnswered(Map.of("q1", "3"));
        assertEquals(FlowScreen.REVIEW, course.screen());
        assertEquals(List.of(new ReviewLine("A note", 0, "suggested: 60 to 120"),
                new ReviewLine("An opinion", 0, "suggested: 100 to 180")), view.review);
        course.handIn();
        assertEquals(FlowScreen.FINISHED, course.screen());
        HandedIn first = course.handedIn().orElseThrow();
        assertTrue(Files.exists(first.delivered()));

        course.nextCandidate();
        assertEquals(FlowScreen.SIGN_IN, course.screen());
        assertTrue(view.candidateOut, "the display goes back to the seat's standard");
        assertTrue(tools.cleared, "the last candidate's tools are put away");
        assertTrue(course.plan().isEmpty());
        assertTrue(course.handedIn().isEmpty());
        assertFalse(course.paused());

        assertEquals(Optional.empty(), course.signIn("1002"));
        assertEquals("B", course.plan().orElseThrow().formId());
        assertEquals("seat 4", course.plan().orElseThrow().seat(), "the seat stays as set up");
        assertEquals(FlowScreen.INSTRUCTIONS, course.screen());
        assertTrue(Files.exists(first.delivered()), "the first candidate's package stays");
        assertTrue(RecoveryScan.find(data).stream().allMatch(u -> u.candidateNumber().equals("1002")),
                "the first candidate's sitting is finished, the second is its own");
    }

    @Test
    void focus_lossesListedOnlyWhileACandidateSits_andAReturnOnlyAfterALoss() {
        course.focusReturned(10);
        course.focusLost();
        assertTrue(view.focusNotes.isEmpty(), "before sign-in the window is the invigilator's");
        intoFirstTask();
        course.focusReturned(10);
        assertTrue(view.focusNotes.isEmpty(), "no return without a loss");
        course.focusLost();
        course.focusReturned(3000);
        assertEquals(List.of("Focus lost", "Focus returned after 3 seconds"), view.focusNotes);
    }

    @Test
    void addMinutes_onlyDuringATask() {
        course.seatReady(output, "", null);
        course.signIn("1001");
        course.addMinutes(5);
        assertTrue(view.eventNotes.isEmpty(), "no time added outside a task");
        course.instructionsRead();
        course.addMinutes(5);
        assertEquals(Optional.of(Duration.ofSeconds(1500)), course.timeLeft());
        assertEquals("5 minutes added to the task \"A note\"", view.eventNotes.getLast());
    }

    private UnfinishedSitting onlyUnfinished() throws Exception {
        List<UnfinishedSitting> found = RecoveryScan.find(data);
        assertEquals(1, found.size(), found.toString());
        return found.getFirst();
    }

    /** From the second task: finish it, answer the questionnaire, hand in; the package as the collector reads it. */
    private org.inkgate.format.response.ResponseDocument handInRest() throws Exception {
        course.finishTaskAsked();
        return answerAndHandIn();
    }

    private org.inkgate.format.response.ResponseDocument answerAndHandIn() throws Exception {
        course.questionnaireAnswered(Map.of("q1", "3"));
        course.handIn();
        HandedIn handedIn = course.handedIn().orElseThrow(() -> new AssertionError("not handed in: " + view.shown));
        String fingerprint = InstallationKey.loadOrCreate(data).fingerprint();
        OpenedResponse opened = new ResponsePackageReader(TestKeys.OWNER_ENCRYPTION,
                TrustPolicy.trusting(Set.of(fingerprint))).open(handedIn.delivered());
        assertNotEquals(handedIn.delivered(), handedIn.localCopy());
        return opened.response();
    }
}
