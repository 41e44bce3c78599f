package org.branchsim.plots.diagram;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.TreeMap;
import org.branchsim.plots.diagram.Canvas.Point;

/**
 * Where everything of a circuit diagram goes, in diagram units (y down): each part's layer, place and
 * orientation, each node's wiring (a horizontal trunk in the channel between two rows of symbols and a vertical
 * drop from every port on it), and a tank symbol at every port on a tank. Layers come from
 * {@link LayerAssignment} (supply at the bottom, actuators at the top); the order within each layer from the
 * barycentre heuristic of Sugiyama, Tagawa and Toda (IEEE Trans. SMC 11(2), 1981), sweeping up and down a few
 * times; each part is then moved towards the mean x of the parts it connects to below (keeping its order and its
 * distance from its neighbours), so that most drops run straight. Long connections are not split into dummy
 * vertices: a drop may pass a row.
 */
public final class CircuitLayout {

    /** Vertical distance between a row's port ends and the first track of the channel above, diagram units. */
    static final double TRACK_CLEARANCE = 16;
    /** Distance between tracks in a channel, diagram units. */
    static final double TRACK_PITCH = 16;
    /** Room under the lowest track of a channel for tank symbols of the row above, diagram units. */
    static final double TANK_ROOM = 34;
    /** Clear distance between symbols side by side (beside the room for the left symbol's id), diagram units. */
    static final double GAP = 26;
    /** Width of one character of an id label (11-unit sans-serif), an estimate, diagram units. */
    static final double CHAR_WIDTH = 6.6;
    /** Margin around the drawing; the top margin also holds the title, diagram units. */
    static final double MARGIN = 24;
    static final double TITLE_ROOM = 30;

    /**
     * A part placed on the drawing.
     *
     * @param part the part
     * @param layer its layer, 0 = bottom
     * @param cx centre x
     * @param cy centre y
     * @param flipped whether its symbol is mirrored top to bottom (first port on top)
     * @param ports its ports' ends, in port order
     * @param side for each port: +1 drawn on top, -1 below, 0 drain
     */
    public record Placed(Part part, int layer, double cx, double cy, boolean flipped, List<Point> ports, int[] side) {
    }

    /**
     * The wiring of one node.
     *
     * @param node node id
     * @param trunkY y of its horizontal trunk
     * @param x0 left end of the trunk
     * @param x1 right end of the trunk
     * @param drops one polyline per port, from the port's end to the trunk, with the part and port it serves
     * @param junctions points where three or more lines meet (drawn as dots)
     */
    public record Wire(String node, double trunkY, double x0, double x1, List<Drop> drops, List<Point> junctions) {
    }

    /**
     * A vertical line from a port to its node's trunk.
     *
     * @param part part id
     * @param port port name
     * @param from the port's end
     * @param to the point on the trunk
     * @param dashed drawn dashed (a drain line)
     */
    public record Drop(String part, String port, Point from, Point to, boolean dashed) {
    }

    /**
     * A tank symbol (or a pressure source symbol) at a port.
     *
     * @param part part id
     * @param port port name
     * @param node the tank node's id
     * @param at the port's end
     * @param up whether the port points up (the symbol is then drawn beside it)
     * @param dashed a drain line
     * @param source whether the node is a pressure source rather than a vented tank
     */
    public record TankMark(String part, String port, String node, Point at, boolean up, boolean dashed,
                           boolean source) {
    }

    private final List<Placed> placed;
    private final List<Wire> wires;
    private final List<TankMark> tanks;
    private final double width;
    private final double height;

    private CircuitLayout(List<Placed> placed, List<Wire> wires, List<TankMark> tanks, double width, double height) {
        this.placed = List.copyOf(placed);
        this.wires = List.copyOf(wires);
        this.tanks = List.copyOf(tanks);
        this.width = width;
        this.height = height;
    }

    /** @return the parts as placed, in netlist order */
    public List<Placed> placed() {
        return placed;
    }

    /** @return the wiring of each node that is not a tank */
    public List<Wire> wires() {
        return wires;
    }

    /** @return the tank symbols */
    public List<TankMark> tanks() {
        return tanks;
    }

    /** @return drawing width, diagram units */
    public double width() {
        return width;
    }

    /** @return drawing height, diagram units */
    public double height() {
        return height;
    }

    /** @return the placed part of an id */
    public Placed placed(String id) {
        return placed.stream().filter(p -> p.part().id().equals(id)).findFirst()
                .orElseThrow(() -> new IllegalArgumentException("no part " + id));
    }

    /** @return the number of points where a drop of one node crosses the trunk of another */
    public int crossings() {
        int n = 0;
        for (Wire a : wires) {
            for (Drop d : a.drops()) {
                double lo = Math.min(d.from().y(), d.to().y());
                double hi = Math.max(d.from().y(), d.to().y());
                for (Wire b : wires) {
                    if (b != a && b.trunkY() > lo && b.trunkY() < hi && d.from().x() > b.x0() && d.from().x() < b.x1()) {
                        n++;
                    }
                }
            }
        }
        return n;
    }

    /** @return the layout of a netlist */
    public static CircuitLayout of(Netlist net) {
        List<Part> parts = net.parts();
        int n = parts.size();
        boolean[] flipped = new boolean[n];
        int[][] side = new int[n][];
        for (int i = 0; i < n; i++) {
            Part p = parts.get(i);
            flipped[i] = flipped(p, net.tanks());
            List<Point> local = Symbols.ports(p.kind(), p.ports().size());
            side[i] = new int[p.ports().size()];
            for (int k = 0; k < side[i].length; k++) {
                boolean drain = p.ports().get(k).equals("drain");
                int down = local.get(k).y() > 0 ? -1 : 1;
                side[i][k] = drain ? 0 : flipped[i] ? -down : down;
            }
        }
        int[] layer = LayerAssignment.layers(parts, side, net.tanks());
        int top = 0;
        for (int l : layer) {
            top = Math.max(top, l);
        }
        List<List<Integer>> rows = order(parts, layer, top, net.tanks());
        double[] x = xPositions(parts, rows, net.tanks());
        // channels: the channel above row L holds the trunks of nodes whose upper ports are in row L
        Map<String, List<int[]>> users = users(parts, net.tanks());
        Map<String, Integer> channel = new LinkedHashMap<>();
        for (Map.Entry<String, List<int[]>> e : users.entrySet()) {
            channel.put(e.getKey(), channel(e.getValue(), side, layer));
        }
        // y of rows, bottom up, before tracks are known: assign tracks per channel by interval packing
        Map<String, double[]> span = new LinkedHashMap<>();
        for (Map.Entry<String, List<int[]>> e : users.entrySet()) {
            double lo = Double.POSITIVE_INFINITY;
            double hi = Double.NEGATIVE_INFINITY;
            for (int[] u : e.getValue()) {
                double px = x[u[0]] + Symbols.ports(parts.get(u[0]).kind(), parts.get(u[0]).ports().size())
                        .get(u[1]).x();
                lo = Math.min(lo, px);
                hi = Math.max(hi, px);
            }
            span.put(e.getKey(), new double[] {lo, hi});
        }
        Map<String, Integer> track = new LinkedHashMap<>();
        Map<Integer, Integer> tracksIn = new TreeMap<>();
        for (int c = -1; c <= top; c++) {
            final int ch = c;
            List<String> here = channel.keySet().stream().filter(k -> channel.get(k) == ch)
                    .sorted(Comparator.comparingDouble((String k) -> span.get(k)[0])).toList();
            List<Double> ends = new ArrayList<>();
            for (String node : here) {
                int t = 0;
                while (t < ends.size() && ends.get(t) > span.get(node)[0] - GAP) {
                    t++;
                }
                if (t == ends.size()) {
                    ends.add(span.get(node)[1]);
                } else {
                    ends.set(t, span.get(node)[1]);
                }
                track.put(node, t);
            }
            tracksIn.put(c, ends.size());
        }
        // rows from the bottom (y measured upwards first, then turned)
        double[] rowUp = new double[top + 1];
        double below = tracksIn.getOrDefault(-1, 0) > 0
                ? TRACK_CLEARANCE + (tracksIn.get(-1) - 1) * TRACK_PITCH + TANK_ROOM : TANK_ROOM;
        rowUp[0] = below + Symbols.PORT_REACH;
        for (int l = 1; l <= top; l++) {
            int t = tracksIn.getOrDefault(l - 1, 0);
            rowUp[l] = rowUp[l - 1] + 2 * Symbols.PORT_REACH + TRACK_CLEARANCE + Math.max(t - 1, 0) * TRACK_PITCH
                    + TANK_ROOM;
        }
        double upper = tracksIn.getOrDefault(top, 0) > 0
                ? TRACK_CLEARANCE + (tracksIn.get(top) - 1) * TRACK_PITCH + 20 : 24;
        double height = rowUp[top] + Symbols.PORT_REACH + upper + MARGIN + TITLE_ROOM + MARGIN;
        double base = height - MARGIN;
        List<Placed> placed = new ArrayList<>();
        for (int i = 0; i < n; i++) {
            Part p = parts.get(i);
            double cy = base - rowUp[layer[i]];
            List<Point> pts = new ArrayList<>();
            for (Point q : Symbols.ports(p.kind(), p.ports().size())) {
                pts.add(new Point(x[i] + q.x(), cy + (flipped[i] ? -q.y() : q.y())));
            }
            placed.add(new Placed(p, layer[i], x[i], cy, flipped[i], pts, side[i]));
        }
        List<Wire> wires = new ArrayList<>();
        for (Map.Entry<String, List<int[]>> e : users.entrySet()) {
            int c = channel.get(e.getKey());
            double rowTop = c >= 0 ? base - rowUp[c] - Symbols.PORT_REACH : base - rowUp[0] + Symbols.PORT_REACH
                    + TANK_ROOM + TRACK_CLEARANCE;
            double y = c >= 0 ? rowTop - TRACK_CLEARANCE - track.get(e.getKey()) * TRACK_PITCH
                    : rowTop - TRACK_CLEARANCE + track.get(e.getKey()) * TRACK_PITCH;
            wires.add(wire(e.getKey(), e.getValue(), placed, y));
        }
        List<TankMark> marks = new ArrayList<>();
        for (Placed p : placed) {
            for (int k = 0; k < p.ports().size(); k++) {
                String node = p.part().nodes().get(k);
                if (net.tanks().contains(node)) {
                    marks.add(new TankMark(p.part().id(), p.part().ports().get(k), node, p.ports().get(k),
                            p.side()[k] == 1, p.side()[k] == 0, net.sources().contains(node)));
                }
            }
        }
        double width = 0;
        for (Placed p : placed) {
            width = Math.max(width, p.cx() + Symbols.extent(p.part().kind())[1]);
        }
        for (Wire w : wires) {
            width = Math.max(width, w.x1());
        }
        return new CircuitLayout(placed, wires, marks, Math.max(width + MARGIN, 320), height);
    }

    /**
     * @return whether the symbol is drawn with its first port on top: a relief valve hangs from the line it
     *         protects with its tank below; a two-port valve whose second port only reaches a tank is turned so
     *         that the tank is below
     */
    static boolean flipped(Part p, Set<String> tanks) {
        return switch (p.kind()) {
            case RELIEF_VALVE, PILOT_RELIEF_VALVE -> true;
            case ORIFICE, DIRECTIONAL_PATH, CHECK_VALVE, LINE ->
                    tanks.contains(p.nodes().get(1)) && !tanks.contains(p.nodes().get(0));
            default -> false;
        };
    }

    /** @return for each node that is not a tank, its users as {part index, port index} */
    private static Map<String, List<int[]>> users(List<Part> parts, Set<String> tanks) {
        Map<String, List<int[]>> users = new LinkedHashMap<>();
        for (int i = 0; i < parts.size(); i++) {
            for (int k = 0; k < parts.get(i).nodes().size(); k++) {
                String node = parts.get(i).nodes().get(k);
                if (!tanks.contains(node)) {
                    users.computeIfAbsent(node, key -> new ArrayList<>()).add(new int[] {i, k});
                }
            }
        }
        return users;
    }

    /**
     * @return the channel of a node (channel c lies above row c): above the highest row with an upper port on the
     *         node, else below the lowest row with a port on it
     */
    private static int channel(List<int[]> users, int[][] side, int[] layer) {
        int up = Integer.MIN_VALUE;
        int low = Integer.MAX_VALUE;
        for (int[] u : users) {
            if (side[u[0]][u[1]] == 1) {
                up = Math.max(up, layer[u[0]]);
            } else {
                low = Math.min(low, layer[u[0]]);
            }
        }
        return up == Integer.MIN_VALUE ? low - 1 : up;
    }

    private static Wire wire(String node, List<int[]> users, List<Placed> placed, double y) {
        List<Drop> drops = new ArrayList<>();
        double x0 = Double.POSITIVE_INFINITY;
        double x1 = Double.NEGATIVE_INFINITY;
        for (int[] u : users) {
            Placed p = placed.get(u[0]);
            Point from = p.ports().get(u[1]);
            drops.add(new Drop(p.part().id(), p.part().ports().get(u[1]), from, new Point(from.x(), y),
                    p.side()[u[1]] == 0));
            x0 = Math.min(x0, from.x());
            x1 = Math.max(x1, from.x());
        }
        List<Point> junctions = new ArrayList<>();
        for (Drop d : drops) {
            double px = d.to().x();
            int lines = 0;
            for (Drop e : drops) {
                if (Math.abs(e.to().x() - px) < 0.5 && e.from().y() != y) {
                    lines++;
                }
            }
            lines += (px > x0 + 0.5 ? 1 : 0) + (px < x1 - 0.5 ? 1 : 0);
            Point j = new Point(px, y);
            if (lines >= 3 && !junctions.contains(j)) {
                junctions.add(j);
            }
        }
        return new Wire(node, y, x0, x1, drops, junctions);
    }

    /** @return the parts of each row, left to right, after barycentre sweeps (Sugiyama et al. 1981, step 3) */
    private static List<List<Integer>> order(List<Part> parts, int[] layer, int top, Set<String> tanks) {
        List<List<Integer>> rows = new ArrayList<>();
        for (int l = 0; l <= top; l++) {
            rows.add(new ArrayList<>());
        }
        for (int i = 0; i < parts.size(); i++) {
            rows.get(layer[i]).add(i);
        }
        if (top == 0) {
            // one row, nothing to sweep against: keep the parts that share a node side by side
            rows.set(0, grouped(rows.get(0), parts, tanks));
            return rows;
        }
        double[] pos = new double[parts.size()];
        setPositions(rows, pos);
        for (int sweep = 0; sweep < 4; sweep++) {
            for (int l = 1; l <= top; l++) {
                sortByBarycentre(rows.get(l), pos, parts, tanks, layer, l, true);
                setPositions(rows, pos);
            }
            for (int l = top - 1; l >= 0; l--) {
                sortByBarycentre(rows.get(l), pos, parts, tanks, layer, l, false);
                setPositions(rows, pos);
            }
        }
        return rows;
    }

    private static void setPositions(List<List<Integer>> rows, double[] pos) {
        for (List<Integer> row : rows) {
            for (int k = 0; k < row.size(); k++) {
                pos[row.get(k)] = k - (row.size() - 1) / 2.0;
            }
        }
    }

    /**
     * Sorts a row by the mean position of the ports its parts connect to in the rows below (or above): a part's
     * position plus its port's offset from the part's centre in units of {@link #PORT_UNIT}, so that the part
     * feeding a cylinder's cap end lands under the cap end.
     */
    private static void sortByBarycentre(List<Integer> row, double[] pos, List<Part> parts, Set<String> tanks,
                                         int[] layer, int l, boolean fromBelow) {
        Map<Integer, Double> key = new LinkedHashMap<>();
        for (int v : row) {
            double sum = 0;
            int count = 0;
            for (String node : parts.get(v).nodes()) {
                if (tanks.contains(node)) {
                    continue;
                }
                for (int w = 0; w < pos.length; w++) {
                    if (w == v || (fromBelow ? layer[w] >= l : layer[w] <= l)) {
                        continue;
                    }
                    Part pw = parts.get(w);
                    List<Point> offsets = Symbols.ports(pw.kind(), pw.ports().size());
                    for (int k = 0; k < pw.nodes().size(); k++) {
                        if (pw.nodes().get(k).equals(node)) {
                            sum += pos[w] + offsets.get(k).x() / PORT_UNIT;
                            count++;
                        }
                    }
                }
            }
            key.put(v, count == 0 ? Double.NaN : sum / count);
        }
        // a part with no link that way sits just right of a part of its row it shares a node with
        for (int v : row) {
            if (Double.isNaN(key.get(v))) {
                double k = pos[v];
                for (int w : row) {
                    if (w != v && !Double.isNaN(key.get(w)) && shareNode(parts.get(v), parts.get(w), tanks)) {
                        k = key.get(w) + 1e-3;
                        break;
                    }
                }
                key.put(v, k);
            }
        }
        row.sort(Comparator.comparingDouble(key::get));
    }

    /** Horizontal distance that counts as one place in a row when ports are ordered, diagram units. */
    static final double PORT_UNIT = 150;

    /** @return the row with the parts that share nodes (directly or through others) next to each other */
    private static List<Integer> grouped(List<Integer> row, List<Part> parts, Set<String> tanks) {
        List<Integer> out = new ArrayList<>();
        for (int v : row) {
            if (out.contains(v)) {
                continue;
            }
            List<Integer> group = new ArrayList<>(List.of(v));
            for (int k = 0; k < group.size(); k++) {
                for (int w : row) {
                    if (!group.contains(w) && shareNode(parts.get(group.get(k)), parts.get(w), tanks)) {
                        group.add(w);
                    }
                }
            }
            group.sort(Comparator.comparingInt(row::indexOf));
            out.addAll(group);
        }
        return out;
    }

    private static boolean shareNode(Part a, Part b, Set<String> tanks) {
        for (String node : a.nodes()) {
            if (!tanks.contains(node) && b.nodes().contains(node)) {
                return true;
            }
        }
        return false;
    }

    /** @return which parts share a node other than a tank */
    private static boolean[][] links(List<Part> parts, Set<String> tanks) {
        int n = parts.size();
        boolean[][] linked = new boolean[n][n];
        for (int i = 0; i < n; i++) {
            for (int j = 0; j < n; j++) {
                if (i != j) {
                    for (String node : parts.get(i).nodes()) {
                        if (!tanks.contains(node) && parts.get(j).nodes().contains(node)) {
                            linked[i][j] = true;
                        }
                    }
                }
            }
        }
        return linked;
    }

    /**
     * @return each part's centre x: rows packed left to right, then, from the second row up, each part moved to the
     *         mean x of the parts below it connects to as far as its left neighbour allows
     */
    private static double[] xPositions(List<Part> parts, List<List<Integer>> rows, Set<String> tanks) {
        double[] x = new double[parts.size()];
        int[] layerOf = new int[parts.size()];
        for (int l = 0; l < rows.size(); l++) {
            for (int v : rows.get(l)) {
                layerOf[v] = l;
            }
        }
        for (int l = 0; l < rows.size(); l++) {
            double right = MARGIN;
            for (int v : rows.get(l)) {
                double left = leftReach(parts.get(v));
                double want = right + left;
                if (l > 0) {
                    double target = target(v, parts, x, layerOf, l, tanks);
                    if (!Double.isNaN(target)) {
                        want = Math.max(want, target);
                    }
                }
                x[v] = want;
                right = want + Symbols.extent(parts.get(v).kind())[1] + GAP;
            }
        }
        return x;
    }

    /**
     * @return the centre x that puts a part's ports right above the ports of the parts below they share a node
     *         with (the mean over those pairs), NaN when it shares none
     */
    private static double target(int v, List<Part> parts, double[] x, int[] layerOf, int l, Set<String> tanks) {
        Part pv = parts.get(v);
        List<Point> own = Symbols.ports(pv.kind(), pv.ports().size());
        double sum = 0;
        int count = 0;
        for (int i = 0; i < pv.nodes().size(); i++) {
            String node = pv.nodes().get(i);
            if (tanks.contains(node)) {
                continue;
            }
            for (int w = 0; w < parts.size(); w++) {
                if (w == v || layerOf[w] >= l) {
                    continue;
                }
                Part pw = parts.get(w);
                List<Point> theirs = Symbols.ports(pw.kind(), pw.ports().size());
                for (int k = 0; k < pw.nodes().size(); k++) {
                    if (pw.nodes().get(k).equals(node)) {
                        sum += x[w] + theirs.get(k).x() - own.get(i).x();
                        count++;
                    }
                }
            }
        }
        return count == 0 ? Double.NaN : sum / count;
    }

    /** @return how far left of its centre a part reaches with its id label, diagram units */
    static double leftReach(Part p) {
        return -Symbols.extent(p.kind())[0] + 6 + CHAR_WIDTH * p.id().length();
    }
}
