export { opensUtterance, splitSentences, utteranceLabelLength } from './split-sentences.js';
export { createTopicMatcher, type TopicMatcher } from './topic-matcher.js';
export { isVoicedQuote, quotesEarlierLine, repeatsEarlierText } from './reply-quote.js';
