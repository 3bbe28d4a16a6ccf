// A notification as the API sends it to its user.
export interface NotificationView {
  id: number;
  kind: 'hold_opened' | 'hold_decided';
  title: string;
  body: string;
  link: string;
  createdAt: string;
  readAt: string | null;
}

export interface NotificationList {
  items: NotificationView[];
  unread: number;
}
