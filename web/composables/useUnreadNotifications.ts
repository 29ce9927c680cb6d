import { ref, watch } from 'vue';
import { useRoute, useRouter } from 'vue-router';
import { listNotifications, markNotificationRead, type AppNotification } from '@web/services/notifications';

const SECTION_OF: Record<AppNotification['kind'], string> = {
  'review-requested': '#review',
  remark: '#remarks',
  verdict: '#review',
  adopted: '#history',
};

/**
 * The person's unread notifications, fetched again after every navigation (as the queue counts
 * are); a failure only hides them. Opening one marks it read and goes to its mechanism.
 */
export function useUnreadNotifications(enabled: () => boolean) {
  const route = useRoute();
  const router = useRouter();
  const unread = ref<AppNotification[]>([]);

  async function load(): Promise<void> {
    if (!enabled()) return;
    try {
      unread.value = await listNotifications(true);
    } catch {
      unread.value = [];
    }
  }

  async function open(notification: AppNotification): Promise<void> {
    unread.value = unread.value.filter((n) => n.id !== notification.id);
    await markNotificationRead(notification.id).catch(() => undefined);
    await router.push({ name: 'workbench', params: { slug: notification.mechanismSlug }, hash: SECTION_OF[notification.kind] });
  }

  watch(() => route.fullPath, load, { immediate: true });
  return { unread, open };
}
