package org.baywright.takedown;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import org.baywright.plan.Column;
import org.baywright.plan.Floor;
import org.baywright.plan.Level;
import org.baywright.plan.Plan;
import org.baywright.plan.Problem;

/**
 * The first stage of a run: the plan's levels with the floor layout each uses and the columns present
 * there, and each distinct pair of layout and columns once, ready for design. A typical floor is
 * designed once for every level that uses it with the same columns.
 *
 * @param levels one per level of the plan, bottom first
 * @param floors the distinct layouts to design, in the order of the levels that first use them
 * @param problems no levels; a level naming a layout the plan does not have
 */
public record ExpandedPlan(List<LevelFloor> levels, List<FloorInput> floors, List<Problem> problems) {

    /**
     * A level and the layout designed for it.
     *
     * @param floor the index in {@link #floors()} of the layout with the columns present, or -1 when the
     *     level names an unknown layout
     * @param resultKey the key of the layout's members in the result: the layout id, or id@level when one
     *     layout is designed with different columns at different levels; null with no layout
     */
    public record LevelFloor(Level level, int floor, String resultKey) {
    }

    public ExpandedPlan {
        levels = List.copyOf(levels);
        floors = List.copyOf(floors);
        problems = List.copyOf(problems);
    }

    /** Expands a plan. */
    public static ExpandedPlan of(Plan plan) {
        List<Level> levels = plan.levels();
        List<Problem> problems = new ArrayList<>();
        if (levels.isEmpty()) {
            problems.add(Problem.error("no-levels", "/levels", "", "the plan has no levels, so nothing stands on the"
                    + " columns; add at least one level with a floor layout"));
        }
        List<Set<String>> present = columnsPresent(plan);
        Map<String, FloorInput> distinct = new LinkedHashMap<>();
        List<String> levelKeys = new ArrayList<>();
        for (int i = 0; i < levels.size(); i++) {
            Level lv = levels.get(i);
            Optional<Floor> f = plan.floor(lv.floor());
            if (f.isEmpty()) {
                problems.add(Problem.error("unknown-floor", "level " + lv.name(), lv.name(), "level " + lv.name()
                        + " refers to floor layout \"" + lv.floor() + "\", which the plan does not have"));
                levelKeys.add(null);
                continue;
            }
            String key = f.get().id() + "|" + String.join(",", present.get(i));
            Set<String> columns = present.get(i);
            distinct.computeIfAbsent(key, k -> FloorInput.of(plan, f.get(), columns));
            levelKeys.add(key);
        }
        return new ExpandedPlan(levelFloors(levels, levelKeys, distinct), List.copyOf(distinct.values()), problems);
    }

    /**
     * Each level with its layout and the layout's design.
     *
     * @param designs the design of each of {@link #floors()}, in the same order
     */
    public List<LevelDesign> withDesigns(List<FloorDesign> designs) {
        List<LevelDesign> out = new ArrayList<>();
        for (LevelFloor lf : levels) {
            out.add(lf.floor() < 0 ? new LevelDesign(lf.level(), null, null)
                    : new LevelDesign(lf.level(), floors.get(lf.floor()).floor(), designs.get(lf.floor())));
        }
        return out;
    }

    /** The columns present at each level: those whose top level is at or above it. */
    private static List<Set<String>> columnsPresent(Plan plan) {
        List<Level> levels = plan.levels();
        Map<String, Integer> levelIndex = new HashMap<>();
        for (int i = 0; i < levels.size(); i++) {
            levelIndex.put(levels.get(i).name(), i);
        }
        List<Set<String>> present = new ArrayList<>();
        for (int i = 0; i < levels.size(); i++) {
            Set<String> s = new LinkedHashSet<>();
            for (Column c : plan.columns()) {
                int top = c.topLevel() == null || c.topLevel().isEmpty() ? levels.size() - 1
                        : levelIndex.getOrDefault(c.topLevel(), levels.size() - 1);
                if (i <= top) {
                    s.add(c.id());
                }
            }
            present.add(s);
        }
        return present;
    }

    /** Each level with its layout and result key: the layout id, or id@level (the first level) when a layout runs with different columns. */
    private static List<LevelFloor> levelFloors(List<Level> levels, List<String> levelKeys, Map<String, FloorInput> distinct) {
        Map<String, Integer> perLayout = new HashMap<>();
        for (FloorInput f : distinct.values()) {
            perLayout.merge(f.floor().id(), 1, Integer::sum);
        }
        Map<String, String> resultKeys = new HashMap<>();
        Map<String, Integer> index = new HashMap<>();
        for (String key : distinct.keySet()) {
            index.put(key, index.size());
        }
        List<LevelFloor> out = new ArrayList<>();
        for (int i = 0; i < levels.size(); i++) {
            String key = levelKeys.get(i);
            if (key == null) {
                out.add(new LevelFloor(levels.get(i), -1, null));
                continue;
            }
            FloorInput in = distinct.get(key);
            String id = in.floor().id();
            String resultKey = resultKeys.computeIfAbsent(key, k -> perLayout.get(id) == 1 ? id
                    : id + "@" + levels.get(levelKeys.indexOf(k)).name());
            out.add(new LevelFloor(levels.get(i), index.get(key), resultKey));
        }
        return out;
    }
}
