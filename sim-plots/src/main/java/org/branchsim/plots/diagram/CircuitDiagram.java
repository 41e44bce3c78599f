package org.branchsim.plots.diagram;

import java.awt.Color;
import java.awt.Graphics2D;
import java.awt.RenderingHints;
import java.awt.image.BufferedImage;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import javax.imageio.ImageIO;
import org.branchsim.core.model.CircuitModel;
import org.branchsim.plots.diagram.Canvas.Anchor;
import org.branchsim.plots.diagram.Canvas.Point;
import org.branchsim.plots.diagram.Canvas.Stroke;

/**
 * The circuit diagram of a scenario's netlist in the manner of ISO 1219-1:2012 and ISO 1219-2 (graphical symbols
 * and circuit diagrams): each element's symbol with its id beside it, working lines solid, pilot and drain lines
 * dashed, connection dots where three or more lines meet, a tank symbol at every port on a tank, each node's name
 * (grey, italic) on its line; supply at the bottom, actuators at the top ({@link CircuitLayout}). Drawn once through
 * the {@link Canvas} primitives into SVG text or a PNG image, so both show the same drawing.
 */
public final class CircuitDiagram {

    /** Scale of the PNG over the diagram units (2 px per unit, sharp when printed). */
    public static final double PNG_SCALE = 2;
    private static final double ID_SIZE = 11;
    private static final double NODE_SIZE = 10;

    private final CircuitLayout layout;
    private final String title;
    private final String description;

    private CircuitDiagram(CircuitLayout layout, String title, String description) {
        this.layout = layout;
        this.title = title;
        this.description = description == null ? "" : description;
    }

    /** @return the diagram of a netlist under a title */
    public static CircuitDiagram of(Netlist netlist, String title) {
        return new CircuitDiagram(CircuitLayout.of(netlist), title, "");
    }

    /** @return the diagram of a circuit model under a title */
    public static CircuitDiagram of(CircuitModel model, String title) {
        return of(Netlist.of(model), title);
    }

    /**
     * @param description what the circuit is for (the scenario's description), kept in the SVG's {@code <desc>}
     *        element (SVG 1.1, section 5.4) so that the file carries it; empty for none
     * @return this diagram with a description
     */
    public CircuitDiagram describedAs(String description) {
        return new CircuitDiagram(layout, title, description);
    }

    /** @return the layout the diagram draws */
    public CircuitLayout layout() {
        return layout;
    }

    /** Draws the whole diagram onto a canvas. */
    public void draw(Canvas c) {
        c.text(CircuitLayout.MARGIN, CircuitLayout.MARGIN + 8, title, Anchor.START, 14, false);
        for (CircuitLayout.Placed p : layout.placed()) {
            Symbols.draw(p.part().kind(), new Pen(c, p.cx(), p.cy(), p.flipped()), p.part().ports().size());
            double left = p.cx() + Symbols.extent(p.part().kind())[0] - 6;
            c.text(left, p.cy() + 4, p.part().id(), Anchor.END, ID_SIZE, false);
        }
        for (CircuitLayout.Wire w : layout.wires()) {
            if (w.x1() > w.x0()) {
                c.polyline(List.of(new Point(w.x0(), w.trunkY()), new Point(w.x1(), w.trunkY())), Stroke.SOLID);
            }
            for (CircuitLayout.Drop d : w.drops()) {
                if (d.from().y() != d.to().y()) {
                    c.polyline(List.of(d.from(), d.to()), d.dashed() ? Stroke.DASHED : Stroke.SOLID);
                }
            }
            for (Point j : w.junctions()) {
                c.circle(j.x(), j.y(), 2.6, true);
            }
            c.text(w.x0() + 4, w.trunkY() - 3, w.node(), Anchor.START, NODE_SIZE, true);
        }
        for (CircuitLayout.TankMark t : layout.tanks()) {
            tank(c, t);
        }
    }

    /**
     * A tank (reservoir open to atmosphere, ISO 1219-1: an open-topped rectangle with the line entering from above
     * and ending below the fluid surface) at a port: under a port that points down, beside one that points up.
     */
    private static void tank(Canvas c, CircuitLayout.TankMark t) {
        if (t.source()) {
            source(c, t);
            return;
        }
        Stroke s = t.dashed() ? Stroke.DASHED : Stroke.SOLID;
        double x = t.at().x();
        double y = t.at().y();
        double top;
        if (t.up()) {
            x += 26;
            c.polyline(List.of(t.at(), new Point(t.at().x(), y - 10), new Point(x, y - 10), new Point(x, y + 4)), s);
            top = y - 3;
        } else {
            c.polyline(List.of(t.at(), new Point(x, y + 17)), s);
            top = y + 9;
        }
        c.polyline(List.of(new Point(x - 11, top), new Point(x - 11, top + 12), new Point(x + 11, top + 12),
                new Point(x + 11, top)), Stroke.SOLID);
    }

    /**
     * A hydraulic pressure source (ISO 1219-1: a circle with a filled triangle pointing the way the fluid leaves
     * it), with the node's name beside it, at a port on a tank node held at a pressure.
     */
    private static void source(Canvas c, CircuitLayout.TankMark t) {
        double x = t.at().x();
        double y = t.at().y();
        double dir = t.up() ? -1 : 1;
        double r = 9;
        double cy = y + dir * (8 + r);
        c.polyline(List.of(t.at(), new Point(x, y + dir * 8)), Stroke.SOLID);
        c.circle(x, cy, r, false);
        c.polygon(List.of(new Point(x, cy - dir * r), new Point(x - 5, cy - dir * (r - 8)),
                new Point(x + 5, cy - dir * (r - 8))), true);
        c.text(x + r + 4, cy + 4, t.node(), Anchor.START, NODE_SIZE, true);
    }

    /** @return the diagram as one SVG document */
    public String svg() {
        SvgCanvas c = new SvgCanvas(layout.width(), layout.height());
        draw(c);
        return "<?xml version=\"1.0\" encoding=\"UTF-8\"?>\n" + c.svg(title, description);
    }

    /** @return the diagram as an {@code <svg>} element to put inside an HTML page */
    public String inlineSvg() {
        SvgCanvas c = new SvgCanvas(layout.width(), layout.height());
        draw(c);
        return c.svg(title, description);
    }

    /** Writes the SVG document (UTF-8). @throws IOException when the file cannot be written */
    public void writeSvg(Path file) throws IOException {
        Files.writeString(file, svg(), StandardCharsets.UTF_8);
    }

    /** @return the diagram rasterised with Java2D at {@link #PNG_SCALE} px per unit, white background */
    public BufferedImage image() {
        int w = (int) Math.ceil(layout.width() * PNG_SCALE);
        int h = (int) Math.ceil(layout.height() * PNG_SCALE);
        BufferedImage img = new BufferedImage(w, h, BufferedImage.TYPE_INT_RGB);
        Graphics2D g = img.createGraphics();
        try {
            g.setRenderingHint(RenderingHints.KEY_ANTIALIASING, RenderingHints.VALUE_ANTIALIAS_ON);
            g.setRenderingHint(RenderingHints.KEY_TEXT_ANTIALIASING, RenderingHints.VALUE_TEXT_ANTIALIAS_ON);
            g.setRenderingHint(RenderingHints.KEY_STROKE_CONTROL, RenderingHints.VALUE_STROKE_PURE);
            g.setColor(Color.WHITE);
            g.fillRect(0, 0, w, h);
            g.scale(PNG_SCALE, PNG_SCALE);
            draw(new Java2dCanvas(g));
        } finally {
            g.dispose();
        }
        return img;
    }

    /** Writes the PNG image. @throws IOException when the file cannot be written */
    public void writePng(Path file) throws IOException {
        if (!ImageIO.write(image(), "png", file.toFile())) {
            throw new IOException("no PNG writer");
        }
    }
}
