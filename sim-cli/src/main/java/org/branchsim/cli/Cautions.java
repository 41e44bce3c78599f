package org.branchsim.cli;

/** The safety cautions every report carries. */
public final class Cautions {

    /** One line for command footers. */
    public static final String SHORT = "simulation does not replace testing; stored pressure and energy hurt "
            + "people; follow ISO 4413, local codes and licensed practice.";

    /** The full text for reports. */
    public static final String FULL = String.join(System.lineSeparator(),
            "CAUTION",
            "- A simulation does not replace testing. Verify pressures, settings and timing on the machine.",
            "- Stored pressure and energy hurt people: accumulators, trapped volumes and loads hold energy after",
            "  the pump stops. Relieve pressure and secure loads before any work on a circuit.",
            "- Follow ISO 4413, local codes and licensed practice when designing, setting or servicing hydraulic",
            "  equipment.");

    private Cautions() {
    }
}
