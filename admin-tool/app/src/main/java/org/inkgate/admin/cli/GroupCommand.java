package org.inkgate.admin.cli;

import java.util.concurrent.Callable;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Spec;

/** A command that only groups subcommands: run bare, it prints its usage and succeeds. */
abstract class GroupCommand implements Callable<Integer> {

    @Spec
    CommandSpec spec;

    @Override
    public Integer call() {
        spec.commandLine().usage(spec.commandLine().getOut());
        return InkgateAdmin.OK;
    }
}
