package org.branchsim.core.elements;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Random;
import java.util.TreeMap;
import org.branchsim.core.fluid.Fluid;
import org.branchsim.core.model.Binder;
import org.branchsim.core.model.CircuitBuilder;
import org.branchsim.core.model.CircuitModel;
import org.branchsim.core.model.Element;
import org.branchsim.core.model.Evaluation;
import org.branchsim.core.model.Member;
import org.branchsim.core.model.Node;
import org.branchsim.core.model.StateSlot;
import org.branchsim.core.scenario.ScenarioLoader;
import org.branchsim.core.solve.JacobianAgreement;
import org.branchsim.core.units.Dimension;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/**
 * Every element's closed-form partial derivatives against central differences of the equations (sources and
 * tolerance: {@link JacobianAgreement}, Dennis and Schnabel 1983, ch. 5), at many states drawn with a fixed seed:
 * node pressures spread over the working range or bunched within 0.01 Pa to 10 kPa of each other in both
 * directions (across every opening's laminar-turbulent transition, a few Pa to a few kPa wide), members anywhere in
 * their travel, a few micrometres or less off a seat or stop, or held there, moving either way.
 */
class ElementPartialsTest {

    /** Random states per model. */
    private static final int STATES = 40;
    /** Air-laden oil, so that the bulk modulus varies with pressure: 870 kg/m^3, 32 cSt, 1.6 GPa, 0.5 % air. */
    private static final Fluid AIRY_OIL = new Fluid(870.0, 32e-6, 1.6e9, 0.005, 1.4, 313.15);

    /**
     * The demos hold every element type a scenario can name except the orifice and the pilot-operated relief valve
     * (their own tests: below and PilotReliefPartialsTest); mobile-arm holds the compensated pump, hydraulic lines,
     * the accumulator, check valves and the motor.
     */
    @ParameterizedTest
    @ValueSource(strings = {"fixture-clamp", "gripper-chatter", "pilot-supply-hunting", "press-two-branches",
        "regulation-characteristic", "feed-stall", "mobile-arm"})
    void demoElementsAgreeWithCentralDifferences(String demo) {
        CircuitModel model = ScenarioLoader.load(Path.of("..", "scenarios", demo + ".json")).circuit();
        checkRandomStates(model, demo.hashCode(), true);
    }

    @Test
    void orificeCheckValveMotorAndPumpAgreeWithCentralDifferences() {
        Node tank = Node.tank("tank", 0.0);
        Node a = Node.volume("a", 0.2e-3, 1e9, 0.0);
        Node b = Node.volume("b", 0.1e-3, Double.POSITIVE_INFINITY, 0.0);
        Node c = Node.volume("c", 0.1e-3, Double.POSITIVE_INFINITY, 0.0);
        CircuitModel model = new CircuitBuilder("laws", AIRY_OIL).add(tank).add(a).add(b).add(c)
                .add(new Pump("pump", tank, a, 1e-6, 150.0, 0.95))
                .add(new Orifice("orifice", a, b, 3e-6, 0.61))
                .add(new CheckValve("check", b, c, 0.5e5, 2e5, 20e-6, 0.61))
                .add(new Motor("motor", c, tank, 10e-6 / (2 * Math.PI), 0.01, 0.01, 1e-13, 15.0))
                .build();
        checkRandomStates(model, 11, true);
    }

    /**
     * A motor with friction (breakaway, Stribeck fall, tanh through rest) and an overrunning weight, and pumps with
     * piston and gear ripple.
     */
    @Test
    void motorLoadsAndPumpRippleAgreeWithCentralDifferences() {
        Node tank = Node.tank("tank", 0.0);
        Node a = Node.volume("a", 0.2e-3, 1e9, 0.0);
        Node b = Node.volume("b", 0.1e-3, Double.POSITIVE_INFINITY, 0.0);
        CircuitModel model = new CircuitBuilder("loads", AIRY_OIL).add(tank).add(a).add(b)
                .add(new Pump("piston", tank, a, 1e-6, 150.0, 0.95,
                        new org.branchsim.core.laws.KinematicRipple(
                                org.branchsim.core.laws.KinematicRipple.Kind.AXIAL_PISTON, 9, 0.0)))
                .add(new Pump("gear", tank, b, 1e-6, 150.0, 0.95,
                        new org.branchsim.core.laws.KinematicRipple(
                                org.branchsim.core.laws.KinematicRipple.Kind.GEAR, 12, Math.toRadians(20.0))))
                .add(new Motor("motor", a, b, 10e-6 / (2 * Math.PI), 0.01, 0.01, 1e-13, 15.0,
                        new Motor.Friction(20.0, 35.0, 3.0, 2.0), new Motor.OverrunningLoad(400.0, 0.5, 20.0)))
                .add(new Orifice("orifice", b, tank, 3e-6, 0.61))
                .build();
        checkRandomStates(model, 13, true);
    }

    /**
     * Hydraulic lines of one and of three segments, a stiff hose wall and a rigid tube, between volume nodes and
     * into a tank. Segment flows are drawn within +-1 m/s of mean speed: in the 12 mm line that is laminar
     * (Re up to 375), in the 250 mm one it spans the laminar law, the transition band and Blasius (Re up to 7800).
     */
    @Test
    void hydraulicLinesAgreeWithCentralDifferences() {
        Node tank = Node.tank("tank", 0.0);
        Node a = Node.volume("a", 0.2e-3, 1e9, 0.0);
        Node b = Node.volume("b", 0.1e-3, Double.POSITIVE_INFINITY, 0.0);
        CircuitModel model = new CircuitBuilder("lines", AIRY_OIL).add(tank).add(a).add(b)
                .add(new Pump("pump", tank, a, 1e-6, 150.0, 0.95))
                .add(new HydraulicLine("hose", a, b, 2.0, 12e-3, 0.8e9, 3))
                .add(new HydraulicLine("pipe", b, tank, 0.5, 0.25, Double.POSITIVE_INFINITY, 1))
                .add(new HydraulicLine("manifold", a, tank, 1.5, 0.25, 2e9, 3))
                .build();
        checkRandomStates(model, 19, true);
    }

    /**
     * An element that supplies no partials has its block estimated by central differences of its own
     * contributions; the assembled Jacobian agrees with differences of the whole right-hand side as well. Only
     * at spread pressures and off the seats: the fallback's step (eps^(1/3) of the state's typical magnitude, about 0.6 Pa at 1 bar
     * and 100 Pa at 160 bar) does not resolve a laminar transition a few Pa wide, and a step larger than the
     * lift crosses the seat's corner, which is why the elements supply closed forms.
     */
    @Test
    void elementsWithoutPartialsFallBackToTheirOwnDifferences() {
        CircuitModel model = ScenarioLoader.load(Path.of("..", "scenarios", "fixture-clamp.json")).circuit();
        // wrap every element of a fresh copy of the model so that none supplies partials
        List<Element> wrapped = new ArrayList<>();
        for (Element e : model.elements()) {
            wrapped.add(new WithoutPartials(e));
        }
        CircuitModel plain = rebuild(model, wrapped);
        checkRandomStates(plain, 5, false);
    }

    private static CircuitModel rebuild(CircuitModel model, List<Element> elements) {
        CircuitBuilder b = new CircuitBuilder(model.name() + "-without-partials", model.fluid());
        for (Node n : model.nodes()) {
            b.add(n);
        }
        for (Element e : elements) {
            b.add(e);
        }
        return b.build();
    }

    /**
     * Checks the model's Jacobian at {@link #STATES} random states.
     *
     * @param hard whether every other state bunches the pressures within 10 kPa of each other, and free members
     *        may sit just off a seat or stop
     */
    static void checkRandomStates(CircuitModel model, long seed, boolean hard) {
        Random random = new Random(seed);
        List<StateSlot> states = model.states();
        double worst = 0.0;
        for (int k = 0; k < STATES; k++) {
            double[] y = model.initialState();
            Map<String, Member.Mode> held = new TreeMap<>();
            boolean close = hard && k % 2 == 1;
            double base = 10e5 + random.nextDouble() * 200e5;
            for (int i = 0; i < y.length; i++) {
                StateSlot s = states.get(i);
                if (s.dimension() == Dimension.PRESSURE) {
                    double spread = Math.pow(10, -2 + 6 * random.nextDouble()) * (random.nextBoolean() ? 1 : -1);
                    y[i] = close ? base + spread : random.nextDouble() * 250e5;
                } else {
                    y[i] = (random.nextDouble() - 0.5) * 2 * s.absoluteScale();
                }
            }
            for (Member m : model.members()) {
                int x = states.indexOf(m.positionSlot());
                int v = states.indexOf(m.velocitySlot());
                double travel = m.upper() - m.lower();
                double u = random.nextDouble();
                if (u < 0.15) {
                    held.put(m.id(), Member.Mode.AT_LOWER_STOP);
                    y[x] = m.lower();
                    y[v] = 0.0;
                } else if (u < 0.25) {
                    held.put(m.id(), Member.Mode.AT_UPPER_STOP);
                    y[x] = m.upper();
                    y[v] = 0.0;
                } else if (u < 0.45 && hard) {
                    // free, just off a seat or stop: 1e-6 .. 1e-3 of the travel (closer, no difference step that
                    // stays off the seat is large enough to rise above the round-off of the flows)
                    double off = travel * Math.pow(10, -6 + 3 * random.nextDouble());
                    y[x] = random.nextBoolean() ? m.lower() + off : m.upper() - off;
                } else {
                    y[x] = m.lower() + travel * random.nextDouble();
                }
            }
            String where = String.format(java.util.Locale.ROOT, "%s, state %d (%s pressures, held %s)",
                    model.name(), k, close ? "bunched" : "spread", held);
            worst = Math.max(worst, JacobianAgreement.check(model, held, 0.0, y, where));
        }
        assertTrue(worst <= JacobianAgreement.TOLERANCE, model.name() + ": " + worst);
    }

    /** Delegates everything to an element but supplies no partials. */
    private static final class WithoutPartials implements Element {
        private final Element inner;

        WithoutPartials(Element inner) {
            this.inner = inner;
        }

        @Override
        public String id() {
            return inner.id();
        }

        @Override
        public List<Node> ports() {
            return inner.ports();
        }

        @Override
        public void bind(Binder binder) {
            inner.bind(binder);
        }

        @Override
        public void evaluate(Evaluation evaluation) {
            inner.evaluate(evaluation);
        }
    }
}
