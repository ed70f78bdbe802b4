// Writing outputs atomically (see output_file.h).
#include "swarf/io/output_file.h"

#include "swarf/sim/error.h"

#include <filesystem>
#include <fstream>
#include <system_error>

namespace swarf::io {

namespace fs = std::filesystem;

void makeOutputFolder(const std::string& dir) {
    if (dir.empty())
        return;
    std::error_code ec;
    fs::create_directories(dir, ec);
    if (ec || !fs::is_directory(dir))
        throw OutputError("cannot create the output folder " + dir +
                          (ec ? ": " + ec.message() : ": a file of that name is in the way"));
}

void writeTextFile(const std::string& path, const std::string& text) {
    PendingFile file(path);
    {
        std::ofstream out(file.tmpPath(), std::ios::binary | std::ios::trunc);
        if (!out)
            throw OutputError("cannot write " + file.tmpPath());
        out << text;
        out.flush();
        if (!out)
            throw OutputError("cannot write " + file.tmpPath() + " (is the disk full?)");
    }
    file.commit(/*mayBeEmpty=*/true);
}

PendingFile::PendingFile(std::string path) : path_(std::move(path)), tmp_(path_ + ".tmp") {}

PendingFile::~PendingFile() {
    if (!done_)
        discard();
}

void PendingFile::commit(bool mayBeEmpty) {
    std::error_code ec;
    const bool there = fs::exists(tmp_, ec);
    const bool empty = there && fs::file_size(tmp_, ec) == 0;
    if (!there || ec || (empty && !mayBeEmpty)) {
        discard();
        throw OutputError("cannot write " + path_ + ": nothing was written to " + tmp_);
    }
    fs::rename(tmp_, path_, ec);
    if (ec) {
        discard();
        throw OutputError("cannot write " + path_ + ": " + ec.message());
    }
    done_ = true;
}

void PendingFile::discard() {
    std::error_code ec;
    if (!done_)
        fs::remove(tmp_, ec);
    done_ = true;
}

} // namespace swarf::io
