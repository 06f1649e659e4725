package dev.filmshear.cli.verify;

import org.w3c.dom.Document;
import org.w3c.dom.Element;
import org.w3c.dom.NodeList;
import org.xml.sax.SAXException;

import javax.xml.XMLConstants;
import javax.xml.parsers.DocumentBuilderFactory;
import javax.xml.parsers.ParserConfigurationException;
import java.io.ByteArrayInputStream;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

/**
 * A report page read with the JDK's XML parser (no HTML parser is on the test classpath); the pages are written to
 * parse as XML, so a successful parse also shows every tag closed and every text escaped.
 */
record Page(String raw, Document dom) {

    static Page read(Path file) throws IOException {
        String raw = Files.readString(file, StandardCharsets.UTF_8);
        try {
            DocumentBuilderFactory factory = DocumentBuilderFactory.newInstance();
            factory.setFeature(XMLConstants.FEATURE_SECURE_PROCESSING, true);
            factory.setFeature("http://apache.org/xml/features/nonvalidating/load-external-dtd", false);
            factory.setExpandEntityReferences(false);
            return new Page(raw, factory.newDocumentBuilder()
                    .parse(new ByteArrayInputStream(raw.getBytes(StandardCharsets.UTF_8))));
        } catch (ParserConfigurationException | SAXException e) {
            throw new AssertionError(file + " is not well-formed: " + e.getMessage(), e);
        }
    }

    /** Every element of the tag, in document order. */
    List<Element> all(String tag) {
        NodeList nodes = dom.getElementsByTagName(tag);
        List<Element> out = new ArrayList<>();
        for (int i = 0; i < nodes.getLength(); i++) {
            out.add((Element) nodes.item(i));
        }
        return out;
    }

    /** The page's text, entities resolved. */
    String text() {
        return dom.getDocumentElement().getTextContent();
    }
}
