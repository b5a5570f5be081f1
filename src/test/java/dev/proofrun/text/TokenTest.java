package dev.proofrun.text;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import dev.proofrun.app.session.ExpectationSource;
import dev.proofrun.control.ChartKind;
import dev.proofrun.control.ChartStatistic;
import dev.proofrun.control.RunRule;
import dev.proofrun.design.LimitedBy;
import dev.proofrun.design.Spending;
import dev.proofrun.grade.IndexMethod;
import dev.proofrun.grade.Severity;
import dev.proofrun.stats.ShapeFamily;
import dev.proofrun.grade.Step;
import dev.proofrun.grade.Verdict;
import dev.proofrun.plan.PlanState;
import dev.proofrun.schedule.Spacing;
import dev.proofrun.stats.BoundMethod;
import dev.proofrun.stats.IndexKind;
import dev.proofrun.stats.ShapeFamily;
import dev.proofrun.stats.SigmaMethod;
import java.util.Locale;
import org.junit.jupiter.api.Test;

/**
 * The one word rule of {@link Token} and the one refusal of {@link Tokens#parse}. The words are those the plan
 * files, the JSON and the command line have always written (pinned again, file by file, by {@code PlanFilesTest}
 * and {@code GoldenOutputTest}); here only the rule and its exceptions.
 */
class TokenTest {

    @Test
    void theWordIsTheNameInLowerCaseWithHyphens() {
        assertEquals("not-valid", Verdict.NOT_VALID.token());
        assertEquals("xbar-r", ChartKind.XBAR_R.token());
        assertEquals("kim-demets-2", Spending.KIM_DEMETS_2.token());
        assertEquals("two-of-three-outer", RunRule.TWO_OF_THREE_OUTER.token());
        assertEquals("folded-normal", ShapeFamily.FOLDED_NORMAL.token());
        assertEquals("lognormal3", ShapeFamily.LOGNORMAL3.token());
    }

    @Test
    void theExceptionsKeepTheirOwnWords() {
        assertEquals("mr", SigmaMethod.MOVING_RANGE.token());
        assertEquals("individuals-mr", ChartKind.INDIVIDUALS.token());
        assertEquals("sd", ChartStatistic.STANDARD_DEVIATION.token());
        assertEquals("moving-range", ChartStatistic.MOVING_RANGE.token());
        assertEquals("normal-theory", IndexMethod.NORMAL_THEORY.token());
        assertEquals("iso-22514-2-percentile", IndexMethod.PERCENTILE.token());
        assertEquals("iso-22514-2-percentile", IndexMethod.PERCENTILE_INVERTED.token(), "the model tells them apart");
    }

    @Test
    void everyWordNamesItsOwnConstant() {
        namesItsOwn(DecimalMark.class);
        namesItsOwn(BoundMethod.class);
        namesItsOwn(IndexKind.class);
        namesItsOwn(SigmaMethod.class);
        namesItsOwn(ShapeFamily.class);
        namesItsOwn(Spending.class);
        namesItsOwn(LimitedBy.class);
        namesItsOwn(ExpectationSource.class);
        namesItsOwn(PlanState.class);
        namesItsOwn(ChartKind.class);
        namesItsOwn(ChartStatistic.class);
        namesItsOwn(RunRule.class);
        namesItsOwn(Spacing.class);
        namesItsOwn(Verdict.class);
        namesItsOwn(Severity.class);
        namesItsOwn(ShapeFamily.class);
        namesItsOwn(IndexMethod.class);
        namesItsOwn(Step.class);
    }

    private static <E extends Enum<E> & Token> void namesItsOwn(Class<E> type) {
        for (E e : type.getEnumConstants()) {
            if (e != IndexMethod.PERCENTILE_INVERTED) { // shares the percentile's word on purpose
                assertEquals(e, Tokens.parse(type, "word", e.token().toUpperCase(Locale.ROOT)), type.getSimpleName() + " " + e.token());
            }
        }
    }

    @Test
    void aVerdictReadsAsItsWordWithACapital() {
        assertEquals("Demonstrated", Verdict.DEMONSTRATED.words());
        assertEquals("Not demonstrated", Verdict.NOT_DEMONSTRATED.words());
        assertEquals("Not valid", Verdict.NOT_VALID.words());
    }

    @Test
    void aWordIsReadInAnyCaseWithTheSpaceAroundItIgnored() {
        assertEquals(Spacing.RANDOM, Tokens.parse(Spacing.class, "spacing", " Random\t"));
        assertEquals(PlanState.ISSUED, PlanState.fromToken("ISSUED"));
        assertEquals(SigmaMethod.MOVING_RANGE, SigmaMethod.fromToken("MR"));
        assertEquals(ExpectationSource.MEAN_SIGMA, Tokens.find(ExpectationSource.class, "mean-sigma").orElseThrow());
    }

    @Test
    void anUnknownWordIsRefusedWithTheWordsThatAreKnown() {
        assertEquals("unknown spacing 'odd' (even or random)", refusal(Spacing.class, "spacing", " odd "));
        assertEquals("unknown sigma method 'rbr' (rbar, sbar, pooled or mr)", refusal(SigmaMethod.class, "sigma method", "rbr"));
        assertEquals("unknown method 'x' (normal-theory or iso-22514-2-percentile)", refusal(IndexMethod.class, "method", "x"),
                "a shared word is listed once");
        assertEquals("unknown plan state '' (draft or issued)", refusal(PlanState.class, "plan state", null));
        assertEquals("unknown spacing 'ev\\nen' (even or random)", refusal(Spacing.class, "spacing", "ev\nen"),
                "one line, whatever the file held");
    }

    private static <E extends Enum<E> & Token> String refusal(Class<E> type, String what, String text) {
        return assertThrows(IllegalArgumentException.class, () -> Tokens.parse(type, what, text)).getMessage();
    }
}
