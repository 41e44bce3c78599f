package org.branchsim.core.elements;

import java.util.List;
import org.branchsim.core.laws.OrificeLaw;
import org.branchsim.core.model.Binder;
import org.branchsim.core.model.Element;
import org.branchsim.core.model.EnergyAccount;
import org.branchsim.core.model.Evaluation;
import org.branchsim.core.model.Node;
import org.branchsim.core.model.ScheduledInput;
import org.branchsim.core.model.SignalHandle;
import org.branchsim.core.units.Dimension;

/**
 * One metering path of a directional control valve (P to A, B to T, ...) whose opening follows a schedule:
 * A = u(t) A_max with u from 0 (closed) to 1 (fully open), flow by {@link OrificeLaw}, positive from a to b.
 * The hydraulic diameter of the opening is taken as that of a round hole of the same area. The opening follows
 * time only, so the flow's partials are dq/dp_a = -dq/dp_b = the law's slope.
 */
public final class MeteringPath implements Element {
    private final String id;
    private final Node a;
    private final Node b;
    private final double maxArea;
    private final double cd;
    private final ScheduledInput opening;
    private double density;
    private double transitionConstant;
    private SignalHandle q;
    private SignalHandle openingSignal;
    private EnergyAccount loss;

    /**
     * @param id element id
     * @param a port a
     * @param b port b
     * @param maxArea fully open flow area, m^2
     * @param cd discharge coefficient
     * @param initialOpening opening at t = 0, 0..1
     */
    public MeteringPath(String id, Node a, Node b, double maxArea, double cd, double initialOpening) {
        this.id = id;
        this.a = a;
        this.b = b;
        this.maxArea = maxArea;
        this.cd = cd;
        this.opening = new ScheduledInput(id + ".opening", Dimension.DIMENSIONLESS, initialOpening);
    }

    /** @return the opening schedule, 0..1 */
    public ScheduledInput opening() {
        return opening;
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
        binder.input(opening);
        density = binder.fluid().density();
        transitionConstant = OrificeLaw.transitionConstant(cd, density, binder.fluid().kinematicViscosity());
        q = binder.signal("q", Dimension.VOLUME_FLOW);
        openingSignal = binder.signal("opening", Dimension.DIMENSIONLESS);
        loss = binder.account("loss", EnergyAccount.Kind.LOSS);
    }

    @Override
    public boolean suppliesPartials() {
        return true;
    }

    @Override
    public void evaluate(Evaluation e) {
        double u = Math.max(0.0, Math.min(1.0, e.input(opening)));
        double area = u * maxArea;
        double dp = e.pressure(a) - e.pressure(b);
        double flow = 0.0;
        double slope = 0.0;
        if (area > 0.0) {
            double dpT = OrificeLaw.roundHoleTransition(transitionConstant, area);
            flow = OrificeLaw.flow(cd, area, dp, density, dpT);
            if (e.partials()) {
                slope = OrificeLaw.slope(cd, area, dp, density, dpT);
            }
        }
        e.flow(a, b, flow, slope, -slope);
        if (e.recording()) {
            e.signal(q, flow);
            e.signal(openingSignal, u);
            e.power(loss, dp * flow);
        }
    }
}
