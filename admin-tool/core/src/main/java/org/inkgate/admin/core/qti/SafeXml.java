package org.inkgate.admin.core.qti;

import java.io.ByteArrayInputStream;
import java.io.IOException;
import javax.xml.XMLConstants;
import javax.xml.parsers.DocumentBuilder;
import javax.xml.parsers.DocumentBuilderFactory;
import javax.xml.parsers.ParserConfigurationException;
import org.w3c.dom.Document;
import org.xml.sax.SAXException;
import org.xml.sax.SAXParseException;

/**
 * Parses XML from outside (QTI packages, PNP documents) with everything that could reach beyond
 * the file switched off: no DOCTYPE at all (so no external or expanding entities: XXE and
 * "billion laughs"), no XInclude, no external DTDs or schemas (OWASP XML External Entity
 * Prevention Cheat Sheet, "JAXP DocumentBuilderFactory").
 */
public final class SafeXml {

    private SafeXml() {
    }

    /** Thrown for a document that is not well-formed or uses a DOCTYPE; the message says where. */
    public static final class XmlRefusal extends Exception {
        public XmlRefusal(String message, Throwable cause) {
            super(message, cause);
        }
    }

    public static Document parse(String where, byte[] bytes) throws XmlRefusal {
        try {
            DocumentBuilder b = factory().newDocumentBuilder();
            b.setErrorHandler(null);
            return b.parse(new ByteArrayInputStream(bytes), where);
        } catch (SAXParseException e) {
            throw new XmlRefusal(where + " line " + e.getLineNumber() + ", column " + e.getColumnNumber() + ": "
                    + (e.getMessage() != null && e.getMessage().contains("DOCTYPE")
                    ? "a DOCTYPE declaration is not accepted (entities could reach outside the file); remove it"
                    : e.getMessage()), e);
        } catch (SAXException | IOException e) {
            throw new XmlRefusal(where + ": not readable XML: " + e.getMessage(), e);
        } catch (ParserConfigurationException e) {
            throw new IllegalStateException("the JDK's XML parser cannot be configured: " + e.getMessage(), e);
        }
    }

    private static DocumentBuilderFactory factory() {
        DocumentBuilderFactory f = DocumentBuilderFactory.newInstance();
        f.setNamespaceAware(true);
        f.setXIncludeAware(false);
        f.setExpandEntityReferences(false);
        try {
            f.setFeature("http://apache.org/xml/features/disallow-doctype-decl", true);
            f.setFeature("http://xml.org/sax/features/external-general-entities", false);
            f.setFeature("http://xml.org/sax/features/external-parameter-entities", false);
            f.setFeature("http://apache.org/xml/features/nonvalidating/load-external-dtd", false);
            f.setFeature(XMLConstants.FEATURE_SECURE_PROCESSING, true);
        } catch (ParserConfigurationException e) {
            throw new IllegalStateException("the JDK's XML parser lacks a safety feature: " + e.getMessage(), e);
        }
        f.setAttribute(XMLConstants.ACCESS_EXTERNAL_DTD, "");
        f.setAttribute(XMLConstants.ACCESS_EXTERNAL_SCHEMA, "");
        return f;
    }
}
