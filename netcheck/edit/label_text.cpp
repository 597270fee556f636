#include "netcheck/edit/label_text.hpp"

namespace netcheck::edit {

std::string joinedName(std::string_view from, std::string_view to) {
    return std::string(from) + "\u2013" + std::string(to);
}

}  // namespace netcheck::edit
