package dev.proofrun.app;

import dev.proofrun.text.MessageKey;

/** What the wizard itself says (the core's messages come from the core's own enums). */
public enum AppMessage implements MessageKey {
    STEP_START("Open"),
    STEP_START_HINT("Pick up a recent plan, open one from a folder, or begin a new one."),
    STEP_PART("Part"),
    STEP_PART_HINT("The part and the characteristics the study must cover."),
    STEP_GOAL("Goal"),
    STEP_GOAL_HINT("What the study must show, and what you expect of the process."),
    STEP_SIZING("Sample size"),
    STEP_SIZING_HINT("How many subgroups of what size, and what each choice costs."),
    STEP_TIMING("Timing"),
    STEP_TIMING_HINT("When the subgroups are taken over the days and shifts of the span."),
    STEP_HANDOUT("Hand-out"),
    STEP_HANDOUT_HINT("Issue the plan and export the collection sheet and fill-in files."),
    STEP_GRADING("Grading"),
    STEP_GRADING_HINT("Check the returned readings against the plan and read the verdict."),

    MISSING_PREFIX("Before going on: %s"),
    READY("This step is complete."),
    NO_PLAN("open or start a plan"),
    DRAFT_SAVED("Draft kept in %s"),
    OPENED("Opened %s."),
    OPENING("Reading the plan file…"),
    OPEN_FAILED("The plan could not be opened: %s"),
    DRAFT_RESTORED("Unsaved changes from %s were restored."),
    DRAFT_FAILED("The draft could not be written: %s"),
    CLOSE_TITLE("Unsaved changes"),
    CLOSE_QUESTION("This plan has changes not yet saved into its plan file."),
    CLOSE_SAVE("Save the plan"),
    CLOSE_KEEP("Keep as a draft"),
    CLOSE_STAY("Stay"),
    CLOSE_NOT_SAVED("The plan was not saved and the window stays open: %s"),
    CLOSE_NO_FILE("no file was chosen"),
    CLOSE_SAVED("Saved into %s"),
    DIRTY_MARK("unsaved changes"),

    PART_NO_ROWS("add at least one characteristic"),
    PART_ROW_PROBLEM("row %d (%s): %s"),
    PART_ID_MISSING("give it an id"),
    PART_ID_REPEATED("the id %s is used twice"),
    PART_UNIT_MISSING("give the unit"),
    PART_UNIT_BAD("'%s' is not a unit (letters and symbols such as mm, N·m, %%)"),
    PART_NOT_A_NUMBER("%s '%s' is not a number"),
    PART_NO_LIMIT("give LSL, USL or both"),
    PART_LIMITS_ORDER("LSL %s must be below USL %s"),
    PART_OUTSIDE("%s %s lies outside the limits"),
    PART_GAUGE_UNNAMED("name the gauge that has this resolution"),
    PART_RESOLUTION_MISSING("give the smallest step gauge '%s' reads"),
    PART_RESOLUTION_BAD("the resolution must be a positive number, not '%s'"),
    PART_EXPECTED_BAD("expected index must be above zero"),
    PART_PLAN_ID_MISSING("give the plan an id"),
    PART_NAME_MISSING("name the part"),
    PART_IMPORTED("%d characteristics read from %s"),

    NUMBER_WRONG_MARK("'%s' has a decimal comma, and the decimal mark is set to a point (1.33): retype it, or choose the comma on the Open step"),
    DECIMAL_MARK_LABEL("Decimal mark in fields"),
    DECIMAL_MARK_NOT_KEPT("The decimal mark could not be kept for the next start: %s"),
    DECIMAL_MARK_LOCALE("this computer's language writes %s"),
    GOAL_MINIMUM_BAD("the required minimum must be a number above zero"),
    GOAL_CONFIDENCE_BAD("the confidence must be between 0.5 and 0.9999 (e.g. 0.95)"),
    GOAL_INDEX_SIDES("%s needs both limits, and %s has only one"),
    GOAL_EXPECTED_MISSING("give the expected %s for %s (in the Part table or here)"),
    GOAL_MEAN_SIGMA_BAD("give the expected mean and a sigma above zero"),
    GOAL_PILOT_MISSING("load the pilot readings"),
    GOAL_PILOT_READING("Reading %s …"),
    GOAL_DESIGNING_FOR("Designing for a true %s of %.3f%s"),
    GOAL_OFF_CENTRE(" (Cp %.3f, off centre, as the Part table's Expected Cp says)"),
    GOAL_CENTRED(" (centred; an off-centre Cp is typed in the Part table's Expected Cp column)"),
    GOAL_PILOT_BAD("the pilot readings could not be used: %s"),
    SIZING_KEPT("Kept from the plan file: %d subgroups of %d = %d readings, %s. The smallest k that reaches the "
            + "wanted power with this size is %d (power %s); pick a row to use it."),
    SIZING_POWER_AT("power %s"),
    SIZING_TOGETHER("All %d characteristics are measured on the same parts. At %d subgroups of %d, the chance that "
            + "each is demonstrated: %s; that all are, in the one study (taken as independent): %s."),
    SIZING_TOGETHER_SHORT(" Below the wanted power of %s: %s. The part's verdict needs every one: more subgroups, "
            + "or a study of their own."),
    SIZING_TOGETHER_LEFT_OUT(" Not counted (no expected index or no limits yet): %s."),
    SIZING_POWER_BETWEEN("power between %s and %s (read off the power curve)"),
    SIZING_POWER_UNKNOWN("power not computed for this k"),
    SIZING_GOAL_FIRST("complete the goal first"),
    SIZING_BUSY("the design table is being computed"),
    SIZING_FAILED("the design could not be computed: %s"),
    SIZING_RECOMMENDED_CHOSEN("Chosen: the recommended design, %d subgroups of %d (%d readings), power %.3f."),
    SIZING_OTHER_CHOSEN("Chosen: %d subgroups of %d = %d readings (%s against the recommended %d); "
            + "power %.3f against %.3f; chance of a false alarm (3σ rule) %s against %s."),
    TIMING_BUSY("the schedule is being worked out"),
    TIMING_NO_SCHEDULE("No schedule yet."),
    TIMING_IDS_LEFT_OUT("Slot ids left out where slots lie close together at this width: %d (every slot is on the sheet)."),
    TIMING_START_EMPTY("enter a start such as 2027-03-24 06:00"),
    TIMING_COUNT("the span needs a whole number of days or shifts, 1 or more"),
    TIMING_SEED("'%s' is not a whole number"),
    TIMING_ZONE("'%s' is not a time zone such as Europe/Berlin"),
    TIMING_KIND("'%s': the span is counted in days or shifts"),
    TIMING_DESIGN_FIRST("choose a design first"),
    TIMING_CALENDAR_BAD("the calendar does not hold together: check the shifts and breaks"),
    HANDOUT_EARLIER("complete the earlier steps first"),
    HANDOUT_ISSUE("issue the plan"),
    HANDOUT_NO_EXPECTATION("give the expected index for %s on the Part step"),
    HANDOUT_ISSUED("Issued as %s"),
    HANDOUT_CHANGED("Changed since %s was issued: issue it again to make revision %d"),
    HANDOUT_DRAFT("Draft of revision %d, not issued yet"),
    HANDOUT_ALREADY("This plan is already issued as %s."),
    HANDOUT_ISSUED_NOW("Issued as %s and saved to %s."),
    HANDOUT_ISSUING("Issuing the plan and writing %s …"),
    HANDOUT_ISSUED_ELSEWHERE("Issued as %s and saved to %s (another plan is open now)."),
    HANDOUT_ISSUE_FAILED("The plan could not be issued: %s"),
    HANDOUT_EXPORTED("Written to %s: %s, %s, %s"),
    HANDOUT_EXPORTED_DRAFT("Written to %s, marked DRAFT on every page (for review; issue the plan before collecting): %s, %s, %s"),
    HANDOUT_EXPORT("_Export PDF, CSV and XLSX"),
    HANDOUT_EXPORT_DRAFT("_Export the DRAFT sheet and files"),
    HANDOUT_NOT_SAVED("Not saved: no file was chosen."),
    HANDOUT_SAVED_AS("Saved as %s."),
    HANDOUT_SAVING("Writing %s …"),
    HANDOUT_SAVE_FAILED("The plan could not be saved: %s"),
    WORK_FOLDER("Your plans and drafts are kept in %s"),
    HANDOUT_NO_FOLDER("name the folder to write the files into"),
    HANDOUT_BAD_FOLDER("'%s' is not a folder name this system accepts"),
    HANDOUT_EXPORTING("Writing the sheet and fill-in files to %s …"),
    HANDOUT_EXPORT_FAILED("The files could not be written: %s"),
    HANDOUT_PREVIEW_FAILED("The preview could not be drawn: %s"),
    GRADING_ISSUE_FIRST("issue the plan on the Hand-out step first: returned data is graded against an issued plan"),
    GRADING_NO_FILE("name the returned file"),
    GRADING_NOT_FOUND("no such file: %s"),
    GRADING_FAILED("the file could not be graded: %s"),
    GRADING_NOTHING("grade a returned file first"),
    GRADING_REPORT("Report written to %s"),
    GRADING_REPORTING("Writing the report to %s …"),
    GRADING_REPORT_FAILED("The report could not be written: %s"),
    GRADING_DONE("%s graded: %s, %d problems listed"),
    GRADING_VERDICT("Verdict for plan %s, %s: %s"),
    GRADING_CHARACTERISTIC("%s %s: %s"),
    GRADING_MORE_SUBGROUPS("%s (about %d more subgroups would settle it: a planning figure)"),
    GRADING_NOT_REACHED("Not judged: %s; an earlier step decided the verdict."),
    GRADING_INDICES("All indices (normal model)"),
    GRADING_LOWER_HEAD("lower %.0f %% bound"),
    GRADING_HISTOGRAM("Histogram of the readings"),
    GRADING_HISTOGRAM_BARS("readings: %s"),
    GRADING_HISTOGRAM_CURVE("fitted %s model"),
    GRADING_READINGS_CHART("Readings against the limits"),
    GOAL_PILOT_SHOWN("%d pilot readings in %d subgroups: %s estimate %s, lower %d %% bound %s. The design uses the estimate; "
            + "the bound shows how uncertain a pilot is."),
    GOAL_EXPECTED_NOT_ABOVE("the expected %s (%.3f) must be above the required %.3f, or no study can show it");

    private final String english;

    AppMessage(String english) {
        this.english = english;
    }

    @Override
    public String english() {
        return english;
    }

    /**
     * The line for a background job that failed: the core's own words when it refused the job (a
     * {@link dev.proofrun.text.UserException}, a value turned down with an {@link IllegalArgumentException},
     * a file that could not be read or written), else this message with what went wrong.
     */
    public String failure(Throwable ex) {
        if (ex instanceof dev.proofrun.text.UserException || ex instanceof IllegalArgumentException
                || ex instanceof java.io.UncheckedIOException) {
            return ex.getMessage();
        }
        return format(String.valueOf(ex));
    }
}
