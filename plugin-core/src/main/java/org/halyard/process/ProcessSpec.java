package org.halyard.process;

import java.util.List;

/**
 * A process as the workbench sees it: its qualified name, texts, inputs and outputs, in plain types.
 *
 * @param namespace   namespace of the process name (for example {@code halyard}, {@code vec}, {@code ras})
 * @param localName   local part of the name
 * @param title       short human title
 * @param description longer help text
 * @param inputs      parameters in the order the factory declares them
 * @param outputs     results
 */
public record ProcessSpec(String namespace, String localName, String title, String description,
                          List<ParameterSpec> inputs, List<ParameterSpec> outputs) {

    public ProcessSpec {
        inputs = List.copyOf(inputs);
        outputs = List.copyOf(outputs);
    }

    /** {@code namespace:localName}. */
    public String qualifiedName() {
        return namespace + ":" + localName;
    }

    /** Whether this is one of Halyard's own processes. */
    public boolean isHalyard() {
        return HalyardProcessFactory.NAMESPACE.equals(namespace);
    }
}
