package org.inkgate.admin.core.qti;

import static org.inkgate.admin.core.qti.QtiDom.descendants;
import static org.inkgate.admin.core.qti.QtiDom.hasClass;
import static org.inkgate.admin.core.qti.QtiDom.local;
import static org.inkgate.admin.core.qti.QtiDom.printable;

import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import com.fasterxml.jackson.dataformat.yaml.YAMLMapper;
import java.util.List;
import org.w3c.dom.Element;

/**
 * Reads the scorers' rubric block of an item written in Inkgate's criterion layout (the classes
 * {@code inkgate-criterion}, {@code inkgate-band} ... that {@code qti export} writes) back into
 * rubric.yaml's shape.
 */
final class QtiRubricReader {

    private final YAMLMapper yaml;
    private final List<String> notes;

    QtiRubricReader(YAMLMapper yaml, List<String> notes) {
        this.yaml = yaml;
        this.notes = notes;
    }

    /** The rubric in rubric.yaml's shape, or null (with a note) when the block is not in the criterion layout. */
    ObjectNode rubric(Element block, String where) {
        ArrayNode criteria = yaml.createArrayNode();
        for (Element c : descendants(block, null)) {
            if (!hasClass(c, "inkgate-criterion")) {
                continue;
            }
            ObjectNode criterion = criteria.addObject();
            for (Element e : descendants(c, null)) {
                if (hasClass(e, "inkgate-criterion-id")) {
                    criterion.put("id", e.getTextContent().strip());
                } else if (hasClass(e, "inkgate-criterion-name")) {
                    criterion.put("name", e.getTextContent().strip());
                } else if (hasClass(e, "inkgate-scores")) {
                    criterion.put("scores", e.getTextContent().strip());
                }
            }
            ArrayNode bands = criterion.putArray("bands");
            for (Element li : descendants(c, null)) {
                if (!local(li).equals("li")) {
                    continue;
                }
                ObjectNode band = bands.addObject();
                for (Element e : descendants(li, null)) {
                    if (hasClass(e, "inkgate-band")) {
                        band.put("scores", e.getTextContent().strip());
                    } else if (hasClass(e, "inkgate-descriptor")) {
                        band.put("descriptor", e.getTextContent());
                    }
                }
            }
        }
        if (criteria.isEmpty()) {
            notes.add(where + ": the scorers' rubric block is not in Inkgate's criterion layout; write rubric.yaml from"
                    + " it by hand. Its text: " + printable(block.getTextContent().strip().replaceAll("\\s+", " ")));
            return null;
        }
        ObjectNode out = yaml.createObjectNode();
        out.set("criteria", criteria);
        return out;
    }
}
