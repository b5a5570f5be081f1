package dev.proofrun.report;

import dev.proofrun.grade.CharacteristicGrade;
import dev.proofrun.grade.IndexEvidence;
import dev.proofrun.grade.IndexMethod;
import dev.proofrun.stats.ShapeFamily;
import dev.proofrun.grade.Verdict;
import dev.proofrun.stats.Nonconforming;
import java.util.Locale;
import java.util.OptionalDouble;

/**
 * Nonconforming parts said once: what was counted, and how many the process may make at most, with the
 * confidence of the required index's lower bound — "At most 0.61 ppm outside the tolerance at 95 % confidence
 * (from the lower bound of Cpk, normal model); counted 0 of 125 readings outside."
 *
 * <p>The bound is {@link Nonconforming#upperPpm}: under the normal model, with normal-theory bounds, from the
 * required index's lower bound. Under a lognormal or Weibull shape the percentile index does not turn into a
 * fraction outside in this way, and a Cp or Pp requirement ignores centring: the sentence then gives the
 * count and the fitted model's expectation, and says that no bound is stated. A not-valid verdict states
 * the count only: a bound would be read as a statement about the process.
 */
final class NonconformingWords {

    private NonconformingWords() {
    }

    static String statement(CharacteristicGrade g) {
        long n = 0;
        for (double[] s : g.subgroups()) {
            n += s.length;
        }
        long outside = Nonconforming.observedOutside(g.limits(), g.subgroups());
        String counted = String.format(Locale.ROOT, "counted %d of %d readings outside the tolerance", outside, n);
        IndexEvidence e = g.judged();
        if (e == null || g.verdict() == Verdict.NOT_VALID) {
            return "Nonconforming parts: " + counted + "; no bound is stated for a study that cannot carry a "
                    + "capability statement.";
        }
        OptionalDouble bound = e.model() == ShapeFamily.NORMAL && e.method() == IndexMethod.NORMAL_THEORY
                ? Nonconforming.upperPpm(e.index(), g.limits(), e.lower()) : OptionalDouble.empty();
        String conf = ReportNumbers.fixed(e.confidence() * 100, 0);
        if (bound.isPresent()) {
            return String.format(Locale.ROOT, "Nonconforming parts: at most %s ppm outside the tolerance at %s %% "
                    + "confidence (from the lower bound of %s under the normal model); %s.",
                    ReportNumbers.ppm(bound.getAsDouble()), conf, e.index().symbol(), counted);
        }
        String expected = Double.isFinite(e.expectedPpm()) ? String.format(Locale.ROOT,
                "; about %s ppm expected under the fitted %s model", ReportNumbers.ppm(e.expectedPpm()), e.model().token()) : "";
        return String.format(Locale.ROOT, "Nonconforming parts: %s%s. No upper bound is stated: %s.", counted,
                expected, e.model() == ShapeFamily.NORMAL ? "the required " + e.index().symbol()
                        + " does not bound the fraction outside" : "under the " + e.model().token()
                        + " model the percentile index does not turn into a fraction outside");
    }
}
