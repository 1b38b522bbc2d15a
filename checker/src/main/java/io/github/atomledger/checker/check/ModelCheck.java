package io.github.atomledger.checker.check;

import java.util.List;

/**
 * One rule. Implementations are stateless and thread-safe: {@link #check} reads the context and
 * returns findings; it does no I/O and no logging, and it never throws a finding.
 */
public interface ModelCheck {

    /** Stable rule id, {@code <area>.<kebab-name>}; never reused or renamed. */
    String ruleId();

    /** One line of user documentation. */
    String description();

    Severity defaultSeverity();

    /** Findings for one model, with {@link #defaultSeverity()}; the engine applies overrides. */
    List<Finding> check(CheckContext context);
}
