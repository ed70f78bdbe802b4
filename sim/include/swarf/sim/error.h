#pragma once
// The one root error type and its subtypes. Bad files and bad values throw; expected machining
// outcomes (metal left on, overcut, rubbing, a crash) are findings in a result, never errors.
#include <stdexcept>
#include <string>

namespace swarf {

/// Process exit codes, one per kind of failure.
enum ExitCode : int {
    kExitOk = 0,        ///< ran; the verdict is in the output, whatever it is
    kExitBadInput = 2,  ///< a scene or an option value is wrong; nothing was written
    kExitUsage = 64,    ///< the command line itself is wrong
    kExitOutput = 73,   ///< an output could not be written (disk, permissions)
    kExitGeometry = 75, ///< the solid modeller failed on valid input
    kExitRender = 76,   ///< rendering failed (no display and no Xvfb)
    kExitInternal = 70, ///< a bug: please report it
};

/// Root of every error swarf throws on purpose.
class Error : public std::runtime_error {
  public:
    explicit Error(const std::string& what, int exitCode = kExitInternal)
        : std::runtime_error(what), exitCode_(exitCode) {}
    /// The process exit code this error should end the program with.
    int exitCode() const { return exitCode_; }

  private:
    int exitCode_;
};

/// Where in an input file a value came from. line and column are 1-based; 0 means unknown.
struct SourceLoc {
    std::string file;
    int line = 0;
    int column = 0;
    /// "file:line:column" (or less, when unknown).
    std::string str() const;
};

/// A bad value in a scene or on the command line. The message reads
/// "file:line:column: key = value: expected ...".
class InputError : public Error {
  public:
    InputError(SourceLoc where, std::string key, std::string value, std::string expected);
    const SourceLoc& where() const { return where_; }
    const std::string& key() const { return key_; }
    const std::string& value() const { return value_; }
    const std::string& expected() const { return expected_; }

  private:
    SourceLoc where_;
    std::string key_, value_, expected_;
};

/// The solid modeller (OCCT) failed; the message says on what.
class GeometryError : public Error {
  public:
    explicit GeometryError(const std::string& what) : Error(what, kExitGeometry) {}
};

/// An output file could not be written.
class OutputError : public Error {
  public:
    explicit OutputError(const std::string& what) : Error(what, kExitOutput) {}
};

/// Rendering failed.
class RenderError : public Error {
  public:
    explicit RenderError(const std::string& what) : Error(what, kExitRender) {}
};

} // namespace swarf
