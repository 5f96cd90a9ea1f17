package org.baywright.plan;

/** The kinds of framing member on a floor. */
public enum MemberKind {
    /** Carries other members' reactions, usually on a grid line between columns. */
    GIRDER,
    /** Carries the deck, usually an infill beam within a bay. */
    BEAM
}
