package dev.proofrun.design;

/**
 * The stability side with all eight run rules, by seeded simulation with {@code control.RunRules}.
 * INTERIM: control.RunRules has not landed yet; until it does these return NaN (shown as "not yet").
 */
final class RuleRisks {

    private RuleRisks() {
    }

    static double falseAlarm(int subgroups) {
        return Double.NaN;
    }

    static double detection(int subgroups, int subgroupSize, double shift) {
        return Double.NaN;
    }
}
