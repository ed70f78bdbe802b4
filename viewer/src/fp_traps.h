#pragma once
// Internal: runs a call into the graphics stack with floating-point traps off.
//
// The Debug test programs trap FE_INVALID, FE_DIVBYZERO and FE_OVERFLOW (tests/catch_main.cpp)
// so that a NaN or an infinity made by our arithmetic fails where it is made. Mesa's software
// OpenGL (llvmpipe, under VTK's Render) raises these flags in its own code, from the first
// context it creates, and its worker threads take the creating thread's setting. So a call
// that draws through VTK runs inside a FpTrapsOff: put one around the library call only, never
// around arithmetic of ours. Where nothing traps (the swarf executable, Release tests) it only
// reads and writes the FP control registers.
#include <fenv.h> // fedisableexcept / feenableexcept: glibc extensions

namespace swarf::viewer::detail {

class FpTrapsOff {
  public:
    FpTrapsOff() noexcept : saved_(fedisableexcept(FE_ALL_EXCEPT)) {}
    ~FpTrapsOff() {
        // Flags the library left raised would trap at once on the x87 unit: clear them first.
        feclearexcept(FE_ALL_EXCEPT);
        if (saved_ > 0)
            feenableexcept(saved_);
    }
    FpTrapsOff(const FpTrapsOff&) = delete;
    FpTrapsOff& operator=(const FpTrapsOff&) = delete;

  private:
    int saved_; // the traps that were on (-1 if they could not be read)
};

} // namespace swarf::viewer::detail
