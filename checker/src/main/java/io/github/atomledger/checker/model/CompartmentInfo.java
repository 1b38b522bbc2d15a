package io.github.atomledger.checker.model;

import java.util.Objects;

/** A compartment: its id and its name (the id when it has none). */
public record CompartmentInfo(String id, String name) {

    public CompartmentInfo {
        Objects.requireNonNull(id, "id");
        name = name == null || name.isBlank() ? id : name;
    }
}
