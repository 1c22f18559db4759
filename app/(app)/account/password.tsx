import { ChangePasswordScreen } from '@/components/account/change-password-screen';

export default ChangePasswordScreen;
