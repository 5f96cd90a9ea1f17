package org.baywright.design;

import org.baywright.catalog.Section;

/** A lighter section the search tried and rejected, with the check that failed it worst. */
public record Rejection(Section section, Check governing) {
}
