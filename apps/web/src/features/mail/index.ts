export { mailKeys, messagesQuery, useMessages } from './api/messages';
export { FailedMessagesNotice, MessagesPanel } from './components/messages-panel';
export { SendReportButton } from './components/send-report-button';
