package dev.proofrun.app.session;

/**
 * The columns of one characteristic as the wizard edits it, in the order of the import list
 * {@code id,name,unit,nominal,lsl,usl,target,expected,shape,gauge,resolution} (the header names are the lower-case names).
 * {@link #SHAPE} is the planned shape ({@code normal}, {@code lognormal}, {@code weibull}; blank is normal);
 * {@link #GAUGE} and {@link #RESOLUTION} name the measuring instrument and the smallest step it reads (both
 * blank: no gauge in the plan).
 */
public enum CharacteristicField {
    ID, NAME, UNIT, NOMINAL, LSL, USL, TARGET, EXPECTED, SHAPE, GAUGE, RESOLUTION;

    /** The column header of the import list. */
    public String header() {
        return name().toLowerCase(java.util.Locale.ROOT);
    }
}
