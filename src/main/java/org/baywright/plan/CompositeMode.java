package org.baywright.plan;

/** Whether the members of a floor act with its slab (AISC 360-16 Chapter I). */
public enum CompositeMode {
    /** Every member under a slab on deck is composite, except members marked not composite. */
    COMPOSITE,
    /** Bare steel throughout (members' own marks are kept but not used): the comparison case. */
    NON_COMPOSITE,
    /** Only the members marked composite are. */
    PER_MEMBER
}
