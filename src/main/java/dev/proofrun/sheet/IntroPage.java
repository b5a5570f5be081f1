package dev.proofrun.sheet;

import dev.proofrun.plan.Characteristic;
import dev.proofrun.plan.StudyPlan;
import dev.proofrun.schedule.Slot;
import dev.proofrun.paper.Block;
import dev.proofrun.paper.Flow;
import dev.proofrun.paper.Framed;
import dev.proofrun.paper.Item;
import dev.proofrun.paper.Pages;
import dev.proofrun.paper.Paragraph;
import dev.proofrun.paper.LineStyle;
import dev.proofrun.paper.TextTable;
import dev.proofrun.paper.TextTable.Column;
import dev.proofrun.paper.Typeface;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/**
 * The opening pages of the collection sheet, in the order a collector reads them: what this is, what to
 * measure, how often, how to collect, what the study can and cannot show, and who signs.
 */
final class IntroPage {

    private static final float BODY = 9f;
    private static final float HEAD = 11f;

    private final StudyPlan plan;
    private final Typeface regular;
    private final Typeface bold;

    IntroPage(StudyPlan plan, Pages pages) {
        this.plan = plan;
        this.regular = pages.regular();
        this.bold = pages.bold();
    }

    void place(Flow flow, boolean draft) {
        flow.place(Paragraph.of("Collection plan", bold, 16));
        flow.gap(4);
        String partLine = "Part: " + plan.part().name()
                + (plan.part().number().isBlank() ? "" : "   No. " + plan.part().number())
                + (plan.part().revision().isBlank() ? "" : "   Rev. " + plan.part().revision());
        flow.place(Paragraph.of(partLine, bold, 10));
        String state = plan.isIssued() ? ", issued as " + plan.revisionWords()
                : " (" + plan.revisionWords() + ": not issued; readings collected against a draft cannot be graded)";
        flow.place(Paragraph.of("Plan " + plan.id() + state, regular, BODY));
        // one line each: set side by side, a long name ran into the next label ("...quality To be collected by")
        flow.place(Paragraph.of("Prepared by: " + orDash(plan.people().author()), regular, BODY));
        flow.place(Paragraph.of("To be collected by: " + orDash(plan.people().collector()), regular, BODY));
        if (draft && !plan.isIssued()) {
            flow.gap(2);
            flow.place(Paragraph.of("This sheet is marked DRAFT. Use it to review the plan, not to collect data.",
                    bold, BODY));
        }

        TextTable table = characteristicTable();
        flow.gap(8);
        flow.placeTogether(List.of(Paragraph.of("What to measure", bold, HEAD), Block.space(3)));
        flow.startTable(table.header());
        for (Characteristic c : plan.characteristics()) {
            int d = SheetNumbers.decimals(c);
            flow.place(table.row(c.id(), c.name(), c.unit(), SheetNumbers.number(c.nominal(), d), SheetNumbers.tolerance(c),
                    c.gauge().map(g -> g.name()).orElse("not named"), SheetNumbers.resolution(c)));
        }
        flow.endTable();

        List<Slot> slots = plan.schedule().slots();
        Slot first = slots.get(0);
        Slot last = slots.get(slots.size() - 1);
        int n = plan.design().subgroupSize();
        String often = String.format(Locale.ROOT,
                "Subgroup: %s at every slot. %s. %d slots, from %s %s %s to %s %s %s (times in %s).",
                n == 1 ? "1 part" : n + " consecutive parts", capitalised(plan.summary()), slots.size(),
                first.id(), SheetNumbers.DAY.format(first.start()), SheetNumbers.CLOCK.format(first.start()), last.id(),
                SheetNumbers.DAY.format(last.start()), SheetNumbers.CLOCK.format(last.start()), plan.calendar().zone().getId());
        section(flow, "How often", List.of(Paragraph.of(often, regular, BODY)));
        plan.stages().filter(st -> st.staged()).ifPresent(st -> {
            String ends = st.looks().subList(0, st.count() - 1).stream()
                    .map(l -> slots.get(l.subgroups() - 1).id()).collect(java.util.stream.Collectors.joining(", "));
            section(flow, "Stages", List.of(Paragraph.of(SheetWording.stagesIntro(st.count(), ends), regular, BODY)));
        });

        List<Block> items = new ArrayList<>();
        List<String> steps = SheetWording.instructions(n);
        for (int i = 0; i < steps.size(); i++) {
            items.add(new Item((i + 1) + ".", new Paragraph(steps.get(i), regular, BODY, 1.3f, 0), 14));
            items.add(Block.space(1));
        }
        flow.gap(8);
        flow.placeTogether(List.of(Paragraph.of("How to collect", bold, HEAD), Block.space(3), items.get(0)));
        for (Block b : items.subList(1, items.size())) {
            flow.place(b);
        }

        flow.gap(8);
        List<Block> caution = new ArrayList<>();
        caution.add(Paragraph.of("What a capability study shows, and what it does not", bold, BODY));
        caution.add(Block.space(2));
        for (String line : SheetWording.CAUTION) {
            caution.add(Paragraph.of(line, regular, BODY));
            caution.add(Block.space(2));
        }
        flow.place(new Framed(caution, 6f, LineStyle.RULE, 1f));

        flow.gap(8);
        TextTable sign = TextTable.of(List.of(Column.left("Who", 3), Column.left("Name", 3),
                Column.left("Signature", 3), Column.left("Date", 2)), regular, bold, BODY);
        List<Block> signing = new ArrayList<>(List.of(Paragraph.of("Signatures", bold, HEAD), Block.space(3),
                sign.header()));
        for (String who : List.of("Plan prepared by", "Plan received by (collector)", "Readings returned by",
                "Readings checked by")) {
            signing.add(sign.row(24f, List.of(who, "", "", "")));
        }
        flow.placeTogether(signing);
    }

    private TextTable characteristicTable() {
        return TextTable.of(List.of(Column.left("Id", 1.1f), Column.left("Characteristic", 3f),
                Column.left("Unit", 0.9f), Column.right("Nominal", 1.4f), Column.left("Tolerance", 2.4f),
                Column.left("Gauge", 2.4f), Column.right("Resolution", 1.4f)), regular, bold, BODY - 0.5f);
    }

    /** A heading kept with the first block under it; the rest flows. */
    private void section(Flow flow, String title, List<Block> body) {
        flow.gap(8);
        flow.placeTogether(List.of(Paragraph.of(title, bold, HEAD), Block.space(3), body.get(0)));
        for (Block b : body.subList(1, body.size())) {
            flow.place(b);
        }
    }

    private static String orDash(String s) {
        return s == null || s.isBlank() ? "\u2014" : s;
    }

    private static String capitalised(String s) {
        return s.isEmpty() ? s : Character.toUpperCase(s.charAt(0)) + s.substring(1);
    }
}
