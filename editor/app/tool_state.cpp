#include "editor/app/tool_state.hpp"

#include <array>
#include <string_view>

namespace stripsmith {

std::string defaultValue(const std::string& kind) {
    struct Entry { std::string_view kind, value; };
    static constexpr std::array<Entry, 17> kValues{{
        {"resistor", "10k"}, {"capacitor", "100n"}, {"electrolytic", "10u"}, {"inductor", "100u"},
        {"diode", "1N4148"}, {"zener", "5V1"}, {"led", "red"}, {"bjt", "BC547"}, {"jfet", "J201"},
        {"mosfet", "2N7000"}, {"regulator", "78L05"}, {"ic", "TL072"}, {"trimmer", "10k"},
        {"crystal", "16MHz"}, {"fuse", "500mA"}, {"pot", "B100k"}, {"battery", "9V"},
    }};
    for (const Entry& e : kValues)
        if (e.kind == kind) return std::string(e.value);
    return {};
}

}  // namespace stripsmith
