#pragma once
// Writing outputs so that a file that exists is always complete: every writer of swarf (text,
// JSON, CSV, TOML, STEP, STL, PNG) writes to "<name>.tmp" in the same folder and renames it over
// the name only when it is whole. A failure throws OutputError and leaves neither file.
#include <string>

namespace swarf::io {

/// Creates the output folder `dir` and its parents if they are missing. Throws OutputError
/// ("cannot create the output folder ...") if it cannot, or if `dir` exists and is not a folder.
/// An empty `dir` means the current folder and does nothing.
void makeOutputFolder(const std::string& dir);

/// Writes `text` to `path` atomically (path.tmp, then a rename over path). Throws OutputError;
/// nothing half-written stays behind.
void writeTextFile(const std::string& path, const std::string& text);

/// A file written by someone else's writer (a solid modeller, a picture library) under a
/// temporary name, then committed. Until commit() the temporary file is removed when the object
/// goes, so an exception half way leaves nothing behind.
class PendingFile {
  public:
    /// `path` is where the finished file goes; tmpPath() is where to write it meanwhile.
    explicit PendingFile(std::string path);
    ~PendingFile();
    PendingFile(const PendingFile&) = delete;
    PendingFile& operator=(const PendingFile&) = delete;

    /// "<path>.tmp", in the same folder as the target so the rename cannot cross file systems.
    const std::string& tmpPath() const { return tmp_; }
    /// The finished file's name.
    const std::string& path() const { return path_; }
    /// Checks the temporary file exists (and is not empty, unless `mayBeEmpty`), then renames it
    /// over path(). Throws OutputError (and removes the temporary file) if either fails.
    void commit(bool mayBeEmpty = false);
    /// Removes the temporary file now (errors ignored).
    void discard();

  private:
    std::string path_, tmp_;
    bool done_ = false;
};

} // namespace swarf::io
