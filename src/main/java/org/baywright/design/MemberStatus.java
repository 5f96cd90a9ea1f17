package org.baywright.design;

/** The state of a member after a run. */
public enum MemberStatus {
    /** The lightest adequate section was found. */
    SIZED("sized"),
    /** The user chose the size; it was checked and passes. */
    FIXED_SIZE("fixed size"),
    /** No section passes, or a fixed size fails. */
    OVERSTRESSED("overstressed"),
    /** The member has no support to deliver its load to. */
    UNSUPPORTED("unsupported"),
    /** Not designed yet. */
    NOT_RUN("not run");

    private final String label;

    MemberStatus(String label) {
        this.label = label;
    }

    /** As printed: "sized", "fixed size"… */
    public String label() {
        return label;
    }
}
