package io.github.atomledger.checker.model.internal;

import java.util.Locale;
import java.util.Map;
import java.util.TreeMap;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.sbml.jsbml.xml.XMLNode;

/**
 * Reads {@code KEY: value} lines from SBML notes, as Level 2 models carry {@code FORMULA:} and
 * {@code CHARGE:}. Each {@code <p>} (or other block) element's text is one candidate line; keys are
 * trimmed and upper-cased; the first occurrence of a key wins.
 */
public final class NotesFields {

    private static final Pattern FIELD = Pattern.compile("^\\s*([A-Za-z][A-Za-z0-9 _-]*?)\\s*:\\s*(.*?)\\s*$");

    private NotesFields() {
    }

    public static Map<String, String> parse(XMLNode notes) {
        Map<String, String> out = new TreeMap<>();
        if (notes != null) {
            walk(notes, out);
        }
        return out;
    }

    private static void walk(XMLNode node, Map<String, String> out) {
        if (node.isElement() && isBlock(node.getName())) {
            StringBuilder text = new StringBuilder();
            collectText(node, text);
            for (String line : text.toString().split("\\R")) {
                Matcher m = FIELD.matcher(line);
                if (m.matches()) {
                    out.putIfAbsent(m.group(1).strip().toUpperCase(Locale.ROOT), m.group(2));
                }
            }
            return;
        }
        for (int i = 0; i < node.getChildCount(); i++) {
            walk(node.getChildAt(i), out);
        }
    }

    private static boolean isBlock(String name) {
        return name.equals("p") || name.equals("li") || name.equals("div") || name.equals("td");
    }

    private static void collectText(XMLNode node, StringBuilder sb) {
        if (node.isText()) {
            sb.append(node.getCharacters());
        }
        for (int i = 0; i < node.getChildCount(); i++) {
            collectText(node.getChildAt(i), sb);
        }
    }
}
