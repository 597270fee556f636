// Changing one part's value by its ref, as one undoable command (the JFET bias panel's Apply).
#pragma once

#include <memory>
#include <string>

#include "netcheck/edit/command.hpp"
#include "netcheck/model/board.hpp"

namespace stripsmith {

/// A command that sets the value of the on-board part `ref`, labelled `label`; null when the
/// board has no such part.
std::unique_ptr<netcheck::edit::Command> setPartValue(const netcheck::Board& board,
                                                      const std::string& ref,
                                                      const std::string& value,
                                                      std::string label);

}  // namespace stripsmith
