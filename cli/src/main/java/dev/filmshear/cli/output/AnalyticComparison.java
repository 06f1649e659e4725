package dev.filmshear.cli.output;

import com.fasterxml.jackson.databind.node.ObjectNode;

/**
 * A run compared with the closed-form solution of its family: placeholder until the analytic family
 * matcher is wired in.
 */
public interface AnalyticComparison {

    /** True when the closed form holds at time {@code t}. */
    boolean appliesAt(double t);

    /** The closed-form velocity at the nodes {@code y} at time {@code t}. */
    double[] velocityProfile(double t, double[] y);

    /** Adds the comparison to the summary. */
    void addTo(ObjectNode node);
}
