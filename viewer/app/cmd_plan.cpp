// swarf plan: NOT DONE YET (placeholder until its issue lands).
#include "commands.h"
#include "swarf/sim/error.h"

namespace swarf::app {

void registerPlan(CLI::App& app, int& exitCode) {
    auto* cmd = app.add_subcommand("plan", "(not done yet)");
    cmd->callback([&exitCode] {
        (void)exitCode;
        throw Error("'swarf plan' is not done yet", kExitInternal);
    });
}

} // namespace swarf::app
