package org.branchsim.cli;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.JsonNodeFactory;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.math.BigDecimal;
import java.math.BigInteger;
import org.branchsim.core.scenario.Located;

/** Writes a scenario document (as read, possibly with values changed) back as JSON, keys in document order. */
final class LocatedJson {

    private LocatedJson() {
    }

    /** @return the document as a Jackson tree */
    static JsonNode of(Located l) {
        JsonNodeFactory f = JsonNodeFactory.instance;
        if (l instanceof Located.Obj o) {
            ObjectNode n = f.objectNode();
            for (String k : o.keys()) {
                n.set(k, of(o.get(k)));
            }
            return n;
        }
        if (l instanceof Located.Arr a) {
            ArrayNode n = f.arrayNode();
            a.items().forEach(i -> n.add(of(i)));
            return n;
        }
        Object v = ((Located.Scalar) l).value();
        if (v == null) {
            return f.nullNode();
        }
        if (v instanceof Boolean b) {
            return f.booleanNode(b);
        }
        if (v instanceof Integer i) {
            return f.numberNode(i);
        }
        if (v instanceof Long i) {
            return f.numberNode(i);
        }
        if (v instanceof BigInteger i) {
            return f.numberNode(i);
        }
        if (v instanceof BigDecimal d) {
            return f.numberNode(d);
        }
        if (v instanceof Number n) {
            return f.numberNode(n.doubleValue());
        }
        return f.textNode(String.valueOf(v));
    }

    /** @return the document as indented JSON text */
    static String text(Located l) {
        try {
            return MetricsReport.mapper().writeValueAsString(of(l)) + System.lineSeparator();
        } catch (com.fasterxml.jackson.core.JsonProcessingException e) {
            throw new IllegalStateException("a tree of plain values always writes", e);
        }
    }
}
