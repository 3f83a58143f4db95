package org.tertius.cli;

import java.io.PrintWriter;
import org.apache.commons.cli.Options;
import org.tertius.core.InvalidInputException;
import org.tertius.hierarchy.HierarchyMember;

/** The first-order system of a member of the hierarchy. */
public final class DescribeCommand implements Command {
    int member;

    @Override
    public String name() {
        return "describe";
    }

    @Override
    public String description() {
        return "Print the unknowns and equations of member N of the Painleve III hierarchy.";
    }

    @Override
    public void declare(Options o) {
        o.addOption(OptionKinds.required("--member", "N", "the member, 1.." + HierarchyMember.MAX_ORDER));
    }

    @Override
    public void read(Arguments a) {
        member = a.integer("--member", "an integer in [1, " + HierarchyMember.MAX_ORDER + "]");
    }

    @Override
    public int run(PrintWriter out, PrintWriter err) {
        if (member < 1 || member > HierarchyMember.MAX_ORDER) {
            throw new InvalidInputException("--member", "must be in [1, " + HierarchyMember.MAX_ORDER + "], got " + member);
        }
        out.print(HierarchyMember.of(member).describe());
        out.flush();
        return 0;
    }
}
