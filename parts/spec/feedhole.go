package spec

// FeedHoleClearanceMM is added to what passes through the feed hole
// (CoaxType.FeedHoleMM). Common practice (no published source).
const FeedHoleClearanceMM = 0.1
