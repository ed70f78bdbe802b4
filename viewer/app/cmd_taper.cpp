// swarf taper: NOT DONE YET (placeholder until its issue lands).
#include "commands.h"
#include "swarf/sim/error.h"

namespace swarf::app {

void registerTaper(CLI::App& app, int& exitCode) {
    auto* cmd = app.add_subcommand("taper", "(not done yet)");
    cmd->callback([&exitCode] {
        (void)exitCode;
        throw Error("'swarf taper' is not done yet", kExitInternal);
    });
}

} // namespace swarf::app
