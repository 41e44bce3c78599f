package org.branchsim.core.elements;

import java.util.List;
import org.branchsim.core.laws.GasSpring;
import org.branchsim.core.laws.OrificeLaw;
import org.branchsim.core.model.Binder;
import org.branchsim.core.model.Element;
import org.branchsim.core.model.EnergyAccount;
import org.branchsim.core.model.Evaluation;
import org.branchsim.core.model.Node;
import org.branchsim.core.model.SignalHandle;
import org.branchsim.core.model.StateSlot;
import org.branchsim.core.units.Dimension;
import org.branchsim.core.units.Units;

/**
 * Gas-charged accumulator (bladder or piston) on one port, through a fluid-side inlet orifice. State: the
 * fluid volume V_f inside (m^3), from 0 (empty) to the capacity (full); the gas fills V_g = V_0 - V_f.
 * The gas is precharged to p_0 (gauge) at temperature T_0 with volume V_0; at the fluid's temperature T_w the
 * precharge reads p_0,abs T_w / T_0 (ideal gas). Gas law, either
 * <ul>
 * <li>polytropic: p_abs = p_0w (V_0 / V_g)^n ({@link GasSpring#polytropicPressure}), n = 1 isothermal
 * (Boyle) to 1.4 adiabatic (Poisson), or</li>
 * <li>thermal time constant: a second state, the gas temperature T (K), relaxing to T_w with time constant
 * tau while compression heats it ({@link GasSpring#temperatureRate}).</li>
 * </ul>
 * The flow q into the accumulator (positive from the port in) crosses the inlet orifice
 * ({@link OrificeLaw}) at p_port - p_gas. Stops: the bladder's anti-extrusion poppet (or the piston on its
 * end cap) closes the inlet as V_f falls to 0, so no fluid leaves below the precharge; at the capacity the
 * gas side is at its stop and no more fluid enters. Both closures scale the orifice area linearly over the
 * last 1 % of the capacity, so V_f never leaves [0, capacity] and no event is needed.
 */
public final class Accumulator implements Element {

    /** Fraction of the capacity over which the inlet closes at the empty and full stops. */
    static final double CLOSING_FRACTION = 0.01;

    /**
     * The gas charge.
     *
     * @param volume gas volume at precharge V_0, m^3
     * @param prechargePressure precharge p_0, Pa gauge
     * @param prechargeTemperature temperature of the precharge T_0, K
     * @param exponent polytropic exponent n (1 to 1.4); ignored when a thermal time constant is given
     * @param thermalTimeConstant tau, s; NaN for the polytropic law
     */
    public record GasCharge(double volume, double prechargePressure, double prechargeTemperature, double exponent,
                            double thermalTimeConstant) {
        /** @return true when the gas follows the thermal time constant model */
        public boolean thermal() {
            return !Double.isNaN(thermalTimeConstant);
        }
    }

    private final String id;
    private final Node port;
    private final GasCharge gas;
    private final double capacity;
    private final double inletArea;
    private final double inletCd;
    private double density;
    private double transition;
    private double wallTemperature;
    private double workingPrecharge;
    private StateSlot fluidVolume;
    private StateSlot gasTemperature;
    private SignalHandle qSignal;
    private SignalHandle gasPressure;
    private SignalHandle gasVolume;
    private SignalHandle fluidSignal;
    private SignalHandle temperatureSignal;
    private EnergyAccount inletLoss;
    private EnergyAccount gasStored;

    /**
     * @param id element id
     * @param port the node it is connected to
     * @param gas the gas charge
     * @param capacity fluid volume at the full stop, m^3 (below the gas volume)
     * @param inletDiameter inlet orifice diameter, m
     * @param inletCd inlet orifice discharge coefficient
     */
    public Accumulator(String id, Node port, GasCharge gas, double capacity, double inletDiameter, double inletCd) {
        this.id = id;
        this.port = port;
        this.gas = gas;
        this.capacity = capacity;
        this.inletArea = OrificeLaw.circleArea(inletDiameter);
        this.inletCd = inletCd;
    }

    @Override
    public String id() {
        return id;
    }

    @Override
    public List<Node> ports() {
        return List.of(port);
    }

    /** @return the gas charge */
    public GasCharge gas() {
        return gas;
    }

    @Override
    public void bind(Binder b) {
        density = b.fluid().density();
        transition = OrificeLaw.transitionPressure(inletCd, OrificeLaw.circularDiameter(inletArea), density,
                b.fluid().kinematicViscosity());
        wallTemperature = b.fluid().temperature();
        workingPrecharge = (gas.prechargePressure() + Units.ATMOSPHERE) * wallTemperature / gas.prechargeTemperature();
        fluidVolume = b.state("fluid.volume", Dimension.VOLUME, initialFluidVolume(), capacity);
        if (gas.thermal()) {
            gasTemperature = b.state("gas.T", Dimension.TEMPERATURE, wallTemperature, wallTemperature);
            temperatureSignal = b.signal("gas.T", Dimension.TEMPERATURE);
        }
        qSignal = b.signal("q", Dimension.VOLUME_FLOW);
        gasPressure = b.signal("gas.p", Dimension.PRESSURE);
        gasVolume = b.signal("gas.volume", Dimension.VOLUME);
        fluidSignal = b.signal("fluid.volume", Dimension.VOLUME);
        inletLoss = b.account("inlet.loss", EnergyAccount.Kind.LOSS);
        gasStored = b.account("gas", EnergyAccount.Kind.STORED);
        b.couple(b.pressureOf(port), fluidVolume, gasTemperature);
    }

    /** Fluid volume in equilibrium with the port's initial pressure (the gas at the fluid's temperature), m^3. */
    private double initialFluidVolume() {
        double p = port.initialPressure() + Units.ATMOSPHERE;
        if (p <= workingPrecharge) {
            return 0.0;
        }
        double n = gas.thermal() ? 1.0 : gas.exponent();
        double vg = GasSpring.polytropicVolume(workingPrecharge, gas.volume(), p, n);
        return Math.min(capacity, gas.volume() - vg);
    }

    /**
     * @param fluid fluid volume inside, m^3
     * @param temperature gas temperature, K (used by the thermal model only)
     * @return the gas pressure, Pa absolute
     */
    double absoluteGasPressure(double fluid, double temperature) {
        double vg = gas.volume() - fluid;
        if (gas.thermal()) {
            return GasSpring.idealGasPressure(workingPrecharge, gas.volume(), wallTemperature, vg, temperature);
        }
        return GasSpring.polytropicPressure(workingPrecharge, gas.volume(), vg, gas.exponent());
    }

    /** @return true for a polytropic charge (closed-form partials); a thermal one takes the fallback */
    @Override
    public boolean suppliesPartials() {
        return !gas.thermal();
    }

    @Override
    public void evaluate(Evaluation e) {
        double vf = e.value(fluidVolume);
        double t = gas.thermal() ? e.value(gasTemperature) : wallTemperature;
        double pGas = absoluteGasPressure(vf, t) - Units.ATMOSPHERE;
        double pPort = e.pressure(port);
        double dp = pPort - pGas;
        double seal = CLOSING_FRACTION * capacity;
        double open = dp < 0.0 ? clamp(vf / seal) : clamp((capacity - vf) / seal);
        double q = OrificeLaw.flow(inletCd, inletArea * open, dp, density, transition);
        e.inflow(port, -q);
        e.derivative(fluidVolume, q);
        if (e.partials()) {
            addPartials(e, vf, t, dp, seal, open);
        }
        if (gas.thermal()) {
            e.derivative(gasTemperature, GasSpring.temperatureRate(t, gas.volume() - vf, -q, wallTemperature,
                    gas.thermalTimeConstant(), GasSpring.NITROGEN_GAMMA));
            e.signal(temperatureSignal, t);
        }
        if (e.recording()) {
            e.signal(qSignal, q);
            e.signal(gasPressure, pGas);
            e.signal(gasVolume, gas.volume() - vf);
            e.signal(fluidSignal, vf);
            e.power(inletLoss, dp * q);
            e.power(gasStored, pGas * q);
        }
    }

    /**
     * The closed-form partials of the polytropic accumulator (the thermal one takes the finite-difference
     * fallback): q = Q(A_in open(V_f), p_port - p_gas(V_f)) with the orifice law's slope dQ/d(dp), the gas
     * spring's dp_gas/dV_f = n p_gas,abs / V_gas (V_gas = V_0 - V_f), and Q linear in the area (the transition
     * pressure being that of the full inlet).
     */
    private void addPartials(Evaluation e, double vf, double temperature, double dp, double seal, double open) {
        double slope = OrificeLaw.slope(inletCd, inletArea * open, dp, density, transition);
        double gasVolumeNow = gas.volume() - vf;
        double dpGasdVf = gas.exponent() * absoluteGasPressure(vf, temperature) / gasVolumeNow;
        double fraction = dp < 0.0 ? vf / seal : (capacity - vf) / seal;
        double dOpen = fraction <= 0.0 || fraction >= 1.0 ? 0.0 : (dp < 0.0 ? 1.0 : -1.0) / seal;
        double fullOpenFlow = OrificeLaw.flow(inletCd, inletArea, dp, density, transition);
        double dqdVf = -slope * dpGasdVf + fullOpenFlow * dOpen;
        e.inflowPartial(port, port, -slope);
        e.inflowPartial(port, fluidVolume, -dqdVf);
        e.derivativePartial(fluidVolume, port, slope);
        e.derivativePartial(fluidVolume, fluidVolume, dqdVf);
    }

    private static double clamp(double f) {
        return Math.max(0.0, Math.min(1.0, f));
    }
}
