package dev.proofrun.capability;

import dev.proofrun.text.MessageKey;

/** Messages of the capability analysis that people read. */
public enum CapabilityMessage implements MessageKey {
    TOO_FEW_READINGS("capability needs at least 2 readings, found %d"),
    NO_SPREAD("all readings are equal (%s): the spread cannot be estimated; is the gauge resolution too coarse?"),
    NO_WITHIN_SPREAD("there is no variation inside the subgroups (sigma within is 0): check the gauge resolution and the subgrouping"),
    SIGMA_METHOD_REFUSED("%s"),
    NOMINAL_OUTSIDE("the nominal %s lies outside the tolerance"),
    CONFIDENCE_OUT_OF_RANGE("confidence must lie between 0.5 and 0.9999, got %s");

    private final String english;

    CapabilityMessage(String english) {
        this.english = english;
    }

    @Override
    public String english() {
        return english;
    }
}
