export { mailKeys, messagesQuery, useMessages } from './api/messages';
export { customerTextsQuery, textKeys, textsQuery, useCustomerTexts, useTexts } from './api/texts';
export { FailedMessagesNotice, MessagesPanel } from './components/messages-panel';
export { SendReportButton } from './components/send-report-button';
export { CustomerTextsPanel, TextsPanel, TextStatusBadge } from './components/texts-panel';
