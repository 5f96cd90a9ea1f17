package org.baywright.report.pdf;

import java.util.ArrayList;
import java.util.List;
import org.apache.pdfbox.pdmodel.PDPage;
import org.baywright.design.Steel;
import org.baywright.load.DesignMethod;
import org.baywright.run.DesignBasis;
import org.baywright.run.RunResult;
import org.baywright.units.UnitSystem;

/** What the page writers share: the run, the options, the page flow and the contents being collected. */
final class Context {
    /** A contents entry and the page it starts on. */
    record Mark(int level, String title, String detail, PDPage page) {
    }

    final RunResult run;
    final PackageOptions options;
    final UnitSystem us;
    final PageFlow flow;
    final List<Mark> marks = new ArrayList<>();
    private int part;

    Context(RunResult run, PackageOptions options, PageFlow flow) {
        this.run = run;
        this.options = options;
        this.us = options.units();
        this.flow = flow;
    }

    /** Starts a numbered part on a new page: "3 Takedown summary". Returns its number. */
    int part(String title) {
        part++;
        String t = part + " " + title;
        flow.heading1(t);
        marks.add(new Mark(0, t, "", flow.page()));
        return part;
    }

    /** Records a level-1 contents entry at the current page. */
    void mark(String title, String detail) {
        marks.add(new Mark(1, title, detail, flow.page()));
    }

    /** The project name: the options' or else the plan's. */
    String projectName() {
        String n = options.project().name();
        return n.isEmpty() ? run.plan().name() : n;
    }

    /** The run's design basis. */
    DesignBasis basis() {
        return run.basis();
    }

    /** The design method the run used. */
    DesignMethod method() {
        return run.basis().method();
    }

    /** The steel the run designed with. */
    Steel steel() {
        return run.basis().steel();
    }
}
