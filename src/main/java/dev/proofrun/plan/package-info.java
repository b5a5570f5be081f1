/**
 * The study plan and its file (format {@code proofrun-plan}, version 1).
 *
 * <ul>
 * <li>{@code StudyPlan} (part, people, characteristics, calendar, span, design, spacing, seed, schedule,
 * state, revision, supersedes); {@code reference()} is {@code id@revision} as the fill-in files carry it.
 * One design per plan: {@code PlanDesign.choose} takes a given n and k as they are, else solves with
 * {@code design.SharedDesigner} (the n with the fewest readings wins).</li>
 * <li>The file: JSON, UTF-8, two-space indent, LF; property order fixed by the records in {@code PlanJson},
 * converted by {@code PlanCodec}. {@code PlanFiles.read} checks format and version, refuses unknown fields and
 * coercion, and turns any problem into one line with the JSON path ({@code JsonPaths}). Round trip
 * file → model → file is byte-identical. Saving: temporary file, force to disk, the old file to
 * {@code NAME.bak}, atomic move.</li>
 * <li>States: DRAFT → ISSUED by {@code PlanFiles.issue}. The revision is the first 12 hex digits of SHA-256
 * over {@code PlanFiles.canonical(plan)} (state and revision left out). An issued file whose content no longer
 * gives its revision was edited: {@code read} refuses it, {@code inspect} reports it. Changing an issued plan
 * makes a new revision that {@code supersedes} the old one, numbered one more ({@code revisionNumber}: 1, 2, 3…, the
 * revision as people say it beside the fingerprint; left out of the file when 1, so plans written before it
 * keep their bytes and fingerprint; covered by the fingerprint when written). {@code fingerprint} streams the canonical bytes
 * into the digest as they are written (a 200,000-slot plan is about 20 MB of them, never held whole);
 * {@code PlanReadingTest} checks them against the form re-made from the saved file as a plain JSON tree, on
 * 120 generated plans and the demo.</li>
 * <li>{@code OffsetTimes} reads slot times by fixed positions (equal to {@code OffsetDateTime.parse}, else it
 * calls it); {@code CharacteristicsCsv} reads the {@code --characteristics} columns; {@code DemoPlan} is the
 * demo plan saved in {@code plans/demo-valve-body.json} ({@code DemoPlanTest} fails when they differ;
 * regenerate with {@code -Dproofrun.writeDemo=true}).</li>
 * </ul>
 */
package dev.proofrun.plan;
