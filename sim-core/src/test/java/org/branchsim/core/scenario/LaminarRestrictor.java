package org.branchsim.core.scenario;

import java.util.List;
import org.branchsim.core.model.Binder;
import org.branchsim.core.model.Element;
import org.branchsim.core.model.EnergyAccount;
import org.branchsim.core.model.Evaluation;
import org.branchsim.core.model.Node;
import org.branchsim.core.model.SignalHandle;
import org.branchsim.core.units.Dimension;

/**
 * A toy element for the descriptor test: a fixed laminar restrictor (a capillary tube) between ports a and b,
 * q = G (p_a - p_b) with the Hagen-Poiseuille conductance G = pi d^4 / (128 mu L) (F. M. White, Fluid Mechanics,
 * 7th ed. 2011, section 6.9, from memory), mu = rho nu of the scenario's fluid. Positive from a to b, m^3/s.
 */
final class LaminarRestrictor implements Element {

    /** The element's descriptor: the only other thing branchsim needs to read it from a scenario. */
    static final ElementDescriptor<LaminarRestrictor> DESCRIPTOR = ElementDescriptor.of("laminarRestrictor",
            "fixed laminar restrictor (capillary tube)", List.of("a", "b"),
            BlockSpec.of("laminarRestrictor",
                    FieldSpec.positive("diameter", Dimension.LENGTH).meaning("bore of the capillary"),
                    FieldSpec.positive("length", Dimension.LENGTH).meaning("length of the capillary")),
            (id, r, ports, fluid) -> new LaminarRestrictor(id, ports.get("a"), ports.get("b"), r.si("diameter"),
                    r.si("length")));

    private final String id;
    private final Node a;
    private final Node b;
    private final double diameter;
    private final double length;
    private double conductance;
    private SignalHandle q;
    private EnergyAccount loss;

    LaminarRestrictor(String id, Node a, Node b, double diameter, double length) {
        this.id = id;
        this.a = a;
        this.b = b;
        this.diameter = diameter;
        this.length = length;
    }

    /** @return the Hagen-Poiseuille conductance for a dynamic viscosity, m^3/(s*Pa) */
    static double conductance(double diameter, double length, double dynamicViscosity) {
        return Math.PI * Math.pow(diameter, 4) / (128.0 * dynamicViscosity * length);
    }

    @Override
    public String id() {
        return id;
    }

    @Override
    public List<Node> ports() {
        return List.of(a, b);
    }

    @Override
    public void bind(Binder binder) {
        conductance = conductance(diameter, length, binder.fluid().density() * binder.fluid().kinematicViscosity());
        q = binder.signal("q", Dimension.VOLUME_FLOW);
        loss = binder.account("loss", EnergyAccount.Kind.LOSS);
    }

    @Override
    public void evaluate(Evaluation e) {
        double dp = e.pressure(a) - e.pressure(b);
        double flow = conductance * dp;
        e.flow(a, b, flow);
        if (e.recording()) {
            e.signal(q, flow);
            e.power(loss, dp * flow);
        }
    }
}
