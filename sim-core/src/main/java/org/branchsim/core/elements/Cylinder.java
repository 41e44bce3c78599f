package org.branchsim.core.elements;

import java.util.List;
import org.branchsim.core.laws.AnnularLeakage;
import org.branchsim.core.model.Binder;
import org.branchsim.core.model.Element;
import org.branchsim.core.model.EnergyAccount;
import org.branchsim.core.model.Evaluation;
import org.branchsim.core.model.Node;
import org.branchsim.core.model.ScheduledInput;
import org.branchsim.core.model.SignalHandle;
import org.branchsim.core.model.StateView;
import org.branchsim.core.parts.Corner;
import org.branchsim.core.parts.Forces;
import org.branchsim.core.parts.TravelLimitedMass;
import org.branchsim.core.units.Dimension;

/**
 * Double-acting single-rod cylinder. Piston position x from 0 (retracted) to the stroke; cap-end chamber
 * (port capEnd, area A1 = pi D^2/4) and rod-end chamber (port rodEnd, A2 = A1 - pi d^2/4). The chambers
 * are part of the nodes they connect to: volumes V1 = V01 + A1 x and V2 = V02 + A2 (S - x), displacement
 * flows -A1 x' and +A2 x'. Motion: M x'' = p1 A1 - p2 A2 - F_load(t) - F_table(x) - F_c tanh(x'/v_s) - b x' - F_contact,
 * with a scheduled load F_load(t), an optional load table against position F_table(x) (linear between rows),
 * Coulomb friction regularised over v_s, end stops as events (with an optional coefficient of restitution,
 * {@link TravelLimitedMass}), and an optional stiff work-piece met at x_c: a Kelvin-Voigt contact whose damping
 * fades in over a small penetration delta_f, F_contact = max(0, k delta + c w(delta / delta_f) x'),
 * delta = x - x_c &gt; 0, w(s) = 3 s^2 - 2 s^3 for s &lt; 1 and 1 beyond (so the damping force does not jump at
 * first touch, and a contact only pushes: it never pulls the piston back as it separates; Hunt and Crossley,
 * J. Appl. Mech. 42, 1975, make the same two points against a plain spring-damper). The contact's start is an
 * event. Internal leakage across the piston and external leakage past the rod seal are laminar annulus flows
 * ({@link AnnularLeakage}).
 */
public final class Cylinder implements Element {

    /** Geometry and mechanics. Lengths m, areas from diameters, masses kg, forces N. */
    public record Parameters(double bore, double rod, double stroke, double mass, double deadVolumeCap,
                             double deadVolumeRod, double coulombFriction, double viscousFriction,
                             double frictionVelocity, double initialPosition) {
    }

    /** Laminar annulus leakage path: clearance and land length, m; diameter set by the cylinder. */
    public record Leakage(double clearance, double length) {
    }

    /**
     * A stiff work-piece met at {@code position} (m) with stiffness N/m and damping N*s/m, the damping fading in
     * over the penetration {@code fade} (m).
     */
    public record Contact(double position, double stiffness, double damping, double fade) {

        /** A contact whose damping fades in over {@link #DEFAULT_FADE}. */
        public Contact(double position, double stiffness, double damping) {
            this(position, stiffness, damping, DEFAULT_FADE);
        }

        /** Default penetration over which the contact damping fades in, m (0.1 mm; our choice, no source). */
        public static final double DEFAULT_FADE = 1e-4;
    }

    private final String id;
    private final Node capEnd;
    private final Node rodEnd;
    private final Parameters p;
    private final Leakage internal;
    private final Leakage external;
    private final Contact contact;
    private final ScheduledInput load;
    private final TravelLimitedMass piston;
    /** Load against position, m and N (empty: none). */
    private double[] tablePositions = new double[0];
    private double[] tableForces = new double[0];
    private final double a1;
    private final double a2;
    private double mu;
    private SignalHandle forceSignal;
    private SignalHandle contactSignal;
    private SignalHandle internalLeakSignal;
    private SignalHandle externalLeakSignal;
    private EnergyAccount loadWork;
    private EnergyAccount friction;
    private EnergyAccount leakLoss;
    private EnergyAccount contactSpring;
    private EnergyAccount contactDamping;

    /**
     * @param id element id
     * @param capEnd node of the cap-end chamber
     * @param rodEnd node of the rod-end chamber
     * @param p geometry and mechanics
     * @param internal leakage across the piston, or null
     * @param external leakage past the rod seal to the outside, or null
     * @param contact work-piece contact, or null
     * @param initialLoad external load force opposing extension at t = 0, N
     */
    public Cylinder(String id, Node capEnd, Node rodEnd, Parameters p, Leakage internal, Leakage external,
                    Contact contact, double initialLoad) {
        this.id = id;
        this.capEnd = capEnd;
        this.rodEnd = rodEnd;
        this.p = p;
        this.internal = internal;
        this.external = external;
        this.contact = contact;
        this.load = new ScheduledInput(id + ".load", Dimension.FORCE, initialLoad);
        this.a1 = 0.25 * Math.PI * p.bore() * p.bore();
        this.a2 = a1 - 0.25 * Math.PI * p.rod() * p.rod();
        this.piston = new TravelLimitedMass(id, "piston", p.mass(), 0.0, p.stroke(), p.initialPosition(),
                "retracted end stop", "extended end stop");
    }

    /**
     * Sets the coefficient of restitution of the piston at its end stops (0, the default: it stops dead); part of
     * building the circuit, before it is bound.
     *
     * @param e coefficient of restitution, 0 to 1
     * @return this cylinder
     */
    public Cylinder withEndStopRestitution(double e) {
        piston.withRestitution(e);
        return this;
    }

    /**
     * Adds a load against piston position to the scheduled load: a table of positions (m, rising) and forces (N,
     * opposing extension), linearly interpolated between rows and held at the end rows' values beyond them; part
     * of building the circuit, before it is bound.
     *
     * @param positions piston positions, m, strictly rising
     * @param forces load forces at those positions, N
     * @return this cylinder
     */
    public Cylinder withPositionLoad(double[] positions, double[] forces) {
        if (positions.length != forces.length || positions.length == 0) {
            throw new IllegalArgumentException("a position load table needs as many forces as positions, at least one");
        }
        for (int k = 1; k < positions.length; k++) {
            if (!(positions[k] > positions[k - 1])) {
                throw new IllegalArgumentException("a position load table needs rising positions");
            }
        }
        this.tablePositions = positions.clone();
        this.tableForces = forces.clone();
        return this;
    }

    /** @return the load of the position table at x, N (0 without a table) */
    double positionLoad(double x) {
        int n = tablePositions.length;
        if (n == 0) {
            return 0.0;
        }
        if (x <= tablePositions[0]) {
            return tableForces[0];
        }
        if (x >= tablePositions[n - 1]) {
            return tableForces[n - 1];
        }
        int k = segment(x);
        double f = (x - tablePositions[k]) / (tablePositions[k + 1] - tablePositions[k]);
        return tableForces[k] + f * (tableForces[k + 1] - tableForces[k]);
    }

    /** @return d(position load)/dx at x, N/m (0 outside the table and without one) */
    private double positionLoadSlope(double x) {
        int n = tablePositions.length;
        if (n < 2 || x <= tablePositions[0] || x >= tablePositions[n - 1]) {
            return 0.0;
        }
        int k = segment(x);
        return (tableForces[k + 1] - tableForces[k]) / (tablePositions[k + 1] - tablePositions[k]);
    }

    /** @return the row k with positions[k] &lt;= x &lt; positions[k + 1] (x inside the table) */
    private int segment(double x) {
        int lo = 0;
        int hi = tablePositions.length - 1;
        while (hi - lo > 1) {
            int mid = (lo + hi) >>> 1;
            if (tablePositions[mid] <= x) {
                lo = mid;
            } else {
                hi = mid;
            }
        }
        return lo;
    }

    /** @return the load schedule (force opposing extension), N */
    public ScheduledInput load() {
        return load;
    }

    @Override
    public String id() {
        return id;
    }

    @Override
    public List<Node> ports() {
        return List.of(capEnd, rodEnd);
    }

    @Override
    public void bind(Binder b) {
        mu = b.fluid().dynamicViscosity();
        b.input(load);
        piston.bind(b, s -> forces(s).net(), 0.1);
        forceSignal = b.signal("force", Dimension.FORCE);
        internalLeakSignal = b.signal("leak.internal", Dimension.VOLUME_FLOW);
        externalLeakSignal = b.signal("leak.external", Dimension.VOLUME_FLOW);
        loadWork = b.account("load work", EnergyAccount.Kind.WORK);
        friction = b.account("friction", EnergyAccount.Kind.LOSS);
        leakLoss = b.account("leakage", EnergyAccount.Kind.LOSS);
        for (int k = 0; k < tablePositions.length; k++) {
            double row = tablePositions[k];
            if (row <= 0.0 || row >= p.stroke()) {
                continue; // a kink at or beyond an end stop is never crossed in free motion (and a held piston
                          // would sit on it: a switching function must not stay at zero)
            }
            b.discontinuity(new Corner(id, "passes load table row " + (k + 1), "corner",
                    s -> piston.position(s) - row));
        }
        if (contact != null) {
            contactSignal = b.signal("contact", Dimension.FORCE);
            contactSpring = b.account("contact.spring", EnergyAccount.Kind.STORED);
            contactDamping = b.account("contact.damping", EnergyAccount.Kind.LOSS);
            b.discontinuity(new Corner(id, "touches the work-piece", "contact",
                    s -> piston.position(s) - contact.position()));
            b.discontinuity(new Corner(id, "contact damping fully in", "corner",
                    s -> piston.position(s) - contact.position() - contact.fade()));
        }
    }

    private double contactForce(double x, double v) {
        if (contact == null || x <= contact.position()) {
            return 0.0;
        }
        double penetration = x - contact.position();
        return Math.max(0.0, contact.stiffness() * penetration + contact.damping() * fade(penetration) * v);
    }

    /** @return the damping weight w = 3 s^2 - 2 s^3, s = penetration / fade (1 beyond the fade) */
    private double fade(double penetration) {
        double f = penetration / contact.fade();
        return f >= 1.0 ? 1.0 : f * f * (3.0 - 2.0 * f);
    }

    /** @return dw/d(penetration), 1/m */
    private double fadeSlope(double penetration) {
        double f = penetration / contact.fade();
        return f >= 1.0 ? 0.0 : 6.0 * f * (1.0 - f) / contact.fade();
    }

    /**
     * The partials: chamber volumes dV_1/dx = A_1, dV_2/dx = -A_2; displacement flows -A_1, +A_2 per x'; leakage
     * conductances; the force's dF/dp_1 = A_1, dF/dp_2 = -A_2, dF/dx = -k_c - c_c w'(delta) x' (in contact and
     * pushing), and dF/dx' = -F_c (1 - tanh^2(x'/v_s)) / v_s - b - c_c w(delta) (in contact and pushing).
     */
    private void addPartials(Evaluation e, double x, double v) {
        e.volumePartial(capEnd, piston.positionSlot(), a1);
        e.volumePartial(rodEnd, piston.positionSlot(), -a2);
        e.inflowPartial(capEnd, piston.velocitySlot(), -a1);
        e.inflowPartial(rodEnd, piston.velocitySlot(), a2);
        if (internal != null) {
            double g = AnnularLeakage.conductanceTimesViscosity(p.bore(), internal.clearance(), internal.length(), 0.0)
                    / mu;
            e.flow(capEnd, rodEnd, 0.0, g, -g);
        }
        if (external != null) {
            double g = AnnularLeakage.conductanceTimesViscosity(p.rod(), external.clearance(), external.length(), 0.0)
                    / mu;
            e.inflowPartial(rodEnd, rodEnd, -g);
        }
        piston.forcePartial(e, capEnd, a1);
        piston.forcePartial(e, rodEnd, -a2);
        double tanh = Math.tanh(v / p.frictionVelocity());
        double dFdv = -p.coulombFriction() * (1.0 - tanh * tanh) / p.frictionVelocity() - p.viscousFriction();
        piston.forcePartial(e, piston.positionSlot(), -positionLoadSlope(x));
        if (contactForce(x, v) > 0.0) {
            double penetration = x - contact.position();
            dFdv -= contact.damping() * fade(penetration);
            piston.forcePartial(e, piston.positionSlot(),
                    -contact.stiffness() - contact.damping() * fadeSlope(penetration) * v);
        }
        piston.forcePartial(e, piston.velocitySlot(), dFdv);
    }

    private double frictionForce(double v) {
        return p.coulombFriction() * Math.tanh(v / p.frictionVelocity()) + p.viscousFriction() * v;
    }

    private Forces forces(StateView s) {
        double x = piston.position(s);
        double v = piston.velocity(s);
        double hydraulic = s.pressure(capEnd) * a1 - s.pressure(rodEnd) * a2;
        double external = -s.input(load) - positionLoad(x) - frictionForce(v) - contactForce(x, v);
        return new Forces(hydraulic, 0.0, 0.0, 0.0, external);
    }

    @Override
    public boolean suppliesPartials() {
        return true;
    }

    @Override
    public void evaluate(Evaluation e) {
        double x = piston.position(e);
        double v = piston.velocity(e);
        double p1 = e.pressure(capEnd);
        double p2 = e.pressure(rodEnd);
        e.volume(capEnd, p.deadVolumeCap() + a1 * x);
        e.volume(rodEnd, p.deadVolumeRod() + a2 * (p.stroke() - x));
        e.inflow(capEnd, -a1 * v);
        e.inflow(rodEnd, a2 * v);
        double qInternal = internal == null ? 0.0
                : AnnularLeakage.flow(p.bore(), internal.clearance(), internal.length(), 0.0, p1 - p2, mu);
        e.flow(capEnd, rodEnd, qInternal);
        double qExternal = external == null ? 0.0
                : AnnularLeakage.flow(p.rod(), external.clearance(), external.length(), 0.0, p2, mu);
        e.inflow(rodEnd, -qExternal);
        Forces f = forces(e);
        piston.apply(e, f);
        if (e.partials()) {
            addPartials(e, x, v);
        }
        if (e.recording()) {
            double loadForce = e.input(load) + positionLoad(x);
            double fc = contactForce(x, v);
            e.signal(forceSignal, f.hydraulic());
            e.signal(internalLeakSignal, qInternal);
            e.signal(externalLeakSignal, qExternal);
            if (piston.free(e)) {
                e.power(loadWork, loadForce * v);
                e.power(friction, frictionForce(v) * v);
                if (contact != null) {
                    // the spring stores k delta x'; the rest of the contact's power F_c x' is lost: the faded
                    // damping while it pushes, and the spring energy the part keeps when the clipped force
                    // lets the piston leave faster than the part springs back
                    double penetration = Math.max(0.0, x - contact.position());
                    double springPower = contact.stiffness() * penetration * v;
                    e.power(contactSpring, springPower);
                    e.power(contactDamping, fc * v - springPower);
                }
            }
            if (contact != null) {
                e.signal(contactSignal, fc);
            }
            e.power(leakLoss, (p1 - p2) * qInternal + p2 * qExternal);
        }
    }
}
