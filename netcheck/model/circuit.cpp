// The intended circuit: pin references and net lookup.
#include "netcheck/model/circuit.hpp"

#include <algorithm>

namespace netcheck {

std::optional<PinRef> PinRef::parse(std::string_view text) {
    const std::size_t dot = text.rfind('.');
    if (dot == std::string_view::npos || dot == 0 || dot + 1 == text.size()) return std::nullopt;
    return PinRef{std::string(text.substr(0, dot)), std::string(text.substr(dot + 1))};
}

std::optional<std::string> Circuit::netOf(const PinRef& pin) const {
    for (const auto& [name, pins] : nets) {
        if (std::find(pins.begin(), pins.end(), pin) != pins.end()) return name;
    }
    return std::nullopt;
}

}  // namespace netcheck
