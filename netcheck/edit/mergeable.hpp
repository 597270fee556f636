// Commands that can fold a following command of the same gesture into themselves.
#pragma once

#include "netcheck/edit/command.hpp"

namespace netcheck::edit {

/// A command whose mergeWith() can be asked first, without changing anything. A group of
/// commands (CompoundCommand) merges only when every member can, so a multi-selection drag is
/// one undo step too.
class MergeableCommand : public Command {
public:
    /// True when mergeWith(next) would succeed.
    virtual bool canMergeWith(const Command& next) const = 0;
    bool mergeWith(const Command& next) override {
        if (!canMergeWith(next)) return false;
        takeNewState(next);
        return true;
    }

protected:
    /// Adopts the resulting state of `next`; called only after canMergeWith(next).
    virtual void takeNewState(const Command& next) = 0;
};

}  // namespace netcheck::edit
