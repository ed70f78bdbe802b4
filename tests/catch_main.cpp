// The one Catch2 main for every test program.
//
// Built with SWARF_TRAP_FP (the CMake option, on in Debug builds and the sanitizer presets), a
// test program traps FE_INVALID, FE_DIVBYZERO and FE_OVERFLOW from its first line: arithmetic
// that makes a NaN or an infinity raises SIGFPE where it happens, and Catch names the test,
// instead of the NaN travelling on into a wrong number far away. A NaN made on purpose with
// std::numeric_limits<double>::quiet_NaN() does not trap; neither do Catch's Approx checks.
// Where a third-party library raises one of these inside a call of ours, that library call
// (never our own arithmetic) runs in a guard with the traps off: viewer/src/fp_traps.h.
// Programs these tests start (the swarf executable in test_cli) do not trap.
#define CATCH_CONFIG_RUNNER
#include <catch2/catch.hpp>

#ifdef SWARF_TRAP_FP
#include <fenv.h> // feenableexcept: a glibc extension
#endif

int main(int argc, char* argv[]) {
#ifdef SWARF_TRAP_FP
    feclearexcept(FE_ALL_EXCEPT);
    feenableexcept(FE_INVALID | FE_DIVBYZERO | FE_OVERFLOW);
#endif
    return Catch::Session().run(argc, argv);
}
