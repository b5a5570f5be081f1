package dev.proofrun.app.sizing;

import dev.proofrun.app.AppMessage;
import dev.proofrun.app.session.Background;
import dev.proofrun.design.Design;
import dev.proofrun.app.session.CharacteristicDraft;
import dev.proofrun.app.session.PlanDrafts;
import dev.proofrun.app.session.RowRequirement;
import dev.proofrun.design.DesignRequest;
import dev.proofrun.design.Expectation;
import dev.proofrun.design.Requirement;
import dev.proofrun.design.SharedDesign;
import dev.proofrun.design.SharedDesigner;
import dev.proofrun.design.StudyDesigner;
import dev.proofrun.app.session.CharacteristicField;
import dev.proofrun.app.session.LatestJob;
import dev.proofrun.stats.ShapeFamily;
import dev.proofrun.text.UserException;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.function.Function;
import javafx.beans.property.ObjectProperty;
import javafx.beans.property.SimpleObjectProperty;
import javafx.beans.property.SimpleStringProperty;
import javafx.beans.property.StringProperty;

/**
 * Every characteristic of the plan at once, measured on the same parts: each one's power at the chosen design
 * (with its own limits, requirement and expected index) and their product, and the one design for all of them
 * that {@code plan new} chooses ({@link SharedDesigner}: one n, k the largest any needs, the driver named).
 *
 * <p>A characteristic planned with a skewed shape is sized here with the normal model, as {@code plan new} and
 * {@code size --characteristics} size it, and the line says so: the percentile bound's power
 * ({@code design.ShapeSizing}) depends strongly on the expected skewness (see the decision record
 * {@code docs/decisions/sizing-step-per-characteristic.md}), which the plan does not keep.
 */
final class AllCharacteristics {

    private final LatestJob computing;
    private final StringProperty together = new SimpleStringProperty(this, "together", "");
    private final StringProperty sharedLine = new SimpleStringProperty(this, "sharedLine", "");
    private final ObjectProperty<SharedDesign> shared = new SimpleObjectProperty<>(this, "shared");
    private String driver = "";
    private Asked asked;
    private int askedN;
    private int askedK;

    AllCharacteristics(Background background) {
        this.computing = new LatestJob(background);
    }

    /** Each characteristic's power at the chosen design and their product; empty with one characteristic. */
    StringProperty together() {
        return together;
    }

    /** The line naming the one design for all characteristics and its driver; empty with one characteristic. */
    StringProperty sharedLine() {
        return sharedLine;
    }

    /** The one design for all characteristics, once worked out (null with one characteristic or before). */
    ObjectProperty<SharedDesign> shared() {
        return shared;
    }

    /** The id of the characteristic that needs the most subgroups in the shared design. */
    String driver() {
        return driver;
    }

    /**
     * Starts, on the worker, each characteristic's power at the chosen design and the one design for all; the
     * latest inputs win, and the shared design is not worked out again for the same characteristics.
     */
    void update(List<CharacteristicDraft> rows, Optional<Requirement> plan,
            Function<CharacteristicDraft, Optional<Expectation>> expectation, double power, Optional<Design> design) {
        if (design.isEmpty() || rows.size() < 2) {
            computing.forget(); // an answer still on its way must not fill the lines cleared here
            asked = null;
            together.set("");
            sharedLine.set("");
            shared.set(null);
            return;
        }
        Asked now = ask(rows, plan, expectation, power);
        int n = design.get().subgroupSize();
        int k = design.get().subgroups();
        boolean sameCharacteristics = now.equals(asked);
        if (sameCharacteristics && n == askedN && k == askedK) {
            return;
        }
        asked = now;
        askedN = n;
        askedK = k;
        if (!sameCharacteristics) {
            shared.set(null);
            sharedLine.set(now.requests().size() < 2 ? "" : SizingMessage.SHARED_BUSY.format());
        }
        SharedDesign known = shared.get();
        computing.submit(() -> {
            Powers powers = powers(now, n, k);
            SharedDesign all = known;
            String refused = "";
            if (all == null && now.requests().size() >= 2) {
                try {
                    all = shared(now);
                } catch (UserException | IllegalArgumentException e) {
                    refused = e.getMessage();
                }
            }
            return new Answer(powers, all, refused);
        }, answer -> {
            together.set(text(now, answer.powers()));
            driver = answer.shared() == null ? "" : now.ids().get(answer.shared().driver());
            shared.set(answer.shared());
            sharedLine.set(answer.shared() != null ? sharedText(now, answer.shared())
                    : answer.refused().isEmpty() ? "" : SizingMessage.SHARED_NONE.format(answer.refused()));
        }, ex -> {
            together.set("");
            sharedLine.set("");
        });
    }

    /** What one computation answers. */
    private record Answer(Powers powers, SharedDesign shared, String refused) {
    }

    /**
     * What is computed, from the rows as typed: one request per usable characteristic.
     *
     * @param shapes  the planned shape of each characteristic counted, in request order
     * @param floored the ids of those planned with a floor (no power is promised for them)
     */
    record Asked(double power, List<String> ids, List<DesignRequest> requests, List<String> leftOut,
            List<ShapeFamily> shapes, java.util.Set<String> floored) {
    }

    /** The powers at (n, k), in request order (NaN where the designer cannot evaluate one). */
    record Powers(int n, int k, double[] values) {
    }

    static Asked ask(List<CharacteristicDraft> rows, Optional<Requirement> plan,
            Function<CharacteristicDraft, Optional<Expectation>> expectation, double power) {
        List<String> ids = new ArrayList<>();
        List<DesignRequest> requests = new ArrayList<>();
        List<String> leftOut = new ArrayList<>();
        List<ShapeFamily> shapes = new ArrayList<>();
        java.util.Set<String> floored = new java.util.HashSet<>();
        for (CharacteristicDraft row : rows) {
            Optional<Expectation> e = expectation.apply(row);
            Optional<Requirement> r = RowRequirement.of(row, plan);
            if (e.isEmpty() || r.isEmpty() || row.limits().isEmpty()) {
                leftOut.add(row.id());
                continue;
            }
            try {
                requests.add(DesignRequest.of(row.limits().get().sides(), r.get(), e.get()).withPower(power));
                ids.add(row.id());
                shapes.add(shapeOrNormal(row));
                if (!row.text(CharacteristicField.FLOOR).isBlank()) {
                    floored.add(row.id());
                }
            } catch (UserException | IllegalArgumentException refused) {
                leftOut.add(row.id());
            }
        }
        return new Asked(power, List.copyOf(ids), List.copyOf(requests), List.copyOf(leftOut), List.copyOf(shapes),
                java.util.Set.copyOf(floored));
    }

    private static ShapeFamily shapeOrNormal(CharacteristicDraft row) {
        try {
            return PlanDrafts.shapeOf(row);
        } catch (IllegalArgumentException unknown) {
            return ShapeFamily.NORMAL; // the Part step marks the cell
        }
    }

    /** Each characteristic's power at k subgroups of n, as the core computes it (on the worker). */
    static Powers powers(Asked a, int n, int k) {
        double[] powers = new double[a.requests().size()];
        for (int i = 0; i < powers.length; i++) {
            try {
                powers[i] = StudyDesigner.power(a.requests().get(i), n, k);
            } catch (IllegalArgumentException | UserException outsideTheDesignersRange) {
                powers[i] = Double.NaN;
            }
        }
        return new Powers(n, k, powers);
    }

    /** The shared design of all characteristics with the fewest readings, as {@code plan new} picks it (on the worker). */
    static SharedDesign shared(Asked a) {
        return SharedDesigner.design(a.requests()).get(0);
    }

    /** The line for these powers: each characteristic's, their product, who falls short, who is not counted. */
    static String text(Asked a, Powers p) {
        double[] powers = p.values();
        if (powers.length == 0) {
            return "";
        }
        StringBuilder each = new StringBuilder();
        StringBuilder shortOf = new StringBuilder();
        double all = 1;
        for (int i = 0; i < powers.length; i++) {
            // a floor's power is not the normal model's figure and is not computed here: a dash, and not reached
            double power = a.floored().contains(a.ids().get(i)) ? Double.NaN : powers[i];
            each.append(i == 0 ? "" : ", ").append(a.ids().get(i)).append(' ').append(SizingViewModel.fmtOrDash(power));
            all *= power;
            if (!(power >= a.power())) {
                shortOf.append(shortOf.length() == 0 ? "" : ", ").append(a.ids().get(i));
            }
        }
        String line = AppMessage.SIZING_TOGETHER.format(powers.length + a.leftOut().size(), p.k(), p.n(), each,
                SizingViewModel.fmtOrDash(all));
        if (shortOf.length() > 0) {
            line += AppMessage.SIZING_TOGETHER_SHORT.format(SizingViewModel.fmt(a.power()), shortOf);
        }
        if (!a.leftOut().isEmpty()) {
            line += AppMessage.SIZING_TOGETHER_LEFT_OUT.format(String.join(", ", a.leftOut()));
        }
        return line + skewedNote(a);
    }

    /** The caution for characteristics planned with a skewed shape, empty when all are normal. */
    static String skewedNote(Asked a) {
        StringBuilder s = new StringBuilder();
        for (int i = 0; i < a.shapes().size(); i++) {
            ShapeFamily f = a.shapes().get(i);
            String id = a.ids().get(i);
            if (a.floored().contains(id)) {
                s.append(SizingMessage.SHAPE_FLOOR.format(id, f.token()));
            } else if (!f.isNormal()) {
                s.append(SizingMessage.SHAPE_NORMAL_MODEL.format(id, f.token(), f.token()));
            }
        }
        return s.toString();
    }

    /** The line naming the shared design and its driver. */
    static String sharedText(Asked a, SharedDesign d) {
        return SizingMessage.SHARED_LINE.format(a.ids().size(), d.subgroups(), d.subgroupSize(), d.readings(),
                a.ids().get(d.driver()));
    }
}
