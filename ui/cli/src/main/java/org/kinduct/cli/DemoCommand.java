package org.kinduct.cli;

import java.util.concurrent.Callable;
import org.kinduct.demo.Demos;
import org.kinduct.scene.Scene;
import picocli.CommandLine.Command;
import picocli.CommandLine.Parameters;

/** Lists the demo scenes, or opens one in the editor. */
@Command(name = "demo", mixinStandardHelpOptions = true,
        description = "List the demo scenes, or open demo NAME in the editor.")
final class DemoCommand implements Callable<Integer> {

    @Parameters(arity = "0..1", paramLabel = "NAME", description = "Demo to open.")
    String name;

    @Override
    public Integer call() {
        if (name == null) {
            for (String n : Demos.names()) {
                Scene s = Demos.load(n);
                System.out.printf("%-24s %s%n", n, s.name());
            }
            System.out.println();
            System.out.println("Open one with: kinduct demo NAME    Results without a display: kinduct solve --demo NAME");
            return KinductMain.OK;
        }
        if (Demos.resource(name).isEmpty()) {
            throw new BadInputException("no demo named '" + name + "'; known demos: " + String.join(", ", Demos.names()));
        }
        return GuiCommand.open(null, name);
    }
}
