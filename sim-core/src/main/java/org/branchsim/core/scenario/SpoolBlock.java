package org.branchsim.core.scenario;

import java.util.ArrayList;
import java.util.List;
import org.branchsim.core.elements.MeteringEdge;
import org.branchsim.core.elements.SpoolEndChamber;
import org.branchsim.core.units.Dimension;

/** The spool block of both reducing valves: metering geometry, mass, spring, damping, stroke, end orifice. */
final class SpoolBlock {

    /** Default discharge coefficient of a spool's metering edge (common practice, no source). */
    static final double SPOOL_CD = 0.7;

    private SpoolBlock() {
    }

    /**
     * @param damping the spool's damping field (it carries the spool's remedy role in this valve)
     * @param springRate the spool's spring rate field
     * @param meteringWidth the metering width field
     * @param endOrificeDiameter the end orifice's diameter field
     * @param more fields this valve's spool adds (a spring preload), placed after the spring rate
     * @return the spool block
     */
    static BlockSpec spec(FieldSpec damping, FieldSpec springRate, FieldSpec meteringWidth,
                          FieldSpec endOrificeDiameter, FieldSpec... more) {
        List<FieldSpec> f = new ArrayList<>(List.of(
                FieldSpec.positive("diameter", Dimension.LENGTH).meaning("spool diameter; its end area takes the pressures"),
                meteringWidth,
                FieldSpec.positive("openLength", Dimension.LENGTH).meaning("edge opening on the open stop"),
                FieldSpec.positive("stroke", Dimension.LENGTH).meaning("spool travel, longer than `openLength`"),
                FieldSpec.nonNegative("notchLength", Dimension.LENGTH).byDefault("0 mm")
                        .meaning("V-notch: still passes flow over this length after the edge closes"),
                FieldSpec.nonNegative("notchArea", Dimension.AREA).byDefault("0 mm^2")
                        .meaning("the notch's area when the edge is just closing"),
                FieldSpec.positive("mass", Dimension.MASS).meaning("moving mass of the spool"),
                springRate));
        f.addAll(List.of(more));
        f.add(damping);
        f.add(FieldSpec.number("cd", 0.05, 1.0, SPOOL_CD).meaning("metering discharge coefficient"));
        f.add(FieldSpec.block("endOrifice", BlockSpec.of("endOrifice", endOrificeDiameter, CommonFields.sharpEdgeCd(),
                        FieldSpec.positive("chamberVolume", Dimension.VOLUME).byDefault("0.5 cm^3")
                                .meaning("dead volume of the spool end chamber")))
                .meaning("outlet pressure reaches the spool end through this orifice (hydraulic damping), e.g. "
                        + "`{ \"diameter\": \"0.4 mm\" }`; none when left out"));
        return new BlockSpec("spool", f, List.of(), List.of(SpoolBlock::strokeLongerThanOpening));
    }

    /** @return a metering width field, by default the full circumference */
    static FieldSpec meteringWidth() {
        return FieldSpec.positive("meteringWidth", Dimension.LENGTH).computedDefault(Double.NaN, "π × diameter")
                .meaning("width of the metering edge (less for slots)");
    }

    /** @return a spool spring rate field */
    static FieldSpec springRate() {
        return FieldSpec.nonNegative("springRate", Dimension.STIFFNESS).meaning("spool spring rate");
    }

    /** @return an end orifice diameter field */
    static FieldSpec endOrificeDiameter() {
        return FieldSpec.positive("diameter", Dimension.LENGTH).meaning("diameter of the end orifice");
    }

    private static void strokeLongerThanOpening(Reading r) {
        if (r.valid("openLength", "stroke") && r.si("stroke") <= r.si("openLength")) {
            r.refuse("stroke", "a stroke longer than openLength (the spool must be able to close)");
        }
    }

    /** @return the metering edge of a spool block read */
    static MeteringEdge edge(Reading s) {
        double d = s.si("diameter");
        double width = s.has("meteringWidth") ? s.si("meteringWidth") : Math.PI * d;
        return new MeteringEdge(d, width, s.si("openLength"), s.si("notchLength"), s.si("notchArea"), s.si("cd"));
    }

    /** @return the end chamber of a spool block read, or null when it has no end orifice */
    static SpoolEndChamber endChamber(Reading s) {
        Reading e = s.block("endOrifice");
        return e == null ? null : new SpoolEndChamber(e.si("chamberVolume"), e.si("diameter"), e.si("cd"));
    }
}
