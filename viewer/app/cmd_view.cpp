// swarf view: NOT DONE YET (placeholder until its issue lands).
#include "commands.h"
#include "swarf/sim/error.h"

namespace swarf::app {

void registerView(CLI::App& app, int& exitCode) {
    auto* cmd = app.add_subcommand("view", "(not done yet)");
    cmd->callback([&exitCode] {
        (void)exitCode;
        throw Error("'swarf view' is not done yet", kExitInternal);
    });
}

} // namespace swarf::app
