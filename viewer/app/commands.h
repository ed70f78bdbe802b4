#pragma once
// Subcommands of the swarf executable. Each lives in its own cmd_<name>.cpp and registers
// itself on the app; its callback throws swarf::Error on failure and sets exitCode otherwise.
#include <CLI/CLI.hpp>

namespace swarf::app {

void registerCheck(CLI::App& app, int& exitCode);   ///< swarf check SCENE
void registerTaper(CLI::App& app, int& exitCode);   ///< swarf taper ... (bench calculator)
void registerRun(CLI::App& app, int& exitCode);     ///< swarf run SCENE --out DIR
void registerView(CLI::App& app, int& exitCode);    ///< swarf view SCENE
void registerPlan(CLI::App& app, int& exitCode);    ///< swarf plan SCENE --out DIR
void registerBudget(CLI::App& app, int& exitCode);  ///< swarf budget SCENE --out DIR
void registerCorrect(CLI::App& app, int& exitCode); ///< swarf correct SCENE --measured M --out DIR

} // namespace swarf::app
