package org.branchsim.core.elements;

import java.util.List;
import org.branchsim.core.fluid.Fluid;
import org.branchsim.core.laws.Compressibility;
import org.branchsim.core.laws.PipeFriction;
import org.branchsim.core.laws.WaveSpeed;
import org.branchsim.core.model.Binder;
import org.branchsim.core.model.Element;
import org.branchsim.core.model.EnergyAccount;
import org.branchsim.core.model.Evaluation;
import org.branchsim.core.model.Node;
import org.branchsim.core.model.SignalHandle;
import org.branchsim.core.model.StateSlot;
import org.branchsim.core.units.Dimension;

/**
 * Hydraulic line (pipe or hose) from port a to port b, of length L and inner diameter d, as N lumped segments
 * of length dx = L / N (Wylie and Streeter, Fluid Transients in Systems, 1993, the lumped-parameter line).
 * Each segment carries a flow q_i (positive from a to b) with inertance and steady friction:
 * dq_i/dt = A / (rho dx) (p_{i-1} - p_i - dp_f(q_i)), dp_f from {@link PipeFriction} over dx;
 * between segments sit N - 1 internal volumes of V / N (V = A L) with
 * dp_i/dt = beta_line(p_i) / (V / N) (q_i - q_{i+1}); the two ends (p_0 = p_a, p_N = p_b) are the port
 * nodes, to which the line adds half a segment's volume each. N = 1 is one resistance and inertance with half
 * the line's volume at each end. The line's effective bulk modulus takes the wall in series with the fluid:
 * 1/beta_line = 1/beta_fluid(p) + 1/beta_wall (Korteweg; beta_wall = E t / d for a thin-walled tube or a
 * hose's own value, {@link WaveSpeed}); at the port nodes the half-segment volume is added scaled by
 * beta_node / beta_line so that it brings the line's compliance, not the node's. Friction is quasi-steady
 * (no frequency-dependent friction). Waves travel at c = sqrt(beta_line / rho). The line supplies the closed-form
 * partial derivatives of everything it adds, the friction's slope from {@link PipeFriction#pressureDropSlope}
 * (docs/theory.md 10.1).
 */
public final class HydraulicLine implements Element {

    private final String id;
    private final Node a;
    private final Node b;
    private final double length;
    private final double diameter;
    private final double wallModulus;
    private final int segments;
    private final double area;
    private Fluid fluid;
    private double density;
    private double nu;
    private StateSlot[] flows;
    private StateSlot[] pressures;
    private SignalHandle qA;
    private SignalHandle qB;
    private SignalHandle dpSignal;
    private EnergyAccount friction;
    private EnergyAccount stored;

    /**
     * @param id element id
     * @param a port a
     * @param b port b
     * @param length line length, m
     * @param diameter inner diameter, m
     * @param wallModulus bulk modulus of the wall, Pa (E t / d for a tube; a hose's value; infinite if rigid)
     * @param segments number of lumped segments N, at least 1
     */
    public HydraulicLine(String id, Node a, Node b, double length, double diameter, double wallModulus,
                         int segments) {
        if (segments < 1) {
            throw new IllegalArgumentException("a line needs at least one segment, found " + segments);
        }
        this.id = id;
        this.a = a;
        this.b = b;
        this.length = length;
        this.diameter = diameter;
        this.wallModulus = wallModulus;
        this.segments = segments;
        this.area = 0.25 * Math.PI * diameter * diameter;
    }

    @Override
    public String id() {
        return id;
    }

    @Override
    public List<Node> ports() {
        return List.of(a, b);
    }

    /** @return the line's fluid volume A L, m^3 */
    public double volume() {
        return area * length;
    }

    /**
     * @param f the fluid
     * @param gaugePressure pressure, Pa gauge
     * @return wave speed sqrt(beta_line / rho) at that pressure, m/s
     */
    public double waveSpeed(Fluid f, double gaugePressure) {
        return WaveSpeed.speed(f.effectiveBulkModulus(gaugePressure, wallModulus), f.density());
    }

    @Override
    public void bind(Binder binder) {
        fluid = binder.fluid();
        density = fluid.density();
        nu = fluid.kinematicViscosity();
        flows = new StateSlot[segments];
        pressures = new StateSlot[segments + 1];
        double flowScale = area * 1.0;
        for (int i = 0; i < segments; i++) {
            flows[i] = binder.state(segments == 1 ? "q" : "q" + (i + 1), Dimension.VOLUME_FLOW, 0.0, flowScale);
        }
        double pa = a.initialPressure();
        double pb = b.initialPressure();
        for (int i = 1; i < segments; i++) {
            double f = (double) i / segments;
            pressures[i] = binder.state("p" + i, Dimension.PRESSURE, pa + f * (pb - pa), 1e5);
        }
        pressures[0] = binder.pressureOf(a);
        pressures[segments] = binder.pressureOf(b);
        qA = binder.signal("q.a", Dimension.VOLUME_FLOW);
        qB = binder.signal("q.b", Dimension.VOLUME_FLOW);
        dpSignal = binder.signal("dp", Dimension.PRESSURE);
        friction = binder.account("friction", EnergyAccount.Kind.LOSS);
        stored = binder.account("fluid", EnergyAccount.Kind.STORED);
        for (int i = 0; i < segments; i++) {
            binder.couple(pressures[i], flows[i], pressures[i + 1]);
        }
        for (int i = 1; i < segments; i++) {
            binder.couple(flows[i - 1], pressures[i], flows[i]);
        }
    }

    private double pressureAt(Evaluation e, int i) {
        if (i == 0) {
            return e.pressure(a);
        }
        if (i == segments) {
            return e.pressure(b);
        }
        return e.value(pressures[i]);
    }

    @Override
    public void evaluate(Evaluation e) {
        double dx = length / segments;
        double inertiaFactor = area / (density * dx);
        double segmentVolume = area * dx;
        double frictionPower = 0.0;
        for (int i = 0; i < segments; i++) {
            double q = e.value(flows[i]);
            double drop = PipeFriction.pressureDrop(q, diameter, dx, density, nu);
            e.derivative(flows[i], inertiaFactor * (pressureAt(e, i) - pressureAt(e, i + 1) - drop));
            frictionPower += drop * q;
            if (e.partials()) {
                e.derivativePartial(flows[i], pressures[i], inertiaFactor);
                e.derivativePartial(flows[i], pressures[i + 1], -inertiaFactor);
                e.derivativePartial(flows[i], flows[i],
                        -inertiaFactor * PipeFriction.pressureDropSlope(q, diameter, dx, density, nu));
            }
        }
        for (int i = 1; i < segments; i++) {
            double p = e.value(pressures[i]);
            double net = e.value(flows[i - 1]) - e.value(flows[i]);
            double beta = fluid.effectiveBulkModulus(p, wallModulus);
            e.derivative(pressures[i], Compressibility.pressureRate(beta, segmentVolume, net));
            if (e.partials()) {
                e.derivativePartial(pressures[i], flows[i - 1], beta / segmentVolume);
                e.derivativePartial(pressures[i], flows[i], -beta / segmentVolume);
                e.derivativePartial(pressures[i], pressures[i],
                        fluid.bulkModulusSlope(p, wallModulus) / segmentVolume * net);
            }
        }
        double q1 = e.value(flows[0]);
        double qN = e.value(flows[segments - 1]);
        e.inflow(a, -q1);
        e.inflow(b, qN);
        e.inflowPartial(a, flows[0], -1.0);
        e.inflowPartial(b, flows[segments - 1], 1.0);
        endVolume(e, a, pressures[0], 0.5 * segmentVolume);
        endVolume(e, b, pressures[segments], 0.5 * segmentVolume);
        if (e.recording()) {
            double pa = e.pressure(a);
            double pb = e.pressure(b);
            e.signal(qA, q1);
            e.signal(qB, qN);
            e.signal(dpSignal, pa - pb);
            e.power(friction, frictionPower);
            e.power(stored, pa * q1 - pb * qN - frictionPower);
        }
    }

    /**
     * Adds half a segment's volume to a port node, scaled by beta_node(p) / beta_line(p) so that it brings the
     * line's compliance, and its slope with the node's pressure (quotient rule on the two bulk moduli).
     */
    private void endVolume(Evaluation e, Node node, StateSlot pressure, double volume) {
        if (node.isTank()) {
            return;
        }
        double p = e.pressure(node);
        double nodeModulus = fluid.effectiveBulkModulus(p, node.wallBulkModulus());
        double lineModulus = fluid.effectiveBulkModulus(p, wallModulus);
        e.volume(node, volume * nodeModulus / lineModulus);
        if (e.partials()) {
            double nodeSlope = fluid.bulkModulusSlope(p, node.wallBulkModulus());
            double lineSlope = fluid.bulkModulusSlope(p, wallModulus);
            e.volumePartial(node, pressure,
                    volume * (nodeSlope * lineModulus - nodeModulus * lineSlope) / (lineModulus * lineModulus));
        }
    }

    @Override
    public boolean suppliesPartials() {
        return true;
    }
}
