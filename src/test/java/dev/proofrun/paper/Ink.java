package dev.proofrun.paper;

import java.awt.image.BufferedImage;

/** For tests that look at a rendered page: how much of it is printed. */
public final class Ink {

    private Ink() {
    }

    /** The pixels darker than mid-grey (the mean of red, green and blue below 128): the page's print. */
    public static long darkPixels(BufferedImage image) {
        long dark = 0;
        for (int y = 0; y < image.getHeight(); y++) {
            for (int x = 0; x < image.getWidth(); x++) {
                int rgb = image.getRGB(x, y);
                int grey = ((rgb >> 16 & 0xff) + (rgb >> 8 & 0xff) + (rgb & 0xff)) / 3;
                if (grey < 128) {
                    dark++;
                }
            }
        }
        return dark;
    }
}
