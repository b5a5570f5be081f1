package dev.proofrun.grade;

import dev.proofrun.text.Token;

/** The steps of the argument, in the order the reasons are given; its {@link #token() token} is the word in JSON. */
public enum Step implements Token {
    /** Was the plan followed: every slot, every reading, on time. */
    COMPLETENESS,
    /** Was the process in statistical control during the study. */
    STABILITY,
    /** Is the distribution model fair. */
    SHAPE,
    /** Does the confidence bound reach the requirement. */
    CAPABILITY
}
