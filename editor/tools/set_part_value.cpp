#include "editor/tools/set_part_value.hpp"

#include "netcheck/edit/part_commands.hpp"

namespace stripsmith {

std::unique_ptr<netcheck::edit::Command> setPartValue(const netcheck::Board& board,
                                                      const std::string& ref,
                                                      const std::string& value,
                                                      std::string label) {
    for (std::size_t i = 0; i < board.parts.size(); ++i) {
        if (board.parts[i].ref != ref) continue;
        netcheck::Part changed = board.parts[i];
        changed.value = value;
        return std::make_unique<netcheck::edit::ReplacePart>(board, i, changed, std::move(label));
    }
    return nullptr;
}

}  // namespace stripsmith
