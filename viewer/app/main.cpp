// swarf: plan, simulate and check cones turned on a lathe.
#include "commands.h"
#include "swarf/sim/error.h"

#include <cstdio>
#include <exception>
#include <new>

int main(int argc, char** argv) {
    CLI::App app{"swarf: plan, simulate and check cones (tapers) turned on a lathe"};
    app.require_subcommand(1);
    app.set_version_flag("--version", "swarf 0.1.0");
    int exitCode = swarf::kExitOk;
    swarf::app::registerCheck(app, exitCode);
    swarf::app::registerTaper(app, exitCode);
    swarf::app::registerRun(app, exitCode);
    swarf::app::registerView(app, exitCode);
    swarf::app::registerPlan(app, exitCode);
    swarf::app::registerBudget(app, exitCode);
    swarf::app::registerCorrect(app, exitCode);
    try {
        app.parse(argc, argv);
    } catch (const CLI::CallForHelp& e) {
        return app.exit(e);
    } catch (const CLI::CallForAllHelp& e) {
        return app.exit(e);
    } catch (const CLI::CallForVersion& e) {
        return app.exit(e);
    } catch (const CLI::ParseError& e) {
        app.exit(e);
        return swarf::kExitUsage;
    } catch (const swarf::Error& e) {
        std::fprintf(stderr, "swarf: %s\n", e.what());
        return e.exitCode();
    } catch (const std::bad_alloc&) {
        // The memory estimate (run_budget.h) should have refused the scene before any work;
        // if the machine still ran short, say what to change, as for a scene refused outright.
        std::fprintf(stderr, "swarf: sim.profile_step: the machine ran out of memory on this "
                             "scene; a coarser sim.profile_step or fewer passes need less\n");
        return swarf::kExitBadInput;
    } catch (const std::exception& e) {
        std::fprintf(stderr, "swarf: internal error: %s\n", e.what());
        return swarf::kExitInternal;
    }
    return exitCode;
}
