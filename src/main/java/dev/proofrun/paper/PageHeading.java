package dev.proofrun.paper;

import java.util.Objects;

/**
 * What every page of a document carries: a title and subtitle at the top left, an identity at the top
 * right (for a plan: its id and revision fingerprint), a footnote at the bottom left and "page x of y"
 * at the bottom right; optionally the word DRAFT across the page.
 *
 * @param title    top left, bold (for a plan: the part)
 * @param subtitle top left, second line (what the document is)
 * @param identity top right, bold (plan id and revision)
 * @param footnote bottom left, small
 * @param draft    whether DRAFT is printed across every page
 */
public record PageHeading(String title, String subtitle, String identity, String footnote, boolean draft) {

    public PageHeading {
        Objects.requireNonNull(title, "title");
        Objects.requireNonNull(subtitle, "subtitle");
        Objects.requireNonNull(identity, "identity");
        Objects.requireNonNull(footnote, "footnote");
    }
}
