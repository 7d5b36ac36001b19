/**
 * Logged position traces: reading them and turning them into valve response metrics.
 *
 * <p>Technicians and data historians record the positioner input signal, the valve position and
 * often the controller output at a few samples per second. This package reads such traces
 * ({@link dev.positioner.trace.TraceCsvReader}, or any caller feeding
 * {@link dev.positioner.trace.Sample}s through a {@link dev.positioner.trace.SampleGate}) and
 * analyses them one sample at a time, in memory that does not grow with the trace length:
 *
 * <ul>
 *   <li>step response per detected input step, in the terms of ISA-75.25.01 (dead time, T63,
 *       T86, overshoot, settling time): {@link dev.positioner.trace.StepResponseAnalyser};</li>
 *   <li>dead band, hysteresis and linearity from slow ramps, in the terms of ISA-75.13.01 /
 *       IEC 61514 and ISA-51.1: {@link dev.positioner.trace.DeadBandAnalyser};</li>
 *   <li>oscillation with a steady input, by Hägglund's load-disturbance counting (T. Hägglund,
 *       "A control-loop performance monitor", Control Engineering Practice 3(11), 1995):
 *       {@link dev.positioner.trace.OscillationAnalyser};</li>
 *   <li>a stiction indication from the cross-correlation of controller output and process output
 *       (A. Horch, "A simple method for detection of stiction in control valves", Control
 *       Engineering Practice 7(10), 1999): {@link dev.positioner.trace.HorchStictionAnalyser}.</li>
 * </ul>
 *
 * <p>{@link dev.positioner.trace.TraceAnalyser} runs them all over one pass and returns a
 * {@link dev.positioner.trace.TraceAnalysis}; {@link dev.positioner.trace.TraceSvg} draws the
 * trace with the findings marked. Nothing here knows about HTTP: the REST layer calls in.
 */
package dev.positioner.trace;
