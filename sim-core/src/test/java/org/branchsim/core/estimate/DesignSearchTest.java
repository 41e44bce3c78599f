package org.branchsim.core.estimate;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;

/**
 * The design search on Rosenbrock's function f(x, y) = (1 - x)^2 + 100 (y - x^2)^2 (H. H. Rosenbrock, "An
 * automatic method for finding the greatest or least value of a function", Computer J. 3, 1960): its minimum is
 * f = 0 at (1, 1); with x bounded to [-2, 0.5], the minimum lies on the bound at (0.5, 0.25) with f = 0.25, since
 * f >= (1 - x)^2 >= 0.25 there with equality only at y = x^2.
 */
class DesignSearchTest {

    private static double rosenbrock(double x, double y) {
        return (1 - x) * (1 - x) + 100 * (y - x * x) * (y - x * x);
    }

    private static DesignSearch.Result search(double xLow, double xHigh, double yLow, double yHigh, int maxRuns) {
        return DesignSearch.minimise(points -> points.stream().mapToDouble(u -> rosenbrock(xLow + u[0] * (xHigh - xLow),
                yLow + u[1] * (yHigh - yLow))).toArray(), 2, 9, 2, maxRuns, 2, 1e-8);
    }

    @Test
    void findsTheUnboundedMinimumInsideTheBox() {
        DesignSearch.Result r = search(-2, 2, -1, 3, 1500);
        double x = -2 + 4 * r.best().u()[0];
        double y = -1 + 4 * r.best().u()[1];
        assertEquals(1.0, x, 0.01);
        assertEquals(1.0, y, 0.02);
        assertEquals(0.0, r.best().value(), 1e-4);
        assertTrue(r.points().size() <= 1500, "the budget holds");
    }

    @Test
    void findsTheMinimumOnABound() {
        DesignSearch.Result r = search(-2, 0.5, -1, 3, 1500);
        double x = -2 + 2.5 * r.best().u()[0];
        double y = -1 + 4 * r.best().u()[1];
        assertEquals(0.5, x, 1e-3);
        assertEquals(0.25, y, 0.01);
        assertEquals(0.25, r.best().value(), 1e-3);
        List<DesignSearch.Point> ranked = r.ranked();
        assertEquals(r.best(), ranked.get(0));
    }

    @Test
    void haltonPointsAreTheRadicalInverses() {
        // Halton 1960: index 1, 2, 3 in base 2 -> 1/2, 1/4, 3/4; in base 3 -> 1/3, 2/3, 1/9
        assertEquals(0.75, DesignOfExperiments.halton(3, 2)[0], 1e-15);
        assertEquals(1.0 / 9, DesignOfExperiments.halton(3, 2)[1], 1e-15);
        assertEquals(2.0 / 3, DesignOfExperiments.halton(2, 2)[1], 1e-15);
    }
}
