// The Circuit panel's "Board against circuit" view, still written against the whole editor. The
// panel reaches it only through CircuitPanelContext::drawComparison (set in editor/frame.cpp), so
// nothing else in the panels depends on EditorApp. When the comparison comes from the core, it
// should take the board and CircuitPanelState, move to circuit_views.hpp, and this file go.
#pragma once

#include "editor/app/editor_app.hpp"
#include "editor/panels/circuit_views.hpp"

namespace stripsmith {

/// The board beside the circuit.
void drawCircuitDifference(EditorApp& app);

}  // namespace stripsmith
