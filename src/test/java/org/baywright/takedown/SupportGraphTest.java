package org.baywright.takedown;

import static org.junit.jupiter.api.Assertions.assertAll;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Optional;
import org.baywright.plan.Column;
import org.baywright.plan.Floor;
import org.baywright.plan.Member;
import org.baywright.plan.MemberKind;
import org.baywright.plan.Point;
import org.baywright.plan.Polygon;
import org.baywright.plan.Problem;
import org.junit.jupiter.api.Test;

/** The support graph of a layout: what holds each member end, the order of design, loops and loose ends. */
class SupportGraphTest {
    private static Member member(String id, MemberKind kind, double x0, double y0, double x1, double y1) {
        return new Member(id, kind, new Point(x0, y0), new Point(x1, y1), Optional.empty());
    }

    private static Column column(String id, double x, double y) {
        return new Column(id, new Point(x, y), "", "", Optional.empty());
    }

    private static FloorInput input(List<Member> members, List<Column> columns) {
        Floor f = new Floor("f", "f", false, Polygon.rectangle(0, 0, 10, 10), List.of(), members, List.of(), List.of(), List.of(),
                List.of(), List.of());
        return new FloorInput(f, members, List.of(), columns);
    }

    @Test
    void aBeamIsDesignedBeforeTheGirderItBearsOn() {
        // girder G between columns at x = 0 and 10; beam B from the girder's midpoint to a column at (5, 8)
        SupportGraph g = SupportGraph.of(input(List.of(member("G", MemberKind.GIRDER, 0, 0, 10, 0),
                member("B", MemberKind.BEAM, 5, 0, 5, 8)), List.of(column("C1", 0, 0), column("C2", 10, 0), column("C3", 5, 8))));
        assertAll(
                () -> assertEquals(List.of("B", "G"), g.order()),
                () -> assertEquals("member G", g.ends().get("B").start().describe()),
                () -> assertEquals(5, g.ends().get("B").start().position(), 1e-12, "at mid-span of the girder"),
                () -> assertEquals("column C3", g.ends().get("B").end().describe()),
                () -> assertEquals("column C1", g.ends().get("G").start().describe()),
                () -> assertEquals(List.of(), g.problems()));
    }

    @Test
    void membersHoldingEachOtherUpAreALoopAndWhatTheyBearOnIsStillDesigned() {
        // A runs from column C1 to (4, 0), a point inside B; B runs from (2, 0), a point inside A, to (6, 0) on
        // girder G, which spans between columns C2 and C3
        List<Member> ms = List.of(member("A", MemberKind.BEAM, 0, 0, 4, 0), member("B", MemberKind.BEAM, 2, 0, 6, 0),
                member("G", MemberKind.GIRDER, 6, -3, 6, 3));
        SupportGraph g = SupportGraph.of(input(ms, List.of(column("C1", 0, 0), column("C2", 6, -3), column("C3", 6, 3))));
        assertAll(
                () -> assertEquals(List.of("A", "B"), g.inLoop()),
                () -> assertEquals(List.of("G"), g.order(), "the girder under the loop is designed with what reaches it"),
                () -> assertEquals(List.of("support-cycle", "support-cycle"), g.problems().stream().map(Problem::kind).toList()),
                () -> assertTrue(g.problems().get(0).message().contains("(A, B)"), g.problems().get(0).message()));
    }

    @Test
    void aZeroLengthMemberIsReportedAndLeftOut() {
        SupportGraph g = SupportGraph.of(input(List.of(member("Z", MemberKind.BEAM, 1, 1, 1, 1)), List.of()));
        assertAll(
                () -> assertEquals(List.of("zero-length-member"), g.problems().stream().map(Problem::kind).toList()),
                () -> assertTrue(g.ends().isEmpty()),
                () -> assertTrue(g.order().isEmpty()));
    }
}
