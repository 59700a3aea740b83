package org.inkgate.admin.core.testutil;

import java.io.ByteArrayInputStream;
import java.io.IOException;
import java.io.InputStream;
import java.io.Reader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.concurrent.ConcurrentHashMap;
import javax.xml.XMLConstants;
import javax.xml.transform.stream.StreamSource;
import javax.xml.validation.Schema;
import javax.xml.validation.SchemaFactory;
import javax.xml.validation.Validator;
import org.w3c.dom.ls.LSInput;
import org.w3c.dom.ls.LSResourceResolver;
import org.xml.sax.ErrorHandler;
import org.xml.sax.SAXParseException;

/**
 * The official 1EdTech QTI 3.0 schemas (test resources {@code standards/qti3}, see its README),
 * loaded with the JDK's validator. Imports keep their relative locations; the one {@code https://}
 * import (XLink, declared but not used by the content-package extension schema) is answered with an
 * empty schema of that namespace, so validation never reaches the network.
 */
public final class QtiSchemas {

    /** The schemas by file, relative to {@code qti3/}. */
    public static final String RESULTS = "qtiv3p0/imsqti_resultv3p0_v1p0.xsd";
    public static final String ITEMS = "qtiv3p0/imsqti_asiv3p0_sbacv1p0_v1p0.xsd";
    public static final String MANIFEST = "qtiv3p0/imsqtiv3p0_imscpv1p2_v1p0.xsd";
    public static final String PNP = "qtiv3p0/imsqtiv3p0_afa3p0pnp_v1p0.xsd";
    /** The item schema together with Inkgate's extension schema (main resources), for items with ink: elements. */
    public static final String ITEMS_WITH_INKGATE = ITEMS + "+inkgate";

    private static final Map<String, Schema> LOADED = new ConcurrentHashMap<>();

    private QtiSchemas() {
    }

    /** The qti3 folder: from the core module's test resources, whichever module's test asks. */
    public static Path folder() {
        for (Path p : List.of(Path.of("src/test/resources/standards/qti3"),
                Path.of("../core/src/test/resources/standards/qti3"))) {
            if (Files.isDirectory(p)) {
                return p.toAbsolutePath().normalize();
            }
        }
        throw new IllegalStateException("the QTI schemas are not found from " + Path.of("").toAbsolutePath());
    }

    public static Schema schema(String file) {
        return LOADED.computeIfAbsent(file, QtiSchemas::load);
    }

    private static Schema load(String file) {
        try {
            SchemaFactory f = SchemaFactory.newInstance(XMLConstants.W3C_XML_SCHEMA_NS_URI);
            f.setResourceResolver(new Offline(f.getResourceResolver()));
            f.setProperty(XMLConstants.ACCESS_EXTERNAL_SCHEMA, "file");
            f.setProperty(XMLConstants.ACCESS_EXTERNAL_DTD, "file");
            if (file.endsWith("+inkgate")) {
                var own = QtiSchemas.class.getResource(org.inkgate.admin.core.qti.QtiNames.INKGATE_SCHEMA);
                return f.newSchema(new javax.xml.transform.Source[] {
                    new StreamSource(folder().resolve(file.substring(0, file.length() - "+inkgate".length())).toFile()),
                    new StreamSource(own.toString())});
            }
            return f.newSchema(folder().resolve(file).toFile());
        } catch (org.xml.sax.SAXException e) {
            throw new IllegalStateException("cannot load " + file + ": " + e.getMessage(), e);
        }
    }

    /** Every error (and warning) the schema reports for a document; empty when it is valid. */
    public static List<String> problems(String schemaFile, Path document) throws IOException {
        List<String> out = new ArrayList<>();
        Validator v = schema(schemaFile).newValidator();
        try {
            v.setProperty(XMLConstants.ACCESS_EXTERNAL_DTD, "");
            v.setProperty(XMLConstants.ACCESS_EXTERNAL_SCHEMA, "");
        } catch (org.xml.sax.SAXException e) {
            throw new IllegalStateException(e);
        }
        v.setErrorHandler(new ErrorHandler() {
            @Override
            public void warning(SAXParseException e) {
                out.add("warning " + where(e));
            }

            @Override
            public void error(SAXParseException e) {
                out.add("error " + where(e));
            }

            @Override
            public void fatalError(SAXParseException e) {
                out.add("fatal " + where(e));
            }

            private String where(SAXParseException e) {
                return document.getFileName() + ":" + e.getLineNumber() + ":" + e.getColumnNumber() + ": " + e.getMessage();
            }
        });
        try {
            v.validate(new StreamSource(document.toFile()));
        } catch (org.xml.sax.SAXException e) {
            out.add("stopped: " + e.getMessage());
        }
        return out;
    }

    /**
     * The copies of w3/mathml3 and w3/ssml11 declare the later namespaces (2010), while the QTI item
     * profile imports MathML and SSML under http://www.w3.org/1998/Math/MathML and
     * http://www.w3.org/2001/10/synthesis; the JDK refuses that mismatch (XML Schema 1.0,
     * src-import.3.1). Those two imports are answered with the MathML 2 schema and SSML 1.0's core
     * schema of the same folder, in exactly those namespaces. Inkgate's documents use neither.
     */
    private static final String MATHML = "http://www.w3.org/1998/Math/MathML";
    private static final String SSML = "http://www.w3.org/2001/10/synthesis";

    private record Offline(LSResourceResolver fallback) implements LSResourceResolver {
        @Override
        public LSInput resolveResource(String type, String namespace, String publicId, String systemId, String baseUri) {
            if (systemId != null && systemId.startsWith("http")) {
                String empty = "<xs:schema xmlns:xs='http://www.w3.org/2001/XMLSchema' targetNamespace='" + namespace
                        + "'/>";
                return new Input(systemId, baseUri, new ByteArrayInputStream(empty.getBytes(StandardCharsets.UTF_8)));
            }
            if (MATHML.equals(namespace) && systemId != null && systemId.endsWith("mathml3.xsd")) {
                Path file = folder().resolve("w3/mathml2/mathml2.xsd");
                try {
                    return new Input(file.toUri().toString(), baseUri, Files.newInputStream(file));
                } catch (IOException e) {
                    throw new IllegalStateException(e);
                }
            }
            if (SSML.equals(namespace) && systemId != null && systemId.endsWith("ssmlv1p1-core.xsd")) {
                // SSML 1.0's namespace-less core, taken into the imported namespace (a chameleon include)
                String wrapper = "<xs:schema xmlns:xs='http://www.w3.org/2001/XMLSchema' targetNamespace='" + SSML
                        + "' elementFormDefault='qualified'><xs:include schemaLocation='"
                        + folder().resolve("w3/ssml10/synthesis-core.xsd").toUri() + "'/></xs:schema>";
                return new Input(folder().resolve("w3/ssml10/wrapper.xsd").toUri().toString(), baseUri,
                        new ByteArrayInputStream(wrapper.getBytes(StandardCharsets.UTF_8)));
            }
            return fallback == null ? null : fallback.resolveResource(type, namespace, publicId, systemId, baseUri);
        }
    }

    private record Input(String systemId, String baseURI, InputStream byteStream) implements LSInput {
        public Reader getCharacterStream() {
            return null;
        }

        public void setCharacterStream(Reader r) {
        }

        public InputStream getByteStream() {
            return byteStream;
        }

        public void setByteStream(InputStream s) {
        }

        public String getStringData() {
            return null;
        }

        public void setStringData(String s) {
        }

        public String getSystemId() {
            return systemId;
        }

        public void setSystemId(String s) {
        }

        public String getPublicId() {
            return null;
        }

        public void setPublicId(String s) {
        }

        public String getBaseURI() {
            return baseURI;
        }

        public void setBaseURI(String s) {
        }

        public String getEncoding() {
            return "UTF-8";
        }

        public void setEncoding(String s) {
        }

        public boolean getCertifiedText() {
            return false;
        }

        public void setCertifiedText(boolean b) {
        }
    }
}
