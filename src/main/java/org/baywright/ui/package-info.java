/**
 * The desktop editor (JavaFX, the only package that uses it): the main window with its menus, tool bar
 * and panels, the plan canvas and its drawing tools with snapping, the Study panel, undo history,
 * autosave and recovery. Window state and panel logic live in view-models without controls (such as
 * {@code EditorModel} and {@code StudyPanelModel}), tested with plain JUnit; edits are plan-to-plan
 * functions from {@code plan.PlanEdits}, and every edit re-runs the plan through a {@code TaskRunner}.
 *
 * <p>Entry points: {@code Desktop.open(args)} (from the launcher), {@code BaywrightApp} (the JavaFX
 * application, {@code mvn javafx:run}). May depend on the engine, {@code io}, {@code report} and
 * {@code study}; never on {@code cli}, and nothing but the launcher depends on it.
 */
package org.baywright.ui;
