package org.baywright.report.drawing;

/** Which end reactions a drawing prints. */
public enum ReactionMode {
    /** Service reactions by load case: dead load and each live case present ({@code 12.3D+8.4L}). */
    SERVICE,
    /**
     * One reaction for the design method: the largest of the ASCE 7-16 gravity combinations of the plan's
     * method (LRFD §2.3.1, governing 1.2D + 1.6L on a floor; ASD §2.4.1, governing D + L).
     */
    FACTORED
}
