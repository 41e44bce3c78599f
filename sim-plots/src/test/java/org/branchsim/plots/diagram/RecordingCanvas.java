package org.branchsim.plots.diagram;

import java.util.ArrayList;
import java.util.List;

/** Keeps every primitive drawn, for tests that look at a drawing's parts. */
final class RecordingCanvas implements Canvas {

    /** One primitive: its kind ("line", "polygon", "filled", "circle", "disc", "text"), points, stroke, text. */
    record Drawn(String kind, List<Point> points, Stroke stroke, String text) {
    }

    final List<Drawn> drawn = new ArrayList<>();

    @Override
    public void polyline(List<Point> points, Stroke stroke) {
        drawn.add(new Drawn("line", List.copyOf(points), stroke, null));
    }

    @Override
    public void polygon(List<Point> points, boolean filled) {
        drawn.add(new Drawn(filled ? "filled" : "polygon", List.copyOf(points), Stroke.SOLID, null));
    }

    @Override
    public void circle(double x, double y, double r, boolean filled) {
        drawn.add(new Drawn(filled ? "disc" : "circle", List.of(new Point(x, y), new Point(x + r, y)), Stroke.SOLID,
                null));
    }

    @Override
    public void text(double x, double y, String text, Anchor anchor, double size, boolean grey) {
        drawn.add(new Drawn("text", List.of(new Point(x, y)), Stroke.SOLID, text));
    }

    long count(String kind) {
        return drawn.stream().filter(d -> d.kind().equals(kind)).count();
    }

    long dashed() {
        return drawn.stream().filter(d -> d.stroke() == Stroke.DASHED).count();
    }
}
