// Writing outputs atomically.
#include "atomic_file.h"

#include "fp_traps.h"

#include "swarf/sim/error.h"

#include <vtkNew.h>
#include <vtkPNGWriter.h>
#include <vtkRenderWindow.h>
#include <vtkWindowToImageFilter.h>

#include <cstdio>
#include <filesystem>
#include <fstream>

namespace swarf::viewer::detail {

namespace fs = std::filesystem;

void makeDirectory(const std::string& dir) {
    std::error_code ec;
    if (dir.empty())
        return;
    fs::create_directories(dir, ec);
    if (ec)
        throw OutputError("cannot create folder " + dir + ": " + ec.message());
}

void writeTextAtomic(const std::string& path, const std::string& text) {
    const std::string tmp = path + ".tmp";
    {
        std::ofstream out(tmp, std::ios::binary | std::ios::trunc);
        if (!out)
            throw OutputError("cannot write " + tmp);
        out << text;
        out.flush();
        if (!out) {
            std::remove(tmp.c_str());
            throw OutputError("cannot write " + tmp + " (disk full?)");
        }
    }
    std::error_code ec;
    fs::rename(tmp, path, ec);
    if (ec) {
        std::remove(tmp.c_str());
        throw OutputError("cannot rename " + tmp + " to " + path + ": " + ec.message());
    }
}

void writeWindowPng(vtkRenderWindow* window, const std::string& path) {
    const FpTrapsOff mesa; // drawing and reading back the pixels (nothing of ours is computed)
    window->Render();
    vtkNew<vtkWindowToImageFilter> grab;
    grab->SetInput(window);
    grab->SetInputBufferTypeToRGB();
    grab->ReadFrontBufferOff();
    grab->Update();
    const std::string tmp = path + ".tmp";
    vtkNew<vtkPNGWriter> writer;
    writer->SetFileName(tmp.c_str());
    writer->SetInputConnection(grab->GetOutputPort());
    writer->Write();
    std::error_code ec;
    if (writer->GetErrorCode() != 0 || !fs::exists(tmp, ec) || fs::file_size(tmp, ec) == 0) {
        std::remove(tmp.c_str());
        throw OutputError("cannot write " + tmp);
    }
    fs::rename(tmp, path, ec);
    if (ec) {
        std::remove(tmp.c_str());
        throw OutputError("cannot rename " + tmp + " to " + path + ": " + ec.message());
    }
}

} // namespace swarf::viewer::detail
