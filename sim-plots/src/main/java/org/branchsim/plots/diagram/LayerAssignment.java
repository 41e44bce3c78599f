package org.branchsim.plots.diagram;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;

/**
 * The first two steps of the layered drawing method of Sugiyama, Tagawa and Toda ("Methods for visual
 * understanding of hierarchical system structures", IEEE Trans. Systems, Man, and Cybernetics 11(2), 1981):
 * the parts become a directed graph (an edge runs from a part whose upper port feeds a node to a part whose lower
 * port draws from it), edges that close a cycle are set aside by a depth-first search from the pumps, and each
 * part's layer is
 * the length of the longest path reaching it from a source, so that the pump sits in the bottom layer and the
 * actuators, pushed to the top layer, above everything they are fed from. A part that no edge reaches (a relief
 * valve hanging from the pump line, a meter-out path under a cylinder) is put in the row of the parts it hangs
 * from, or just below the part it feeds.
 */
final class LayerAssignment {

    private LayerAssignment() {
    }

    /**
     * @param parts the parts
     * @param up for each part and port: +1 for a port drawn on top, -1 below, 0 for a drain (no direction)
     * @param tanks tank node ids (not graph connections)
     * @return each part's layer, 0 = bottom
     */
    static int[] layers(List<Part> parts, int[][] up, Set<String> tanks) {
        int n = parts.size();
        List<List<Integer>> succ = new ArrayList<>();
        List<List<Integer>> pred = new ArrayList<>();
        for (int i = 0; i < n; i++) {
            succ.add(new ArrayList<>());
            pred.add(new ArrayList<>());
        }
        for (int i = 0; i < n; i++) {
            for (int j = 0; j < n; j++) {
                if (i != j && feeds(parts.get(i), up[i], parts.get(j), up[j], tanks)) {
                    succ.get(i).add(j);
                }
            }
        }
        dropBackEdges(succ, parts);
        for (int i = 0; i < n; i++) {
            for (int j : succ.get(i)) {
                pred.get(j).add(i);
            }
        }
        int[] layer = new int[n];
        for (int i : topologicalOrder(succ, pred)) {
            for (int p : pred.get(i)) {
                layer[i] = Math.max(layer[i], layer[p] + 1);
            }
        }
        int top = 0;
        for (int i = 0; i < n; i++) {
            if (!parts.get(i).kind().actuator()) {
                top = Math.max(top, layer[i]);
            }
        }
        for (int i = 0; i < n; i++) {
            if (parts.get(i).kind().actuator() && succ.get(i).isEmpty()) {
                layer[i] = Math.max(layer[i], top + 1);
            }
        }
        for (int i = 0; i < n; i++) {
            if (pred.get(i).isEmpty() && !parts.get(i).kind().supply()) {
                hang(i, parts, up, tanks, layer, succ);
            }
        }
        int min = Integer.MAX_VALUE;
        for (int l : layer) {
            min = Math.min(min, l);
        }
        for (int i = 0; i < n; i++) {
            layer[i] -= min;
        }
        return layer;
    }

    /** @return whether an upper port of part a and a lower port of part b meet at a node that is not a tank */
    private static boolean feeds(Part a, int[] upA, Part b, int[] upB, Set<String> tanks) {
        for (int i = 0; i < a.nodes().size(); i++) {
            if (upA[i] != 1 || tanks.contains(a.nodes().get(i))) {
                continue;
            }
            for (int j = 0; j < b.nodes().size(); j++) {
                if (upB[j] == -1 && b.nodes().get(j).equals(a.nodes().get(i))) {
                    return true;
                }
            }
        }
        return false;
    }

    /** Places a part no edge reaches in the row of the parts whose upper ports share its upper port's node. */
    private static void hang(int i, List<Part> parts, int[][] up, Set<String> tanks, int[] layer,
                             List<List<Integer>> succ) {
        Part p = parts.get(i);
        int best = Integer.MAX_VALUE;
        for (int k = 0; k < p.nodes().size(); k++) {
            String node = p.nodes().get(k);
            if (tanks.contains(node) || up[i][k] == 0) {
                continue;
            }
            int sameSide = Integer.MIN_VALUE;
            int below = Integer.MAX_VALUE;
            for (int j = 0; j < parts.size(); j++) {
                if (j == i) {
                    continue;
                }
                for (int m = 0; m < parts.get(j).nodes().size(); m++) {
                    if (parts.get(j).nodes().get(m).equals(node)) {
                        if (up[j][m] == up[i][k]) {
                            sameSide = Math.max(sameSide, layer[j]);
                        } else if (up[j][m] == -up[i][k]) {
                            below = Math.min(below, layer[j] - 1);
                        }
                    }
                }
            }
            if (sameSide != Integer.MIN_VALUE) {
                best = Math.min(best, sameSide);
            } else if (below != Integer.MAX_VALUE) {
                best = Math.min(best, below);
            }
        }
        if (best == Integer.MAX_VALUE) {
            return;
        }
        for (int s : succ.get(i)) {
            best = Math.min(best, layer[s] - 1);
        }
        layer[i] = Math.max(best, 0);
    }

    /** Removes the edges a depth-first search from the pumps finds closing a cycle (Sugiyama step 1). */
    private static void dropBackEdges(List<List<Integer>> succ, List<Part> parts) {
        int n = succ.size();
        int[] state = new int[n];
        List<Integer> roots = new ArrayList<>();
        for (int i = 0; i < n; i++) {
            if (parts.get(i).kind().supply()) {
                roots.add(i);
            }
        }
        for (int i = 0; i < n; i++) {
            roots.add(i);
        }
        for (int r : roots) {
            if (state[r] == 0) {
                visit(r, succ, state);
            }
        }
    }

    private static void visit(int v, List<List<Integer>> succ, int[] state) {
        state[v] = 1;
        List<Integer> keep = new ArrayList<>();
        for (int w : succ.get(v)) {
            if (state[w] == 1) {
                continue;
            }
            keep.add(w);
            if (state[w] == 0) {
                visit(w, succ, state);
            }
        }
        succ.set(v, keep);
        state[v] = 2;
    }

    private static List<Integer> topologicalOrder(List<List<Integer>> succ, List<List<Integer>> pred) {
        int n = succ.size();
        Map<Integer, Integer> missing = new HashMap<>();
        List<Integer> order = new ArrayList<>();
        for (int i = 0; i < n; i++) {
            missing.put(i, pred.get(i).size());
            if (pred.get(i).isEmpty()) {
                order.add(i);
            }
        }
        for (int k = 0; k < order.size(); k++) {
            for (int w : succ.get(order.get(k))) {
                int m = missing.merge(w, -1, Integer::sum);
                if (m == 0) {
                    order.add(w);
                }
            }
        }
        return order;
    }
}
