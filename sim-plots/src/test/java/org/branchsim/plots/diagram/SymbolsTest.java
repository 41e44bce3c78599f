package org.branchsim.plots.diagram;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.branchsim.plots.diagram.Canvas.Point;
import org.junit.jupiter.api.Test;

/**
 * Each element kind's symbol follows the rules of ISO 1219-1:2012 (Fluid power systems and components, graphical
 * symbols and circuit diagrams, part 1): valves in square envelopes; energy conversion units in a circle with a
 * filled triangle, pointing out of a pump and into a motor; normally open valves with the flow arrow in line with
 * the ports, normally closed ones with it beside them; pilot and drain lines dashed; springs as zigzags; a check
 * valve's ball on a seat; a gas-loaded accumulator with its separator.
 */
class SymbolsTest {

    private static RecordingCanvas draw(SymbolKind kind) {
        RecordingCanvas c = new RecordingCanvas();
        Symbols.draw(kind, new Pen(c, 0, 0, false), kind == SymbolKind.GENERIC ? 2 : kind.ports().size());
        return c;
    }

    /** A square envelope: a closed outline of four corners, equal sides (ISO 1219-1:2012, valve envelope). */
    private static boolean hasSquare(RecordingCanvas c) {
        return c.drawn.stream().filter(d -> d.kind().equals("polygon") && d.points().size() == 4).anyMatch(d -> {
            double w = Math.abs(d.points().get(1).x() - d.points().get(0).x());
            double h = Math.abs(d.points().get(2).y() - d.points().get(1).y());
            return w > 10 && Math.abs(w - h) < 1e-9;
        });
    }

    /** @return x of the shaft of the flow arrow: the line that ends at a filled arrowhead inside the envelope */
    private static double arrowX(RecordingCanvas c) {
        return c.drawn.stream().filter(d -> d.kind().equals("line") && d.points().size() == 2
                        && d.points().get(0).x() == d.points().get(1).x() && Math.abs(d.points().get(0).y()) < Symbols.HALF)
                .mapToDouble(d -> d.points().get(0).x()).findFirst().orElse(Double.NaN);
    }

    @Test
    void everyKindHasASymbolAndPortsForEachOfItsPorts() {
        for (SymbolKind k : SymbolKind.values()) {
            RecordingCanvas c = draw(k);
            assertTrue(c.drawn.size() >= 2, k + " draws " + c.drawn.size() + " primitives");
            int ports = k == SymbolKind.GENERIC ? 2 : k.ports().size();
            List<Point> ends = Symbols.ports(k, ports);
            assertEquals(ports, ends.size(), k.toString());
            for (Point end : ends) {
                // a line of the symbol reaches every port's end
                assertTrue(c.drawn.stream().anyMatch(d -> d.kind().equals("line") && d.points().contains(end)),
                        k + ": no line reaches port end " + end);
            }
        }
    }

    @Test
    void valvesAreDrawnInSquareEnvelopes() {
        // ISO 1219-1:2012: a valve's function is drawn in a square (one square per position)
        for (SymbolKind k : List.of(SymbolKind.RELIEF_VALVE, SymbolKind.DIRECT_REDUCING_VALVE,
                SymbolKind.PILOT_REDUCING_VALVE, SymbolKind.DIRECTIONAL_PATH)) {
            assertTrue(hasSquare(draw(k)), k + " has no square envelope");
        }
    }

    @Test
    void pumpTriangleLeavesTheCircleAndMotorTriangleEntersIt() {
        // ISO 1219-1:2012: the filled triangle shows the flow direction, outwards for a pump, inwards for a motor
        RecordingCanvas pump = draw(SymbolKind.PUMP);
        RecordingCanvas motor = draw(SymbolKind.MOTOR);
        assertEquals(1, pump.count("circle"));
        assertEquals(1, motor.count("circle"));
        List<Point> tp = pump.drawn.stream().filter(d -> d.kind().equals("filled")).findFirst().orElseThrow().points();
        List<Point> tm = motor.drawn.stream().filter(d -> d.kind().equals("filled")).findFirst().orElseThrow().points();
        double r = 18;
        // the apex (first point) of the pump's triangle is on the circle at the outlet (top), the base inside
        assertEquals(-r, tp.get(0).y(), 1e-9);
        assertTrue(Math.abs(tp.get(1).y()) < r);
        // the apex of the motor's triangle points to the centre, from the inlet side (bottom)
        assertTrue(tm.get(0).y() < tm.get(1).y() && tm.get(0).y() > 0);
    }

    @Test
    void normallyOpenArrowsRunInLineWithThePortsAndNormallyClosedBesideThem() {
        // ISO 1219-1:2012: a pressure reducing valve is normally open, a relief valve normally closed
        assertEquals(0.0, arrowX(draw(SymbolKind.DIRECT_REDUCING_VALVE)), 1e-9);
        assertEquals(0.0, arrowX(draw(SymbolKind.PILOT_REDUCING_VALVE)), 1e-9);
        assertEquals(0.0, arrowX(draw(SymbolKind.DIRECTIONAL_PATH)), 1e-9);
        assertFalse(Math.abs(arrowX(draw(SymbolKind.RELIEF_VALVE))) < 1, "relief arrow must be beside the ports");
    }

    @Test
    void pilotAndDrainLinesAreDashed() {
        // ISO 1219-1:2012 line types: pilot and drain lines dashed. The relief valve has its inlet pilot line; a
        // direct reducing valve its outlet pilot and its drain; a pilot-operated one also the line to its pilot stage
        assertTrue(draw(SymbolKind.RELIEF_VALVE).dashed() >= 1);
        assertTrue(draw(SymbolKind.DIRECT_REDUCING_VALVE).dashed() >= 2);
        assertTrue(draw(SymbolKind.PILOT_REDUCING_VALVE).dashed() >= 3);
        // ISO 1219-1: a pilot-operated relief valve's pilot and drain lines are dashed, as the reducing valve's
        assertTrue(draw(SymbolKind.PILOT_RELIEF_VALVE).dashed() >= 3);
        assertEquals(0, draw(SymbolKind.PUMP).dashed());
        assertEquals(0, draw(SymbolKind.CYLINDER).dashed());
    }

    @Test
    void pilotOperatedValveShowsAMainAndAPilotStageWithAnAdjustableSpring() {
        RecordingCanvas c = draw(SymbolKind.PILOT_REDUCING_VALVE);
        // two envelopes (main stage and pilot stage) and two arrowheads for flow plus one for the adjustment
        assertTrue(c.drawn.stream().filter(d -> d.kind().equals("polygon") && d.points().size() == 4).count() >= 2);
        assertTrue(c.count("filled") >= 3, "arrowheads: " + c.count("filled"));
    }

    @Test
    void checkValveIsABallOnASeatAndAccumulatorHasASeparator() {
        RecordingCanvas check = draw(SymbolKind.CHECK_VALVE);
        assertEquals(1, check.count("circle"));
        RecordingCanvas acc = draw(SymbolKind.ACCUMULATOR);
        assertTrue(acc.drawn.stream().anyMatch(d -> d.kind().equals("polygon") && d.points().size() > 12),
                "capsule outline");
        assertEquals(1, acc.count("filled"), "gas-side triangle");
    }

    @Test
    void elementClassesMapToTheirKinds() {
        assertEquals(SymbolKind.PILOT_REDUCING_VALVE, SymbolKind.ofClass("PilotReducingValve"));
        assertEquals(SymbolKind.DIRECTIONAL_PATH, SymbolKind.ofClass("MeteringPath"));
        assertEquals(SymbolKind.ACCUMULATOR, SymbolKind.ofClass("Accumulator"));
        assertEquals(SymbolKind.LINE, SymbolKind.ofClass("HydraulicLine"));
        assertEquals(SymbolKind.COMPENSATED_PUMP, SymbolKind.ofClass("CompensatedPump"));
        assertEquals(SymbolKind.PILOT_RELIEF_VALVE, SymbolKind.ofClass("PilotReliefValve"));
        assertEquals(SymbolKind.GENERIC, SymbolKind.ofClass("SomethingNew"));
    }
}
