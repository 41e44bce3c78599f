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
    default String outletPressureSignal() {
        return id() + ".p.out";
    }

    /** @return name of the drain flow signal (pilot flow; zero-mean for a direct-acting valve) */
    default String drainFlowSignal() {
        return id() + ".drain.q";
    }

    /** @return name of the signal of power lost in the pilot stage and drain, W */
    default String drainPowerSignal() {
        return id() + ".drain.power";
    }

    /** @return name of the signal of power lost across the metering edge, W */
    default String meteringPowerSignal() {
        return id() + ".metering.power";
    }

    /** @return name of the main (inlet to outlet) flow signal */
    default String mainFlowSignal() {
        return id() + ".q";
    }

    /** @return the outlet pressure signal of the circuit's first reducing valve, if it has one */
    static java.util.Optional<String> firstOutletSignal(org.branchsim.core.model.CircuitModel circuit) {
        return circuit.elements().stream().filter(e -> e instanceof ReducingValve)
                .map(e -> ((ReducingValve) e).outletPressureSignal()).findFirst();
    }
}
