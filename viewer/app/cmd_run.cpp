// swarf run: NOT DONE YET (placeholder until its issue lands).
#include "commands.h"
#include "swarf/sim/error.h"

namespace swarf::app {

void registerRun(CLI::App& app, int& exitCode) {
    auto* cmd = app.add_subcommand("run", "(not done yet)");
    cmd->callback([&exitCode] {
        (void)exitCode;
        throw Error("'swarf run' is not done yet", kExitInternal);
    });
}

} // namespace swarf::app
