package io.github.atomledger.maven;

import io.github.atomledger.checker.NearestName;

import java.util.ArrayList;
import java.util.List;
import java.util.Properties;
import java.util.Set;
import java.util.TreeSet;
import org.apache.maven.plugin.descriptor.MojoDescriptor;
import org.apache.maven.plugin.descriptor.Parameter;
import org.apache.maven.plugin.descriptor.PluginDescriptor;

/**
 * Finds {@code atomledger.*} user properties ({@code -D} on the command line) that no goal of the
 * plugin reads: a misspelt property is otherwise ignored without a word and the build passes with
 * the default. Properties another goal reads ({@code atomledger.dryRun} during {@code check}) are
 * not reported.
 */
final class UnknownProperties {

    static final String PREFIX = "atomledger.";

    private UnknownProperties() {
    }

    /** One warning line per unknown property, sorted, each with the nearest known name when one is close. */
    static List<String> warnings(Properties user, Set<String> known) {
        List<String> out = new ArrayList<>();
        if (user == null) {
            return out;
        }
        Set<String> names = new TreeSet<>(user.stringPropertyNames());
        for (String name : names) {
            if (name.startsWith(PREFIX) && !known.contains(name)) {
                out.add("Unknown property " + name + " is ignored" + NearestName.hint(name, known)
                        .replace("'", ""));
            }
        }
        return out;
    }

    /** Every user property any goal of the plugin reads. */
    static Set<String> known(PluginDescriptor plugin) {
        Set<String> known = new TreeSet<>();
        if (plugin == null || plugin.getMojos() == null) {
            return known;
        }
        for (MojoDescriptor mojo : plugin.getMojos()) {
            if (mojo.getParameters() == null) {
                continue;
            }
            for (Parameter p : mojo.getParameters()) {
                String e = p.getExpression();
                if (e != null && e.startsWith("${" + PREFIX) && e.endsWith("}")) {
                    known.add(e.substring(2, e.length() - 1));
                }
            }
        }
        return known;
    }
}
