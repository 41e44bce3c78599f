/**
 * Circuit diagrams of a scenario's netlist after ISO 1219-1:2012 (symbols) and ISO 1219-2 (circuit diagrams):
 * {@link org.branchsim.plots.diagram.Netlist} (what is drawn), {@link org.branchsim.plots.diagram.CircuitLayout}
 * (layered layout after Sugiyama, Tagawa and Toda 1981: supply at the bottom, actuators at the top, barycentre
 * ordering), and {@link org.branchsim.plots.diagram.CircuitDiagram}, which draws symbols, lines and labels through
 * the {@link org.branchsim.plots.diagram.Canvas} primitives into SVG text or a Java2D PNG. Coordinates are diagram
 * units (1 unit = 1 SVG user unit = {@link org.branchsim.plots.diagram.CircuitDiagram#PNG_SCALE} PNG pixels).
 */
package org.branchsim.plots.diagram;
