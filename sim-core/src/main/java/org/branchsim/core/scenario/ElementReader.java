package org.branchsim.core.scenario;

import java.util.List;
import java.util.Map;
import org.branchsim.core.fluid.Fluid;
import org.branchsim.core.model.Element;
import org.branchsim.core.model.Node;

/** Reads the fields of one element type and builds the element. */
interface ElementReader {

    /** @return the names of the element's ports, in order */
    List<String> ports();

    /**
     * @param id element id
     * @param f the element's fields (ports already consumed)
     * @param nodes the element's port nodes by port name (all present and known)
     * @param fluid the scenario's fluid (some derived parameters depend on it)
     * @return the element, or null when a field had a problem (already recorded)
     */
    Element read(String id, Fields f, Map<String, Node> nodes, Fluid fluid);
}
