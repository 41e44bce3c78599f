package org.branchsim.core.model;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import org.branchsim.core.fluid.Fluid;
import org.branchsim.core.units.Dimension;

/**
 * Assembles a {@link CircuitModel}: add nodes, then elements; binding lays out the state vector (node pressures
 * first, then element states in the order declared) and collects signals, accounts, inputs, members and
 * discontinuities. Binding happens once, at the first call of {@link #inputs()} or {@link #build()}; after it no
 * node or element can be added. Schedules are given between binding and {@link #build()}, which fixes them.
 */
public final class CircuitBuilder {

    /** Typical magnitude of node pressure changes used for absolute tolerances (1 bar), Pa. */
    public static final double PRESSURE_SCALE = 1e5;

    private final String name;
    private final Fluid fluid;
    private final Map<String, Node> nodes = new LinkedHashMap<>();
    private final List<Element> elements = new ArrayList<>();
    private Layout layout;

    /**
     * @param name circuit name
     * @param fluid the fluid
     */
    public CircuitBuilder(String name, Fluid fluid) {
        this.name = name;
        this.fluid = fluid;
    }

    /** Adds a node; ids must be unique (checked by the scenario reader). */
    public CircuitBuilder add(Node node) {
        requireUnbound();
        nodes.put(node.id(), node);
        return this;
    }

    /** Adds an element. */
    public CircuitBuilder add(Element element) {
        requireUnbound();
        elements.add(element);
        return this;
    }

    /** @return the node with that id, or null */
    public Node node(String id) {
        return nodes.get(id);
    }

    /**
     * Binds the nodes and elements (once) and returns the scheduled inputs they declared, so that their ramps
     * can be added before the model is built.
     *
     * @return the scheduled inputs, tank pressures first, then the elements' in the order declared
     */
    public List<ScheduledInput> inputs() {
        return List.copyOf(bound().inputs);
    }

    /** @return the model; the schedules of its inputs are fixed from now on */
    public CircuitModel build() {
        Layout l = bound();
        for (ScheduledInput in : l.inputs) {
            in.fix();
        }
        double[] y0 = l.initial.stream().mapToDouble(Double::doubleValue).toArray();
        return new CircuitModel(name, fluid, new ArrayList<>(nodes.values()), elements, l.states, y0, l.signals,
                l.accounts, l.inputs, l.elementInputs, l.members, l.discontinuities, l.compression, l.tankAccounts,
                l.blocks);
    }

    private void requireUnbound() {
        if (layout != null) {
            throw new IllegalStateException("circuit " + name + " is already bound: add every node and element first");
        }
    }

    private Layout bound() {
        if (layout == null) {
            layout = new Layout();
            layout.bind(new ArrayList<>(nodes.values()), elements, fluid);
        }
        return layout;
    }

    /** What binding declared: the state layout, signals, accounts, inputs, members, discontinuities, couplings. */
    private static final class Layout {
        final List<StateSlot> states = new ArrayList<>();
        final List<Double> initial = new ArrayList<>();
        final List<SignalHandle> signals = new ArrayList<>();
        final List<EnergyAccount> accounts = new ArrayList<>();
        final List<ScheduledInput> inputs = new ArrayList<>();
        /** The inputs each element registered, in element order. */
        final List<List<ScheduledInput>> elementInputs = new ArrayList<>();
        final List<Member> members = new ArrayList<>();
        final List<Discontinuity> discontinuities = new ArrayList<>();
        final List<int[]> blocks = new ArrayList<>();
        EnergyAccount compression;
        EnergyAccount[] tankAccounts;

        void bind(List<Node> nodeList, List<Element> elements, Fluid fluid) {
            tankAccounts = new EnergyAccount[nodeList.size()];
            int nodeIndex = 0;
            for (Node n : nodeList) {
                StateSlot slot = null;
                if (!n.isTank()) {
                    slot = new StateSlot(states.size(), n.id() + ".p", Dimension.PRESSURE, PRESSURE_SCALE);
                    states.add(slot);
                    initial.add(n.initialPressure());
                } else {
                    inputs.add(n.tankPressure());
                    // a tank delivers p * (flow out of it): positive for a pressure source, negative for fluid
                    // returned into a pressurised tank (energy left in the return)
                    tankAccounts[nodeIndex] = new EnergyAccount(accounts.size(), n.id() + ".delivered",
                            EnergyAccount.Kind.SUPPLY);
                    accounts.add(tankAccounts[nodeIndex]);
                }
                SignalHandle signal = new SignalHandle(signals.size(), n.id() + ".p", Dimension.PRESSURE);
                signals.add(signal);
                n.bind(nodeIndex++, slot, signal);
            }
            compression = new EnergyAccount(accounts.size(), "fluid compression", EnergyAccount.Kind.STORED);
            accounts.add(compression);
            for (Element element : elements) {
                bind(element, fluid);
            }
        }

        private void bind(Element element, Fluid fluid) {
            String prefix = element.id() + ".";
            List<Integer> block = new ArrayList<>();
            for (Node port : element.ports()) {
                if (port.pressureSlot() != null) {
                    block.add(port.pressureSlot().index());
                }
            }
            List<int[]> declared = new ArrayList<>();
            List<ScheduledInput> own = new ArrayList<>();
            elementInputs.add(own);
            element.bind(new Binder() {
                @Override
                public Fluid fluid() {
                    return fluid;
                }

                @Override
                public StateSlot state(String relative, Dimension dimension, double init, double scale) {
                    StateSlot s = new StateSlot(states.size(), prefix + relative, dimension, scale);
                    states.add(s);
                    initial.add(init);
                    block.add(s.index());
                    return s;
                }

                @Override
                public SignalHandle signal(String relative, Dimension dimension) {
                    SignalHandle h = new SignalHandle(signals.size(), prefix + relative, dimension);
                    signals.add(h);
                    return h;
                }

                @Override
                public EnergyAccount account(String relative, EnergyAccount.Kind kind) {
                    EnergyAccount a = new EnergyAccount(accounts.size(), prefix + relative, kind);
                    accounts.add(a);
                    return a;
                }

                @Override
                public void input(ScheduledInput input) {
                    inputs.add(input);
                    own.add(input);
                }

                @Override
                public ModeSlot member(Member member) {
                    ModeSlot slot = new ModeSlot(members.size(), member.id());
                    members.add(member);
                    return slot;
                }

                @Override
                public void discontinuity(Discontinuity d) {
                    discontinuities.add(d);
                }

                @Override
                public void couple(StateSlot... group) {
                    declared.add(Arrays.stream(group).filter(Objects::nonNull)
                            .mapToInt(StateSlot::index).distinct().toArray());
                }

                @Override
                public StateSlot pressureOf(Node node) {
                    return node.pressureSlot();
                }
            });
            if (declared.isEmpty()) {
                blocks.add(block.stream().mapToInt(Integer::intValue).distinct().toArray());
            } else {
                blocks.addAll(declared);
            }
        }
    }
}
