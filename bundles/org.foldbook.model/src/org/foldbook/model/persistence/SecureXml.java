package org.foldbook.model.persistence;

import java.util.Map;

import javax.xml.XMLConstants;

import org.eclipse.emf.ecore.xmi.XMLResource;

/**
 * Parser settings that keep a notebook file from reaching outside itself: no DOCTYPE at all (which
 * also rules out internal entity bombs), no external entities or DTDs, the JDK's secure-processing
 * limits on. Applied to every notebook load through {@link XMLResource#OPTION_PARSER_FEATURES} and
 * {@link XMLResource#OPTION_PARSER_PROPERTIES}, which EMF hands to the SAXParserFactory / SAXParser.
 */
public final class SecureXml {

    static final String DISALLOW_DOCTYPE = "http://apache.org/xml/features/disallow-doctype-decl";

    private SecureXml() {
    }

    public static Map<String, Boolean> parserFeatures() {
        return Map.of(
                DISALLOW_DOCTYPE, Boolean.TRUE,
                "http://xml.org/sax/features/external-general-entities", Boolean.FALSE,
                "http://xml.org/sax/features/external-parameter-entities", Boolean.FALSE,
                "http://apache.org/xml/features/nonvalidating/load-external-dtd", Boolean.FALSE,
                XMLConstants.FEATURE_SECURE_PROCESSING, Boolean.TRUE);
    }

    public static Map<String, Object> parserProperties() {
        return Map.of(
                XMLConstants.ACCESS_EXTERNAL_DTD, "",
                XMLConstants.ACCESS_EXTERNAL_SCHEMA, "");
    }

    /** Puts the secure settings into load options, over anything a caller passed for the same keys. */
    static void enforce(Map<Object, Object> loadOptions) {
        loadOptions.put(XMLResource.OPTION_PARSER_FEATURES, parserFeatures());
        loadOptions.put(XMLResource.OPTION_PARSER_PROPERTIES, parserProperties());
        loadOptions.remove(XMLResource.OPTION_USE_PARSER_POOL); // a shared pool may hold parsers built without them
    }
}
