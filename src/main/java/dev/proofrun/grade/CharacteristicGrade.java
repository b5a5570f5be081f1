package dev.proofrun.grade;

import dev.proofrun.design.Requirement;
import dev.proofrun.stats.SpecLimits;
import java.util.List;
import java.util.Objects;
import java.util.Optional;
import java.util.OptionalInt;

/**
 * Everything the grade found for one characteristic, in the order of the argument: completeness,
 * stability, shape, capability, then the verdict and its reasons.
 *
 * @param id                   the characteristic's id on the plan
 * @param name                 its name
 * @param unit                 its unit
 * @param limits               the plan's specification limits (never the file's)
 * @param requirement          the plan's requirement
 * @param completeness         what came back
 * @param subgroups            the graded (complete) subgroups, in time order
 * @param slots                the slot id of each graded subgroup
 * @param stability            the stability evidence, or {@code null} when fewer than 2 subgroups are usable
 * @param shape                the shape evidence, or {@code null} when fewer than 8 readings are usable
 * @param judged               the required index with its bounds, or {@code null} when not computable
 * @param capability           all indices on the readings' own scale (normal model) from
 *                             {@code capability.CapabilityAnalysis} — the same figures {@code estimate}
 *                             shows — or {@code null} with fewer than 2 usable subgroups or no spread
 * @param verdict              the verdict
 * @param reasons              the reasons, in the order of the steps
 * @param additionalSubgroups  for an inconclusive verdict: about how many more subgroups at the plan's
 *                             frequency would settle it (a planning figure; empty beyond ten times the study)
 * @param look                 the planned look this grade was made at, for a staged study; empty otherwise
 */
public record CharacteristicGrade(String id, String name, String unit, SpecLimits limits, Requirement requirement,
        Completeness completeness, List<double[]> subgroups, List<String> slots, Stability stability, Shape shape,
        IndexEvidence judged, dev.proofrun.capability.CapabilityResult capability, Verdict verdict, List<Reason> reasons, OptionalInt additionalSubgroups,
        Optional<GradedLook> look) {

    /** A grade of a single-stage study. */
    public CharacteristicGrade(String id, String name, String unit, SpecLimits limits, Requirement requirement,
            Completeness completeness, List<double[]> subgroups, List<String> slots, Stability stability, Shape shape,
            IndexEvidence judged, dev.proofrun.capability.CapabilityResult capability, Verdict verdict,
            List<Reason> reasons, OptionalInt additionalSubgroups) {
        this(id, name, unit, limits, requirement, completeness, subgroups, slots, stability, shape, judged, capability,
                verdict, reasons, additionalSubgroups, Optional.empty());
    }

    public CharacteristicGrade {
        Objects.requireNonNull(id, "id");
        Objects.requireNonNull(verdict, "verdict");
        subgroups = List.copyOf(subgroups);
        slots = List.copyOf(slots);
        reasons = List.copyOf(reasons);
        look = look == null ? Optional.empty() : look;
    }
}
