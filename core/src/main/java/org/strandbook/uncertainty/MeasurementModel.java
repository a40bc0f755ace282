package org.strandbook.uncertainty;

/** Y = f(X₁, …, X_N): one output value from one draw of every input, in input order. */
@FunctionalInterface
public interface MeasurementModel {

    double value(double[] inputs);
}
