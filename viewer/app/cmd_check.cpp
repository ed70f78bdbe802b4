// swarf check: NOT DONE YET (placeholder until its issue lands).
#include "commands.h"
#include "swarf/sim/error.h"

namespace swarf::app {

void registerCheck(CLI::App& app, int& exitCode) {
    auto* cmd = app.add_subcommand("check", "(not done yet)");
    cmd->callback([&exitCode] {
        (void)exitCode;
        throw Error("'swarf check' is not done yet", kExitInternal);
    });
}

} // namespace swarf::app
