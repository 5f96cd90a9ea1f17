/**
 * Files: the plan file format ({@link org.baywright.io.PlanFiles}, {@code docs/plan-format.md}) and
 * JSON output. The only package that uses Jackson; everything it hands to the rest of Baywright is
 * plain model objects and located {@link org.baywright.plan.Problem}s.
 */
package org.baywright.io;
