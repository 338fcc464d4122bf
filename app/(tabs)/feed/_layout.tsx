import { TabStack } from '@/components/shell/TabStack';

export default TabStack;
