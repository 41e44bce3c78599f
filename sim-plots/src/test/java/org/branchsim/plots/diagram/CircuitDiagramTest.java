package org.branchsim.plots.diagram;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.image.BufferedImage;
import java.io.ByteArrayInputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.HashSet;
import java.util.Set;
import javax.imageio.ImageIO;
import javax.xml.parsers.DocumentBuilderFactory;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.w3c.dom.Document;
import org.w3c.dom.NodeList;

/**
 * The SVG is well-formed XML (W3C, Extensible Markup Language 1.0, 5th ed., 2008) in the SVG namespace
 * "http://www.w3.org/2000/svg" (W3C, SVG 1.1 2nd ed., 2011) and names every element and node; the PNG is the same
 * drawing at {@link CircuitDiagram#PNG_SCALE} pixels per unit.
 */
class CircuitDiagramTest {

    @Test
    void svgParsesAsXmlAndNamesEveryElementAndNode(@TempDir Path dir) throws Exception {
        CircuitDiagram d = CircuitDiagram.of(CircuitLayoutTest.press(), "press <two> & branches");
        Path file = dir.resolve("circuit.svg");
        d.writeSvg(file);
        DocumentBuilderFactory f = DocumentBuilderFactory.newInstance();
        f.setNamespaceAware(true);
        Document doc = f.newDocumentBuilder().parse(new ByteArrayInputStream(Files.readAllBytes(file)));
        assertEquals("svg", doc.getDocumentElement().getLocalName());
        assertEquals("http://www.w3.org/2000/svg", doc.getDocumentElement().getNamespaceURI());
        NodeList texts = doc.getElementsByTagNameNS("http://www.w3.org/2000/svg", "text");
        Set<String> words = new HashSet<>();
        for (int i = 0; i < texts.getLength(); i++) {
            words.add(texts.item(i).getTextContent());
        }
        for (Part p : CircuitLayoutTest.press().parts()) {
            assertTrue(words.contains(p.id()), "no label " + p.id());
        }
        for (String node : Set.of("supply", "pilotLine", "clampLine", "clampCap", "clampRod")) {
            assertTrue(words.contains(node), "no label " + node);
        }
        assertTrue(words.contains("press <two> & branches"), "the title, escaped in the file, reads back as written");
        // dashed pilot and drain lines survive into the file
        assertTrue(Files.readString(file, StandardCharsets.UTF_8).contains("stroke-dasharray"));
    }

    @Test
    void pngIsTheDrawingAtTwicePerUnitAndNotBlank(@TempDir Path dir) throws Exception {
        CircuitDiagram d = CircuitDiagram.of(CircuitLayoutTest.press(), "press");
        Path file = dir.resolve("circuit.png");
        d.writePng(file);
        BufferedImage img = ImageIO.read(file.toFile());
        assertEquals(Math.ceil(d.layout().width() * CircuitDiagram.PNG_SCALE), img.getWidth());
        assertEquals(Math.ceil(d.layout().height() * CircuitDiagram.PNG_SCALE), img.getHeight());
        // the pump's circle crosses the pixel row through its centre: dark pixels at its left and right
        CircuitLayout.Placed pump = d.layout().placed("pump");
        int y = (int) Math.round(pump.cy() * CircuitDiagram.PNG_SCALE);
        int dark = 0;
        for (int x = 0; x < img.getWidth(); x++) {
            int rgb = img.getRGB(x, y);
            if (((rgb >> 16) & 255) < 128) {
                dark++;
            }
        }
        assertTrue(dark >= 4, "dark pixels on the pump's centre row: " + dark);
    }
}
