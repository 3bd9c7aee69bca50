package org.halyard.cli;

import java.util.Comparator;
import java.util.concurrent.Callable;
import org.geotools.api.feature.type.Name;
import org.geotools.process.ProcessFactory;
import org.geotools.process.Processors;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;

/** Lists every GeoTools process on the classpath, Halyard's first: {@code name<TAB>title}. */
@Command(name = "processes", description = "List every registered GeoTools process: name<TAB>title.")
final class ProcessesCommand implements Callable<Integer> {

    @Option(names = "--all", description = "Also list processes of other GeoTools factories.")
    boolean all;

    @Override
    public Integer call() {
        record Row(String name, String title, boolean ours) { }
        var rows = new java.util.ArrayList<Row>();
        for (ProcessFactory f : Processors.getProcessFactories()) {
            for (Name n : f.getNames()) {
                boolean ours = "halyard".equals(n.getNamespaceURI());
                if (ours || all) {
                    var title = f.getTitle(n);
                    rows.add(new Row(n.getNamespaceURI() + ":" + n.getLocalPart(),
                            title == null ? "" : title.toString(), ours));
                }
            }
        }
        rows.sort(Comparator.comparing((Row r) -> !r.ours).thenComparing(Row::name));
        rows.forEach(r -> System.out.println(r.name + "\t" + r.title));
        return 0;
    }
}
