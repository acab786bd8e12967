package dev.penduline.model.persistence;

import java.util.HashMap;
import java.util.Map;
import javax.xml.XMLConstants;

import org.eclipse.emf.ecore.resource.Resource;
import org.eclipse.emf.ecore.xmi.XMLResource;

/**
 * The load and save options that make a {@code .penduline} file safe to read and kind to diffs.
 *
 * <p><b>Saving.</b> UTF-8, LF line ends, no line wrapping, every value in its own element (the
 * {@code ExtendedMetaData} annotations in {@code mechanism.ecore} mark each feature
 * {@code kind=element}), features in the order the metamodel declares them, list elements in
 * list order, no type information, no schema location, no generated identifiers and no time
 * stamp (the only date is a fit result's {@code computedAt}). A value equal to its default is
 * not written. So an unchanged model saves to identical bytes and one changed value changes one
 * line.
 *
 * <p><b>Loading.</b> The parser refuses any DOCTYPE and never resolves external entities or
 * DTDs, which shuts out external-entity reads and entity-expansion ("billion laughs") attacks;
 * a mechanism file has no use for either.
 */
public final class MechanismFormat {

    /** The file extension of a mechanism file, without the dot. */
    public static final String FILE_EXTENSION = "penduline";

    /** The line delimiter written, whatever the platform. */
    public static final String LINE_DELIMITER = "\n";

    /** The encoding written and expected. */
    public static final String ENCODING = "UTF-8";

    private MechanismFormat() {
    }

    /**
     * The save options; a fresh map on each call, so callers may add to it.
     *
     * @return the options for {@link Resource#save(Map)}
     */
    public static Map<Object, Object> saveOptions() {
        final Map<Object, Object> o = new HashMap<>();
        o.put(XMLResource.OPTION_ENCODING, ENCODING);
        o.put(Resource.OPTION_LINE_DELIMITER, LINE_DELIMITER);
        o.put(XMLResource.OPTION_EXTENDED_META_DATA, Boolean.TRUE);
        o.put(XMLResource.OPTION_SAVE_TYPE_INFORMATION, Boolean.FALSE);
        o.put(XMLResource.OPTION_SCHEMA_LOCATION, Boolean.FALSE);
        o.put(XMLResource.OPTION_USE_ENCODED_ATTRIBUTE_STYLE, Boolean.FALSE);
        o.put(XMLResource.OPTION_FORMATTED, Boolean.TRUE);
        o.put(XMLResource.OPTION_LINE_WIDTH, Integer.MAX_VALUE);
        o.put(XMLResource.OPTION_KEEP_DEFAULT_CONTENT, Boolean.FALSE);
        return o;
    }

    /**
     * The load options; a fresh map on each call.
     *
     * @return the options for {@link Resource#load(Map)}
     */
    public static Map<Object, Object> loadOptions() {
        final Map<Object, Object> o = new HashMap<>();
        o.put(XMLResource.OPTION_EXTENDED_META_DATA, Boolean.TRUE);
        o.put(XMLResource.OPTION_ENCODING, ENCODING);
        o.put(XMLResource.OPTION_PARSER_FEATURES, parserFeatures());
        return o;
    }

    /**
     * The SAX parser features that refuse DTDs and external entities.
     *
     * @return feature URI to value
     */
    public static Map<String, Boolean> parserFeatures() {
        final Map<String, Boolean> f = new HashMap<>();
        f.put("http://apache.org/xml/features/disallow-doctype-decl", Boolean.TRUE);
        f.put("http://xml.org/sax/features/external-general-entities", Boolean.FALSE);
        f.put("http://xml.org/sax/features/external-parameter-entities", Boolean.FALSE);
        f.put("http://apache.org/xml/features/nonvalidating/load-external-dtd", Boolean.FALSE);
        f.put(XMLConstants.FEATURE_SECURE_PROCESSING, Boolean.TRUE);
        return f;
    }
}
