package org.branchsim.core.elements;

import org.branchsim.core.fluid.Fluid;
import org.branchsim.core.laws.Compressibility;
import org.branchsim.core.laws.OrificeLaw;
import org.branchsim.core.model.Binder;
import org.branchsim.core.model.EnergyAccount;
import org.branchsim.core.model.Evaluation;
import org.branchsim.core.model.Node;
import org.branchsim.core.model.SignalHandle;
import org.branchsim.core.model.StateSlot;
import org.branchsim.core.model.StateView;
import org.branchsim.core.units.Dimension;

/**
 * The small chamber under the outlet-side end of a reducing valve's main spool, fed from the outlet through
 * a sensing orifice. The spool's closing movement y' enlarges it by A_s y', so the orifice must pass A_s y'
 * and the pressure difference it needs opposes the motion: the classic way a spool is damped hydraulically.
 * Pressure: dp_e/dt = beta_e / (V_e0 + A_s y) (Q_e - A_s y'), Q_e from the outlet by {@link OrificeLaw}.
 *
 * @param deadVolume volume of the chamber with the spool on its open stop, m^3
 * @param orificeDiameter sensing orifice diameter, m
 * @param cd its discharge coefficient
 */
public record SpoolEndChamber(double deadVolume, double orificeDiameter, double cd) {

    /** The chamber's runtime part: its state, signals and accounts inside one valve. */
    static final class Bound {
        private final SpoolEndChamber spec;
        private final Node outlet;
        private final double endArea;
        private final double area;
        private Fluid fluid;
        private double transition;
        private StateSlot pressure;
        private SignalHandle pressureSignal;
        private SignalHandle flowSignal;
        private EnergyAccount loss;
        private EnergyAccount stored;

        Bound(SpoolEndChamber spec, Node outlet, double endArea) {
            this.spec = spec;
            this.outlet = outlet;
            this.endArea = endArea;
            this.area = OrificeLaw.circleArea(spec.orificeDiameter());
        }

        void bind(Binder b) {
            fluid = b.fluid();
            transition = OrificeLaw.transitionPressure(spec.cd(), spec.orificeDiameter(), fluid.density(),
                    fluid.kinematicViscosity());
            pressure = b.state("end.p", Dimension.PRESSURE, 0.0, 1e5);
            pressureSignal = b.signal("end.p", Dimension.PRESSURE);
            flowSignal = b.signal("end.q", Dimension.VOLUME_FLOW);
            loss = b.account("sensing orifice.loss", EnergyAccount.Kind.LOSS);
            stored = b.account("end chamber compression", EnergyAccount.Kind.STORED);
        }

        /** @return the chamber's pressure state */
        StateSlot pressureSlot() {
            return pressure;
        }

        /** @return the pressure under the spool end, Pa */
        double pressure(StateView s) {
            return s.value(pressure);
        }

        /**
         * Adds the orifice flow to the outlet and sets the chamber's pressure derivative; with partials, those of
         * q (dq/dp_2 = -dq/dp_e = the orifice slope) and of dp_e/dt = beta_e(p_e) / V (q - A_s y'),
         * V = V_e0 + A_s y: beta/V dq/dp_2, -beta/V dq/dp_e + beta'(p_e) (q - A_s y') / V, -beta A_s / V (per y'),
         * -beta (q - A_s y') A_s / V^2 (per y).
         */
        void evaluate(Evaluation e, double travel, double velocity, StateSlot travelSlot, StateSlot velocitySlot) {
            double p2 = e.pressure(outlet);
            double pe = e.value(pressure);
            double q = OrificeLaw.flow(spec.cd(), area, p2 - pe, fluid.density(), transition);
            e.inflow(outlet, -q);
            double inflow = q - endArea * velocity;
            double v = spec.deadVolume() + endArea * travel;
            double beta = fluid.effectiveBulkModulus(pe, Double.POSITIVE_INFINITY);
            e.derivative(pressure, Compressibility.pressureRate(beta, v, inflow));
            if (e.partials()) {
                double slope = OrificeLaw.slope(spec.cd(), area, p2 - pe, fluid.density(), transition);
                e.inflowPartial(outlet, outlet, -slope);
                e.inflowPartial(outlet, pressure, slope);
                e.derivativePartial(pressure, outlet, beta / v * slope);
                e.derivativePartial(pressure, pressure, -beta / v * slope
                        + fluid.bulkModulusSlope(pe, Double.POSITIVE_INFINITY) / v * inflow);
                e.derivativePartial(pressure, velocitySlot, -beta / v * endArea);
                e.derivativePartial(pressure, travelSlot, -beta * inflow * endArea / (v * v));
            }
            if (e.recording()) {
                e.signal(pressureSignal, pe);
                e.signal(flowSignal, q);
                e.power(loss, (p2 - pe) * q);
                e.power(stored, pe * inflow);
            }
        }
    }
}
