#include "netcheck/edit/out_of_step.hpp"

namespace netcheck::edit {

void requireInStep(bool ok, std::string_view label, std::string_view what) {
    if (ok) return;
    throw OutOfStepError(std::string(label) + ": " + std::string(what));
}

}  // namespace netcheck::edit
