export { splitSentences } from './split-sentences.js';
export { createTopicMatcher, topicPattern, type TopicMatcher } from './topic-matcher.js';
export { topicWordsOf } from './topic-words.js';
