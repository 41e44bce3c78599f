package org.branchsim.core.model;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.branchsim.core.fluid.Fluid;
import org.branchsim.core.units.Dimension;

/**
 * Assembles a {@link Circuit}: add nodes, then elements; {@link #build()} binds every element, lays out the
 * state vector (node pressures first, then element states in the order declared).
 */
public final class CircuitBuilder {

    /** Typical magnitude of node pressure changes used for absolute tolerances (1 bar), Pa. */
    public static final double PRESSURE_SCALE = 1e5;

    private final String name;
    private final Fluid fluid;
    private final Map<String, Node> nodes = new LinkedHashMap<>();
    private final List<Element> elements = new ArrayList<>();

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
        nodes.put(node.id(), node);
        return this;
    }

    /** Adds an element. */
    public CircuitBuilder add(Element element) {
        elements.add(element);
        return this;
    }

    /** @return the node with that id, or null */
    public Node node(String id) {
        return nodes.get(id);
    }

    /** @return the circuit */
    public Circuit build() {
        List<StateSlot> states = new ArrayList<>();
        List<Double> initial = new ArrayList<>();
        List<SignalHandle> signals = new ArrayList<>();
        List<EnergyAccount> accounts = new ArrayList<>();
        List<ScheduledInput> inputs = new ArrayList<>();
        List<Discontinuity> discontinuities = new ArrayList<>();
        List<Node> nodeList = new ArrayList<>(nodes.values());

        EnergyAccount[] tankAccounts = new EnergyAccount[nodeList.size()];
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
        EnergyAccount compression = new EnergyAccount(accounts.size(), "fluid compression", EnergyAccount.Kind.STORED);
        accounts.add(compression);

        List<int[]> blocks = new ArrayList<>();
        for (Element element : elements) {
            String prefix = element.id() + ".";
            List<Integer> block = new ArrayList<>();
            for (Node port : element.ports()) {
                if (port.pressureSlot() != null) {
                    block.add(port.pressureSlot().index());
                }
            }
            List<int[]> declared = new ArrayList<>();
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
                }

                @Override
                public void discontinuity(Discontinuity d) {
                    discontinuities.add(d);
                }

                @Override
                public void couple(StateSlot... group) {
                    declared.add(java.util.Arrays.stream(group).filter(java.util.Objects::nonNull)
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
        double[] y0 = initial.stream().mapToDouble(Double::doubleValue).toArray();
        return new Circuit(name, fluid, nodeList, elements, states, y0, signals, accounts, inputs,
                discontinuities, compression, tankAccounts, blocks);
    }
}
