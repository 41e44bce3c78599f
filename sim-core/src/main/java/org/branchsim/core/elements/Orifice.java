package org.branchsim.core.elements;

import java.util.List;
import org.branchsim.core.laws.OrificeLaw;
import org.branchsim.core.model.Binder;
import org.branchsim.core.model.Element;
import org.branchsim.core.model.EnergyAccount;
import org.branchsim.core.model.Evaluation;
import org.branchsim.core.model.Node;
import org.branchsim.core.model.SignalHandle;
import org.branchsim.core.units.Dimension;

/**
 * Fixed sharp-edged orifice between ports a and b, flow by {@link OrificeLaw}; positive from a to b.
 * Partials: dq/dp_a = -dq/dp_b = the law's slope.
 */
public final class Orifice implements Element {
    private final String id;
    private final Node a;
    private final Node b;
    private final double area;
    private final double cd;
    private double density;
    private double dpTransition;
    private SignalHandle q;
    private SignalHandle dpSignal;
    private EnergyAccount loss;

    /**
     * @param id element id
     * @param a port a
     * @param b port b
     * @param area flow area, m^2
     * @param cd discharge coefficient
     */
    public Orifice(String id, Node a, Node b, double area, double cd) {
        this.id = id;
        this.a = a;
        this.b = b;
        this.area = area;
        this.cd = cd;
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
        density = binder.fluid().density();
        dpTransition = OrificeLaw.roundHoleTransition(OrificeLaw.transitionConstant(cd, density,
                binder.fluid().kinematicViscosity()), area);
        q = binder.signal("q", Dimension.VOLUME_FLOW);
        dpSignal = binder.signal("dp", Dimension.PRESSURE);
        loss = binder.account("loss", EnergyAccount.Kind.LOSS);
    }

    @Override
    public boolean suppliesPartials() {
        return true;
    }

    @Override
    public void evaluate(Evaluation e) {
        double dp = e.pressure(a) - e.pressure(b);
        double flow = OrificeLaw.flow(cd, area, dp, density, dpTransition);
        if (e.partials()) {
            double slope = OrificeLaw.slope(cd, area, dp, density, dpTransition);
            e.flow(a, b, flow, slope, -slope);
        } else {
            e.flow(a, b, flow);
        }
        if (e.recording()) {
            e.signal(q, flow);
            e.signal(dpSignal, dp);
            e.power(loss, dp * flow);
        }
    }
}
