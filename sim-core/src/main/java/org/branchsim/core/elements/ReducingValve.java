package org.branchsim.core.elements;

/**
 * What the analysis needs to know of any pressure reducing valve, pilot-operated or direct-acting.
 */
public interface ReducingValve {

    /** @return element id */
    String id();

    /** @return the setting: outlet pressure at small demand with a free drain, Pa */
    double setting();

    /** @return name of the outlet pressure signal */
    String outletPressureSignal();

    /** @return name of the drain flow signal (pilot flow; zero-mean for a direct-acting valve) */
    String drainFlowSignal();

    /** @return name of the signal of power lost in the pilot stage and drain, W */
    String drainPowerSignal();

    /** @return name of the signal of power lost across the metering edge, W */
    String meteringPowerSignal();

    /** @return name of the main (inlet to outlet) flow signal */
    String mainFlowSignal();
}
