package org.branchsim.core.scenario;

import java.nio.file.Path;
import java.util.Map;
import org.branchsim.core.fluid.Fluid;
import org.branchsim.core.model.CircuitModel;
import org.branchsim.core.settings.SolverSettings;

/**
 * Turns a scenario document into a checked {@link Scenario}: reads the head fields, then each section by its
 * reader (fluid, network of nodes and elements, schedule, solver, outputs), every value checked by the
 * descriptors and converted to SI, and reports every problem at once with file, line, column and field path.
 * The circuit is built once everything it holds is read (schedules included) and is not changed afterwards.
 * The format is described in docs/scenario-format.md.
 */
public final class ScenarioLoader {

    private ScenarioLoader() {
    }

    /** Reads, checks and builds a scenario file. */
    public static Scenario load(Path file) {
        return build(file.toString(), DocumentParser.parse(file));
    }

    /**
     * Builds a scenario from an already parsed document (a sweep variant, say).
     *
     * @param fileName name for messages
     * @param document the document root
     * @return the scenario
     * @throws org.branchsim.core.error.BranchsimException SCENARIO_INVALID listing every problem
     */
    public static Scenario build(String fileName, Located document) {
        return build(fileName, document, ElementCatalog.standard());
    }

    /**
     * Builds a scenario whose elements may be of the types of another catalogue (one with a toy element).
     *
     * @param fileName name for messages
     * @param document the document root
     * @param catalog the element types the document may use
     * @return the scenario
     * @throws org.branchsim.core.error.BranchsimException SCENARIO_INVALID listing every problem
     */
    public static Scenario build(String fileName, Located document, ElementCatalog catalog) {
        Problems problems = new Problems(fileName);
        problems.preferUnits(OutputsSection.declaredUnits(document));
        Fields root = Fields.of(document, "", problems);
        Reading head = BlockReader.read(root, ScenarioFormat.HEAD);
        String name = head.text("name");
        Fluid fluid = FluidSection.read(root);
        NetworkSection.Network network = NetworkSection.read(root, fluid, catalog, problems);
        boolean wired = problems.isEmpty();
        ScheduleSection.read(root, wired ? network.inputs() : Map.of(), wired, problems);
        CircuitModel circuit = wired ? network.build(name == null ? "scenario" : name, fluid) : null;
        SolverSettings solver = SolverSection.read(root, circuit);
        OutputsSection.Outputs outputs = OutputsSection.read(root, circuit, solver);
        root.finish();
        problems.throwIfAny();
        return new Scenario(name, head.text("description"), fileName, circuit, solver, outputs.units(), outputs.plots(),
                outputs.metricsFrom(), outputs.metricsTo(), document, problems.notes());
    }
}
