// The layout dialog's state (Board > Lay out from the circuit / Place the remaining parts): the
// options, the run on its worker, and the alternatives found, one of them previewed. View state:
// nothing here is in the document until a layout is accepted (one command).
#pragma once

#include <vector>

#include "editor/app/layout_worker.hpp"
#include "netcheck/check/check_report.hpp"

namespace stripsmith {

struct LayoutDialogState {
    bool open = false;
    bool placeTheRest = false;  ///< keep the parts already on the board where they are
    bool rails = false;         ///< supply nets on the top and bottom strips
    int iterations = 0;         ///< orders tried per alternative (0: not yet set)
    int seed = 1;
    unsigned startRevision = 0;  ///< the document's revision the run started from
    std::vector<netcheck::LayoutResult> results;  ///< best first
    std::vector<netcheck::CheckReport> reports;   ///< each result's check, for the preview
    int chosen = 0;
    std::string problem;  ///< why the last run found nothing
    LayoutWorker worker;
};

}  // namespace stripsmith
