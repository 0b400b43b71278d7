export { mailKeys, messagesQuery, useMessages } from './api/messages';
export { FailedMessagesNotice, MessagesPanel } from './components/messages-panel';
