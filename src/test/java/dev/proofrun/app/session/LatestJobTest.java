package dev.proofrun.app.session;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;

/** Only the latest job's answer is passed on, whatever order the answers arrive in. */
class LatestJobTest {

    private final HeldJobs worker = new HeldJobs();
    private final LatestJob latest = new LatestJob(worker);
    private final List<String> heard = new ArrayList<>();

    private void submit(String answer) {
        latest.submit(() -> answer, heard::add, ex -> heard.add("failed: " + ex.getMessage()));
    }

    /**
     * Submits an older and a newer job (each answering its name, or failing with "name broke"), ends them in the
     * order given, and returns what was heard.
     */
    private static List<String> race(boolean olderFails, boolean newerFails, int endedFirst) {
        HeldJobs jobs = new HeldJobs();
        LatestJob job = new LatestJob(jobs);
        List<String> got = new ArrayList<>();
        job.submit(() -> answerOrFail("older", olderFails), got::add, ex -> got.add("failed: " + ex.getMessage()));
        job.submit(() -> answerOrFail("newer", newerFails), got::add, ex -> got.add("failed: " + ex.getMessage()));
        jobs.job(endedFirst).end();
        jobs.job(1 - endedFirst).end();
        return got;
    }

    private static String answerOrFail(String name, boolean fails) {
        if (fails) {
            throw new IllegalStateException(name + " broke");
        }
        return name;
    }

    @Test
    void anOlderAnswerIsDroppedWhetherItArrivesBeforeOrAfterTheNewerOne() {
        assertEquals(List.of("newer"), race(false, false, 0), "the older answer came first, after the newer submit");
        assertEquals(List.of("newer"), race(false, false, 1), "the older answer came last");
    }

    @Test
    void anOlderJobsFailureIsDropped() {
        assertEquals(List.of("newer"), race(true, false, 0));
        assertEquals(List.of("newer"), race(true, false, 1));
    }

    @Test
    void theLatestJobsFailureIsPassedOn() {
        assertEquals(List.of("failed: newer broke"), race(false, true, 0));
        assertEquals(List.of("failed: newer broke"), race(false, true, 1));
    }

    @Test
    void aNewSubmitCancelsTheOlderJobOnly() {
        submit("older");
        submit("newer");
        assertTrue(worker.job(0).cancelled());
        assertFalse(worker.job(1).cancelled());
    }

    @Test
    void aJobThatHasAnsweredIsNotCancelledLater() {
        submit("first");
        worker.job(0).end();
        submit("second");
        assertFalse(worker.job(0).cancelled(), "nothing to cancel once the answer is in");
        assertEquals(List.of("first"), heard);
    }

    @Test
    void forgetCancelsTheJobAndDropsItsAnswer() {
        submit("forgotten");
        assertTrue(latest.forget(), "an answer was awaited");
        assertTrue(worker.job(0).cancelled());
        worker.job(0).end();
        assertEquals(List.of(), heard);
        assertFalse(latest.forget(), "nothing awaited any more");
    }

    @Test
    void forgetAfterTheAnswerSaysNothingWasAwaited() {
        submit("answered");
        worker.job(0).end();
        assertFalse(latest.forget());
        assertEquals(List.of("answered"), heard);
    }

    @Test
    void aSubmitAfterForgetIsAnsweredAndTheForgottenAnswerStillDropped() {
        submit("forgotten");
        latest.forget();
        submit("later");
        worker.job(1).end();
        worker.job(0).end();
        assertEquals(List.of("later"), heard);
    }

    @Test
    void anInlineWorkerAnswersBeforeSubmitReturnsAndLeavesNothingAwaited() {
        LatestJob inline = new LatestJob(Background.inline());
        List<String> got = new ArrayList<>();
        inline.submit(() -> "at once", got::add, ex -> got.add("failed"));
        assertEquals(List.of("at once"), got);
        assertFalse(inline.forget(), "the answer came inside submit");
        inline.<String>submit(() -> {
            throw new IllegalStateException("broke");
        }, got::add, ex -> got.add("failed: " + ex.getMessage()));
        assertEquals(List.of("at once", "failed: broke"), got);
        assertFalse(inline.forget());
    }

    @Test
    void anInlineAnswerMaySubmitAgainAndTheNewerJobWins() {
        LatestJob inline = new LatestJob(Background.inline());
        List<String> got = new ArrayList<>();
        inline.submit(() -> "first", first -> {
            got.add(first);
            inline.submit(() -> "second", got::add, ex -> got.add("failed"));
        }, ex -> got.add("failed"));
        assertEquals(List.of("first", "second"), got);
        assertFalse(inline.forget(), "both answered; the first job's handle was not kept as the one under way");
    }

    @Test
    void aJobAnsweredInsideSubmitIsNotKeptAsTheOneUnderWay() {
        worker.answerAtOnce(1);
        submit("at once");
        submit("held");
        assertFalse(worker.job(0).cancelled(), "it had answered before submit returned");
        assertEquals(List.of("at once"), heard);
        worker.job(1).end();
        assertEquals(List.of("at once", "held"), heard);
    }

    @Test
    void aJobSubmittedFromAnAnswerGivenInsideSubmitIsTheOneUnderWay() {
        worker.answerAtOnce(1);
        latest.submit(() -> "first", first -> submit("second"), ex -> { });
        assertTrue(latest.forget(), "the second job is awaited");
        assertTrue(worker.job(1).cancelled(), "forget cancelled the second job");
        assertFalse(worker.job(0).cancelled());
    }

    @Test
    void aJobStartedFromAnAnsweredOneIsNotCancelledByIt() {
        // a callback that submits again: the job it starts is the one under way afterwards
        latest.submit(() -> "first", first -> submit("second"), ex -> { });
        worker.job(0).end();
        assertTrue(latest.forget(), "the second job is awaited");
        assertTrue(worker.job(1).cancelled(), "forget cancelled the second job");
    }

    @Test
    void aMarkStaysCurrentUntilTheNextSubmit() {
        submit("result");
        worker.job(0).end();
        LatestJob.Mark mark = latest.mark();
        assertTrue(mark.stillCurrent());
        submit("another");
        assertFalse(mark.stillCurrent());
    }

    @Test
    void aMarkIsNoLongerCurrentAfterForget() {
        LatestJob.Mark mark = latest.mark();
        latest.forget();
        assertFalse(mark.stillCurrent());
    }

    @Test
    void takingAMarkNeitherCancelsNorDropsTheJobUnderWay() {
        submit("main");
        LatestJob.Mark mark = latest.mark();
        assertFalse(worker.job(0).cancelled());
        worker.job(0).end();
        assertEquals(List.of("main"), heard);
        assertTrue(mark.stillCurrent(), "the main job's answer does not change what the mark started from");
    }
}
