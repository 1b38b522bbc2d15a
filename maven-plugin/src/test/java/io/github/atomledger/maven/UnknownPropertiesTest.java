package io.github.atomledger.maven;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.List;
import java.util.Properties;
import java.util.Set;
import org.apache.maven.plugin.descriptor.MojoDescriptor;
import org.apache.maven.plugin.descriptor.Parameter;
import org.apache.maven.plugin.descriptor.PluginDescriptor;
import org.junit.jupiter.api.Test;

/** Issue #13: a misspelt {@code -Datomledger.*} property is named, with the nearest known one. */
class UnknownPropertiesTest {

    @Test
    void warnsAboutUnknownAtomledgerPropertiesOnly() {
        Properties user = new Properties();
        user.setProperty("atomledger.failOnSeverty", "warning");
        user.setProperty("atomledger.models", "m.xml");
        user.setProperty("atomledger.colour", "on");
        user.setProperty("maven.repo.local", "x");
        Set<String> known = Set.of("atomledger.failOnSeverity", "atomledger.failOn", "atomledger.models");
        assertThat(UnknownProperties.warnings(user, known)).containsExactly(
                "Unknown property atomledger.colour is ignored",
                "Unknown property atomledger.failOnSeverty is ignored; did you mean atomledger.failOnSeverity?");
    }

    @Test
    void knownNamesComeFromEveryGoalOfThePlugin() throws Exception {
        PluginDescriptor plugin = new PluginDescriptor();
        plugin.addMojo(mojo("check", "${atomledger.models}", "${project.basedir}"));
        plugin.addMojo(mojo("annotate", "${atomledger.dryRun}"));
        assertThat(UnknownProperties.known(plugin)).containsExactly("atomledger.dryRun", "atomledger.models");
    }

    private static MojoDescriptor mojo(String goal, String... expressions) throws Exception {
        MojoDescriptor m = new MojoDescriptor();
        m.setGoal(goal);
        int i = 0;
        for (String e : expressions) {
            Parameter p = new Parameter();
            p.setName("p" + i++);
            p.setExpression(e);
            m.addParameter(p);
        }
        return m;
    }

    @Test
    void noPropertiesGiveNoWarnings() {
        assertThat(UnknownProperties.warnings(null, Set.of())).isEqualTo(List.of());
    }
}
