package dev.proofrun.app.part;

import dev.proofrun.app.session.CharacteristicField;
import java.util.Optional;

/** The characteristics table's column headers and their tooltips. */
public final class PartHeaders {

    private PartHeaders() {
    }

    /** What a column header's tooltip says beyond its title, where it needs saying. */
    public static Optional<String> headerTip(CharacteristicField f) {
        return switch (f) {
            case INDEX, TARGET, CONFIDENCE -> Optional.of(PartMessage.REQUIREMENT_TIP.format(PartViewModel.label(f)));
            case EXPECTED_CP -> Optional.of(PartMessage.EXPECTED_CP_TIP.format());
            case EXPECTED -> Optional.of(PartMessage.EXPECTED_TIP.format());
            case THRESHOLD -> Optional.of(PartMessage.THRESHOLD_TIP.format());
            case FLOOR -> Optional.of(PartMessage.FLOOR_TIP.format());
            default -> Optional.empty();
        };
    }

    /** The column header: the title, on two lines where it is long (the title stays one line in messages). */
    public static String header(CharacteristicField f) {
        return switch (f) {
            case TARGET -> "c₀";
            case CONFIDENCE -> "Conf.";
            case EXPECTED -> "Expected\nindex";
            case EXPECTED_CP -> "Expected\nCp";
            case RESOLUTION -> "Reso-\nlution";
            case THRESHOLD -> "Thres-\nhold";
            default -> PartViewModel.label(f);
        };
    }
}
