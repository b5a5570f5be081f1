package dev.proofrun.app.shell;

import javafx.scene.text.Font;

/**
 * Sizes set in code, in multiples of the system font size (as the theme's em), so that the wizard grows
 * with a larger system font instead of clipping.
 */
public final class FontScale {

    private FontScale() {
    }

    /** {@code n} times the default font's size, in pixels (before any screen scale). */
    public static double of(double n) {
        return n * Font.getDefault().getSize();
    }
}
