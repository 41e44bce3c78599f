package org.branchsim.core.elements;

import java.util.List;
import org.branchsim.core.laws.OrificeLaw;
import org.branchsim.core.model.Binder;
import org.branchsim.core.model.Element;
import org.branchsim.core.model.EnergyAccount;
import org.branchsim.core.model.Evaluation;
import org.branchsim.core.model.Node;
import org.branchsim.core.model.SignalHandle;
import org.branchsim.core.parts.Corner;
import org.branchsim.core.units.Dimension;

/**
 * Check valve from inlet to outlet, quasi-static: the poppet's inertia is neglected, so its opening follows
 * the pressure difference: closed and tight on its seat below the cracking pressure, opening in proportion
 * to (dp - p_crack) until fully open at p_crack + dp_full. Cracking and full opening are events (corners
 * of the area curve). Reverse flow is blocked (the seat is tight). Partials: dq/d(dp) is the
 * law's slope plus, while opening, (q/A + dq/d(dp_t) (-dp_t/A)) A_max / dp_full.
 */
public final class CheckValve implements Element {
    /** Offset of the cracking event, Pa, so that its switching function is never identically zero. */
    private static final double THRESHOLD_OFFSET = 1e-3;

    private final String id;
    private final Node inlet;
    private final Node outlet;
    private final double crackingPressure;
    private final double fullOpenSpan;
    private final double maxArea;
    private final double cd;
    private double density;
    private double transitionConstant;
    private SignalHandle q;
    private SignalHandle openingSignal;
    private EnergyAccount loss;

    /**
     * @param id element id
     * @param inlet inlet port
     * @param outlet outlet port
     * @param crackingPressure pressure difference at which it starts to open, Pa
     * @param fullOpenSpan additional pressure difference to open fully, Pa (positive)
     * @param maxArea fully open area, m^2
     * @param cd discharge coefficient
     */
    public CheckValve(String id, Node inlet, Node outlet, double crackingPressure, double fullOpenSpan,
                      double maxArea, double cd) {
        this.id = id;
        this.inlet = inlet;
        this.outlet = outlet;
        this.crackingPressure = crackingPressure;
        this.fullOpenSpan = fullOpenSpan;
        this.maxArea = maxArea;
        this.cd = cd;
    }

    @Override
    public String id() {
        return id;
    }

    @Override
    public List<Node> ports() {
        return List.of(inlet, outlet);
    }

    @Override
    public void bind(Binder b) {
        density = b.fluid().density();
        transitionConstant = OrificeLaw.transitionConstant(cd, density, b.fluid().kinematicViscosity());
        q = b.signal("q", Dimension.VOLUME_FLOW);
        openingSignal = b.signal("opening", Dimension.DIMENSIONLESS);
        loss = b.account("loss", EnergyAccount.Kind.LOSS);
        b.discontinuity(new Corner(id, "cracks open", "corner",
                s -> s.pressure(inlet) - s.pressure(outlet) - crackingPressure - THRESHOLD_OFFSET));
        b.discontinuity(new Corner(id, "fully open", "corner",
                s -> s.pressure(inlet) - s.pressure(outlet) - crackingPressure - fullOpenSpan));
    }

    private double opening(double dp) {
        return Math.max(0.0, Math.min(1.0, (dp - crackingPressure) / fullOpenSpan));
    }

    @Override
    public boolean suppliesPartials() {
        return true;
    }

    @Override
    public void evaluate(Evaluation e) {
        double dp = e.pressure(inlet) - e.pressure(outlet);
        double u = opening(dp);
        double flow = 0.0;
        double slope = 0.0;
        if (u > 0.0) {
            double area = u * maxArea;
            double dpT = OrificeLaw.roundHoleTransition(transitionConstant, area);
            flow = OrificeLaw.flow(cd, area, dp, density, dpT);
            if (e.partials()) {
                slope = OrificeLaw.slope(cd, area, dp, density, dpT);
                if (u < 1.0) {
                    // the area grows with dp: dA/d(dp) = A_max / span; dq/dA = q/A, d(dp_t)/dA = -dp_t/A
                    double dqdA = flow / area
                            + OrificeLaw.transitionSlope(cd, area, dp, density, dpT) * (-dpT / area);
                    slope += dqdA * maxArea / fullOpenSpan;
                }
            }
        }
        e.flow(inlet, outlet, flow, slope, -slope);
        if (e.recording()) {
            e.signal(q, flow);
            e.signal(openingSignal, u);
            e.power(loss, dp * flow);
        }
    }
}
