package org.tertius.cli;

import java.util.concurrent.Callable;
import org.tertius.core.InvalidInputException;
import org.tertius.hierarchy.HierarchyMember;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;

/** The first-order system of a member of the hierarchy. */
@Command(name = "describe", mixinStandardHelpOptions = true,
        description = "Print the unknowns and equations of member N of the Painleve III hierarchy.")
public final class DescribeCommand implements Callable<Integer> {
    @Spec
    CommandSpec spec;
    @Option(names = "--member", paramLabel = "N", required = true, description = "the member, 1.."
            + HierarchyMember.MAX_ORDER)
    int member;

    @Override
    public Integer call() {
        if (member < 1 || member > HierarchyMember.MAX_ORDER) {
            throw new InvalidInputException("--member", "must be in [1, " + HierarchyMember.MAX_ORDER + "], got " + member);
        }
        spec.commandLine().getOut().print(HierarchyMember.of(member).describe());
        spec.commandLine().getOut().flush();
        return 0;
    }
}
