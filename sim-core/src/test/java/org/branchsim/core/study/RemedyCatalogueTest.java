package org.branchsim.core.study;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.List;
import org.branchsim.core.scenario.DocumentParser;
import org.branchsim.core.scenario.Located;
import org.branchsim.core.units.UnitSystem;
import org.junit.jupiter.api.Test;

/**
 * The remedy candidates come from the descriptors: for a hunting main stage of a pilot-operated reducing valve
 * they are the cures the trade names, in the order a fluid-power engineer tries them, over the ranges stated in
 * docs/scenario-format.md (common practice, no source: dampings x0.3 to x20, orifices and springs x0.5 to x2,
 * volumes x0.25 to x4, metering width x0.25 to x1). The demo is scenarios/pilot-supply-hunting.json: spool damping
 * 5 N*s/m, damping orifice 0.4 mm, spring chamber 12 cm^3, metering width 6 mm, pilot damping 60 N*s/m and pilot
 * spring 15 N/mm; supply volume 0.5 L.
 */
class RemedyCatalogueTest {

    private static final Located DEMO = DocumentParser.parse(Path.of("..", "scenarios", "pilot-supply-hunting.json"));
    private static final double TOLERANCE = 1e-12;

    private static void assertKnob(RemedyKnob k, String path, double current, double lowest, double highest) {
        assertEquals(path, k.path());
        assertEquals(current, k.current(), TOLERANCE * Math.abs(current), path);
        assertEquals(lowest, k.lowest(), TOLERANCE * Math.abs(lowest), path);
        assertEquals(highest, k.highest(), TOLERANCE * Math.abs(highest), path);
    }

    @Test
    void aHuntingMainStageGetsTheTradesCuresInOrder() {
        List<RemedyKnob> knobs = RemedyCatalogue.knobs(DEMO, List.of("pilotReducer.spool"));
        assertEquals(4, knobs.size(), knobs.toString());
        assertKnob(knobs.get(0), "elements.pilotReducer.spool.damping", 5.0, 1.5, 100.0);
        assertKnob(knobs.get(1), "elements.pilotReducer.dampingOrifice.diameter", 0.4e-3, 0.2e-3, 0.8e-3);
        assertKnob(knobs.get(2), "elements.pilotReducer.chamberVolume", 12e-6, 3e-6, 48e-6);
        assertKnob(knobs.get(3), "elements.pilotReducer.spool.meteringWidth", 6e-3, 1.5e-3, 6e-3);
        assertEquals("a larger damping orifice of 0.8 mm (drilled out)", knobs.get(1).hardware(0.8e-3, UnitSystem.METRIC));
        assertEquals("metering slots instead of a full edge, 3 mm of metering width",
                knobs.get(3).hardware(3e-3, UnitSystem.METRIC));
    }

    @Test
    void aChatteringPilotAndANodeGetTheirOwn() {
        List<RemedyKnob> knobs = RemedyCatalogue.knobs(DEMO, List.of("pilotReducer.pilot", "supply", "tank"));
        assertEquals(5, knobs.size(), knobs.toString());
        assertKnob(knobs.get(0), "elements.pilotReducer.pilot.damping", 60.0, 18.0, 1200.0);
        assertKnob(knobs.get(1), "elements.pilotReducer.pilot.springRate", 15e3, 7.5e3, 30e3);
        assertKnob(knobs.get(2), "elements.pilotReducer.dampingOrifice.diameter", 0.4e-3, 0.2e-3, 0.8e-3);
        assertKnob(knobs.get(3), "elements.pilotReducer.chamberVolume", 12e-6, 3e-6, 48e-6);
        assertKnob(knobs.get(4), "nodes.supply.volume", 0.5e-3, 0.125e-3, 2e-3);
        assertTrue(knobs.get(4).hardware(1e-3, UnitSystem.METRIC).startsWith("more volume at supply"));
        // a relief poppet left undamped is searched over an absolute range (10 to 2000 N*s/m, common practice)
        Located undamped = DEMO.copy();
        ((Located.Obj) ((Located.Arr) ((Located.Obj) undamped).get("elements")).items().get(1)).set("damping",
                new Located.Scalar("0 N*s/m", 1, 1));
        RemedyKnob poppet = RemedyCatalogue.knobs(undamped, List.of("relief.poppet")).get(0);
        assertKnob(poppet, "elements.relief.damping", 0.0, 10.0, 2000.0);
        assertTrue(poppet.absolute());
    }
}
