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
 * flows -A1 x' and +A2 x'. Motion: M x'' = p1 A1 - p2 A2 - F_load(t) - F_c tanh(x'/v_s) - b x' - F_contact,
 * with Coulomb friction regularised over v_s, end stops as events, and an optional stiff work-piece met at
 * x_c: F_contact = k (x - x_c) + c x' while x > x_c (its start is an event). Internal leakage across the
 * piston and external leakage past the rod seal are laminar annulus flows ({@link AnnularLeakage}).
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

    /** A stiff work-piece met at {@code position} (m) with stiffness N/m and damping N*s/m. */
    public record Contact(double position, double stiffness, double damping) {
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
        if (contact != null) {
            contactSignal = b.signal("contact", Dimension.FORCE);
            contactSpring = b.account("contact.spring", EnergyAccount.Kind.STORED);
            contactDamping = b.account("contact.damping", EnergyAccount.Kind.LOSS);
            b.discontinuity(new Corner(id, "touches the work-piece", "contact",
                    s -> piston.position(s) - contact.position()));
        }
    }

    private double contactForce(double x, double v) {
        if (contact == null || x <= contact.position()) {
            return 0.0;
        }
        return contact.stiffness() * (x - contact.position()) + contact.damping() * v;
    }

    /**
     * The partials: chamber volumes dV_1/dx = A_1, dV_2/dx = -A_2; displacement flows -A_1, +A_2 per x'; leakage
     * conductances; the force's dF/dp_1 = A_1, dF/dp_2 = -A_2, dF/dx = -k_c (in contact), and
     * dF/dx' = -F_c (1 - tanh^2(x'/v_s)) / v_s - b - c_c (in contact).
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
        if (contact != null && x > contact.position()) {
            dFdv -= contact.damping();
            piston.forcePartial(e, piston.positionSlot(), -contact.stiffness());
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
        double external = -s.input(load) - frictionForce(v) - contactForce(x, v);
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
            double loadForce = e.input(load);
            double fc = contactForce(x, v);
            e.signal(forceSignal, f.hydraulic());
            e.signal(internalLeakSignal, qInternal);
            e.signal(externalLeakSignal, qExternal);
            if (piston.free(e)) {
                e.power(loadWork, loadForce * v);
                e.power(friction, frictionForce(v) * v);
                if (contact != null) {
                    double penetration = Math.max(0.0, x - contact.position());
                    e.power(contactSpring, fc == 0.0 ? 0.0 : contact.stiffness() * penetration * v);
                    e.power(contactDamping, fc == 0.0 ? 0.0 : contact.damping() * v * v);
                }
            }
            if (contact != null) {
                e.signal(contactSignal, fc);
            }
            e.power(leakLoss, (p1 - p2) * qInternal + p2 * qExternal);
        }
    }
}
