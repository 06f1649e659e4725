package dev.filmshear.cli.report;

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
 * A report page read with the JDK's own XML parser (no HTML parser is on the test classpath). The report is written
 * to parse as XML as well as HTML, so a parse that succeeds also proves every tag is closed and every piece of text
 * escaped: one stray {@code <} or {@code &} from a title or a case file would fail it.
 */
record ReportPage(String raw, Document dom) {

    static ReportPage read(Path file) throws IOException {
        return parse(Files.readString(file, StandardCharsets.UTF_8));
    }

    static ReportPage parse(String raw) throws IOException {
        try {
            DocumentBuilderFactory factory = DocumentBuilderFactory.newInstance();
            factory.setFeature(XMLConstants.FEATURE_SECURE_PROCESSING, true);
            // the page's <!DOCTYPE html> names no DTD; nothing may be fetched while reading it
            factory.setFeature("http://apache.org/xml/features/nonvalidating/load-external-dtd", false);
            factory.setExpandEntityReferences(false);
            Document dom = factory.newDocumentBuilder()
                    .parse(new ByteArrayInputStream(raw.getBytes(StandardCharsets.UTF_8)));
            return new ReportPage(raw, dom);
        } catch (ParserConfigurationException | SAXException e) {
            throw new AssertionError("report.html is not well-formed: " + e.getMessage(), e);
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

    /** The one element of the tag whose class list holds {@code cls}. */
    Element one(String tag, String cls) {
        List<Element> found = all(tag).stream()
                .filter(e -> List.of(e.getAttribute("class").split(" ")).contains(cls)).toList();
        if (found.size() != 1) {
            throw new AssertionError(found.size() + " <" + tag + " class=" + cls + "> elements, expected one");
        }
        return found.get(0);
    }

    /** The element with the id. */
    Element byId(String id) {
        return all("*").stream().filter(e -> id.equals(e.getAttribute("id"))).findFirst()
                .orElseThrow(() -> new AssertionError("no element with id " + id));
    }

    /** The text a reader sees in the body, entities decoded. */
    String bodyText() {
        return all("body").get(0).getTextContent();
    }
}
