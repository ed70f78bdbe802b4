// A render window as a PNG file (see png_file.h).
#include "png_file.h"

#include "fp_traps.h"

#include "swarf/io/output_file.h"
#include "swarf/sim/error.h"

#include <vtkNew.h>
#include <vtkPNGWriter.h>
#include <vtkRenderWindow.h>
#include <vtkWindowToImageFilter.h>

namespace swarf::viewer::detail {

void writeWindowPng(vtkRenderWindow* window, const std::string& path) {
    const FpTrapsOff mesa; // drawing and reading back the pixels (nothing of ours is computed)
    window->Render();
    vtkNew<vtkWindowToImageFilter> grab;
    grab->SetInput(window);
    grab->SetInputBufferTypeToRGB();
    grab->ReadFrontBufferOff();
    grab->Update();
    io::PendingFile file(path);
    vtkNew<vtkPNGWriter> writer;
    writer->SetFileName(file.tmpPath().c_str());
    writer->SetInputConnection(grab->GetOutputPort());
    writer->Write();
    if (writer->GetErrorCode() != 0)
        throw OutputError("cannot write " + file.tmpPath());
    file.commit();
}

} // namespace swarf::viewer::detail
